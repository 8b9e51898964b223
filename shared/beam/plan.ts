/**
 * The two questions a plan answers, in the shapes the API and the command line return
 * (field names are a contract: see issue 12).
 */
import { formatSpecies, getElement, parseSpecies, SpeciesParseError } from '../physics/index'
import { breed, type BreedResult } from './breeding'
import type { BindingSources } from './binding'
import { chargeStateEstimates, type ModelResult, type NotApplicableModel } from './charge-states'
import { defaultMassNumber, energyForms, ionMass, motion, rigidity, type EnergyForms, type EnergyUnit, type Rigidity } from './kinematics'
import { MediumError, parseMedium, type Medium } from './media'
import { energyLoss, type EnergyLoss, type NotEstimated } from './stopping'
import { BEAM_ENGINE_VERSION } from './version'

export class BeamInputError extends Error {
  constructor(readonly field: string, message: string) {
    super(message)
  }
}

export interface IonRef {
  z: number
  symbol: string
  massNumber: number
  /** true when the caller named no isotope and the principal one was taken */
  massNumberAssumed: boolean
  charge: number
  label: string
}

/** Reads '208Pb27+', 'Ar', '12C1-' into an ion; an element alone takes its most abundant isotope. */
export function parseIon(text: string): IonRef {
  try {
    const p = parseSpecies(text)
    const massNumber = p.massNumber ?? defaultMassNumber(p.z)
    return { z: p.z, symbol: p.symbol, massNumber, massNumberAssumed: p.massNumber === null, charge: p.charge, label: formatSpecies(p.z, p.charge, massNumber).ionic }
  } catch (e) {
    if (e instanceof SpeciesParseError) throw new BeamInputError('ion', e.message)
    throw e
  }
}

export interface StripRequest {
  ion: string
  energy: number
  unit?: EnergyUnit
  medium: string
  gas?: boolean
  /** stripper areal density, µg/cm² (for the energy loss) */
  arealDensityUgCm2?: number
}

export interface StripPlan {
  engine: string
  ion: string
  ionDetail: IonRef & { ionMassU: number; massNote: string }
  energyMeVPerU: number
  energy: EnergyForms & { beta: number; gamma: number; given: { value: number; unit: EnergyUnit } }
  medium: string
  mediumDetail: Pick<Medium, 'phase' | 'zEff' | 'iEv' | 'notes'>
  models: ModelResult[]
  /** formulas that give no number for this stripper, with the reason (engine 1.1.0 on; absent before) */
  notApplicable?: NotApplicableModel[]
  rigidity: (Rigidity & { mevPerU: number })[]
  rigidityNote: string
  energyLoss?: EnergyLoss | NotEstimated
  warnings: string[]
}

