import { lowestEnergyConfiguration } from '../shared/physics/scf/configuration-search'
import { formatWithCore } from '../shared/physics/subshells'

/** One ion per task: the worker-thread entry of scripts/dks-configurations.ts. */
export default function search({ z, charge }: { z: number; charge: number }) {
  const c = lowestEnergyConfiguration(z, charge)
  return { z, charge, rule: formatWithCore(c.rule), chosen: formatWithCore(c.chosen), gainHartree: c.gainHartree, solves: c.solves }
}
