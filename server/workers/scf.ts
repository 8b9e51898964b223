import { solveSpeciesAll } from '../../shared/physics/scf'
import type { ScfSpeciesEstimates } from '../../shared/physics/scf/types'

/** One species per task, both solvers (non-relativistic and Dirac): the worker-thread entry of the SCF pool (bundled by modules/scf-worker.ts). */
export default function solve({ z, charge }: { z: number; charge: number }): ScfSpeciesEstimates & { seconds: number } {
  const started = performance.now()
  const result = solveSpeciesAll(z, charge)
  return { ...result, seconds: (performance.now() - started) / 1000 }
}