/** Equilibrium charge states after the stripper, rigidities of every state, and the foil's energy loss. */
export function stripPlan(req: StripRequest): StripPlan {
  const ion = parseIon(req.ion)
  if (!(Number.isFinite(req.energy) && req.energy > 0 && req.energy < 1e6)) throw new BeamInputError('energy', 'energy must be a positive number')
  let medium: Medium
  try {
    medium = parseMedium(req.medium, req.gas)
  } catch (e) {
    if (e instanceof MediumError) throw new BeamInputError('medium', e.message)
    throw e
  }
  const unit = req.unit ?? 'MeV/u'
  const mass = ionMass(ion.z, ion.massNumber, ion.charge)
  const forms = energyForms(req.energy, unit, mass)
  const m = motion(forms.totalMeV, mass.ionMassMeV)
  const warnings: string[] = []
  if (forms.mevPerU > 1000) throw new BeamInputError('energy', 'energy above 1000 MeV/u is outside every formula here')
  if (forms.mevPerU < 0.01) warnings.push('Below 10 keV/u: every formula here is far outside its range.')
  if (ion.massNumberAssumed) warnings.push(`No isotope named: the most abundant, ${ion.massNumber}${ion.symbol}, is assumed.`)
  const { models, notApplicable } = chargeStateEstimates({ z: ion.z, beta: m.beta, vOverV0: m.vOverV0, mevPerU: forms.mevPerU, medium })

  let loss: EnergyLoss | NotEstimated | undefined
  if (req.arealDensityUgCm2 !== undefined) {
    if (!(req.arealDensityUgCm2 > 0 && req.arealDensityUgCm2 < 1e6)) throw new BeamInputError('arealDensity', 'areal density must be a positive number of µg/cm²')
    loss = energyLoss({
      z: ion.z,
      massU: mass.ionMassU,
      mevPerU: forms.mevPerU,
      medium,
      arealDensityUgCm2: req.arealDensityUgCm2,
      velocity: (e) => motion(e * mass.ionMassU, mass.ionMassMeV),
    })
  }
  const exitPerU = loss?.estimated ? loss.exitMeVPerU : forms.mevPerU
  const charges = new Set<number>()
  for (const model of models) for (const f of model.fractions) if (f.fraction >= 0.001 && f.charge > 0) charges.add(f.charge)
  const rig = [...charges].sort((a, b) => a - b).map((q) => {
    const qMass = ionMass(ion.z, ion.massNumber, q)
    return { ...rigidity(ion.z, ion.massNumber, q, exitPerU * qMass.ionMassU), mevPerU: exitPerU }
  })
  return {
    engine: BEAM_ENGINE_VERSION,
    ion: ion.label,
    ionDetail: { ...ion, ionMassU: mass.ionMassU, massNote: mass.note },
    energyMeVPerU: forms.mevPerU,
    energy: { ...forms, beta: m.beta, gamma: m.gamma, given: { value: req.energy, unit } },
    medium: medium.label,
    mediumDetail: { phase: medium.phase, zEff: medium.zEff, iEv: medium.iEv, notes: medium.notes },
    models,
    notApplicable,
    rigidity: rig,
    rigidityNote: loss?.estimated
      ? 'After the stripper, at the exit energy (entry energy less the estimated loss), for every state any model gives ≥ 0.1 %.'
      : 'At the entry energy (no energy loss estimated), for every state any model gives ≥ 0.1 %.',
    ...(loss ? { energyLoss: loss } : {}),
    warnings,
  }
}

export interface BreedRequest {
  ion: string
  electronEnergyEv: number
  currentDensityACm2: number
  bindings?: BindingSources
}

export interface BreedPlan extends Omit<BreedResult, 'z' | 'startCharge'> {
  engine: string
  ion: string
  ionDetail: IonRef
}

/** Charge breeding of the ion's element from its given charge (0 for a bare element symbol). */
export function breedPlan(req: BreedRequest): BreedPlan {
  const ion = parseIon(req.ion)
  if (ion.charge < 0) throw new BeamInputError('ion', 'breeding starts from a neutral atom or a positive ion')
  if (!(Number.isFinite(req.electronEnergyEv) && req.electronEnergyEv > 0 && req.electronEnergyEv <= 1e6)) throw new BeamInputError('electronEnergy', 'electron energy must be between 0 and 1 000 000 eV')
  if (!(Number.isFinite(req.currentDensityACm2) && req.currentDensityACm2 > 0 && req.currentDensityACm2 <= 1e6)) throw new BeamInputError('currentDensity', 'current density must be between 0 and 1 000 000 A/cm²')
  if (!getElement(ion.z)) throw new BeamInputError('ion', 'unknown element')
  const r = breed({ z: ion.z, startCharge: ion.charge, electronEnergyEv: req.electronEnergyEv, currentDensityACm2: req.currentDensityACm2, bindings: req.bindings })
  const { z: _z, startCharge: _s, ...rest } = r
  return { engine: BEAM_ENGINE_VERSION, ion: ion.label, ionDetail: ion, ...rest }
}
