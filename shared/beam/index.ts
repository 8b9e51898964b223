/**
 * The beam-planning engine's public face (DESIGN §5b): equilibrium charge states after a
 * stripper, rigidities, energy loss, and charge breeding. Pure TypeScript beside the species
 * engine: no HTTP, database or Vue imports, so the server, the page and the command line all
 * run the same code. Every formula names its paper and range where it is defined.
 */
export { BEAM_ENGINE_VERSION } from './version'
export type { EnergyUnit, EnergyForms, IonMass, Motion, Rigidity } from './kinematics'
export { ENERGY_UNITS, energyForms, ionMass, motion, rigidity } from './kinematics'
export type { Medium } from './media'
export { parseMedium, MediumError, I_VALUES_SOURCE } from './media'
export type { ChargeFraction, ChargeStateEstimates, ModelName, ModelResult, NotApplicableModel, StripInput } from './charge-states'
export { MODEL_NAMES, chargeStateEstimates, chargeStateModels, gaussianFractions, sayerFractions } from './charge-states'
export type { EnergyLoss, NotEstimated } from './stopping'
export { energyLoss, protonStopping, effectiveCharge, blochCorrection, STOPPING_SOURCE } from './stopping'
export type { BindingSources, RecordedBinding, SubshellBinding } from './binding'
export { subshellBindings } from './binding'
export { lotzCrossSection, LOTZ_SOURCE, LOTZ_UNCERTAINTY } from './lotz'
export type { BreedResult, BreedStep, BreedTarget, ShellThreshold } from './breeding'
export { breed, integratePopulations } from './breeding'
export type { IonRef, StripPlan, StripRequest, BreedPlan, BreedRequest } from './plan'
export { stripPlan, breedPlan, parseIon, BeamInputError } from './plan'
export { formatStrip, formatBreed } from './text'
export type { PlanChange } from './changes'
export { planChanges } from './changes'
