/**
 * The species engine's public face, shared by the server routes, the pages and the command line.
 * Pure TypeScript with no Node, HTTP, database or Vue imports, so it also runs in the browser.
 * The SCF solver (./scf) is not pulled in here: it is heavy, and callers that want it import
 * ./scf/index themselves and pass its estimates to describeSpecies.
 */
export { ENGINE_VERSION } from './version'
export type { Subshell } from './subshells'
export { formatConfiguration, formatWithCore, parseConfiguration, subshellLabel, capacity } from './subshells'
export type { GroundConfiguration, ConfigurationRule } from './configuration'
export { groundConfiguration, nextElectronSubshell } from './configuration'
export type { Element, Isotope } from './elements'
export { getElement, allElements, getIsotope, MAX_Z, ISOTOPE_SOURCE } from './elements'
export type { ParsedSpecies } from './notation'
export { parseSpecies, parseIsotopeToken, formatSpecies, SpeciesParseError, ACCEPTED_NOTATIONS, toRoman, fromRoman } from './notation'
export type { LsTerm, OpenSubshell } from './ls-terms'
export { lsTerms } from './ls-terms'
export type { GroundTerm, OrbitalBox, SubshellBoxes } from './terms'
export { groundTerm, orbitalBoxes, unpairedElectrons } from './terms'
export type { ScreeningRow } from './slater'
export { slaterScreening, screeningConstant, nStar } from './slater'
export type { MethodInfo, MethodName, MethodDomain, NuclearMass } from './methods'
export { METHODS, METHOD_NAMES, methodDomainReason, CODATA_2018, SLATER_RYDBERG_EV, diracHydrogenLikeEv, nuclearMass } from './methods'
export type { SourcedValue, ReferenceValue, ReferenceKind, ElectronAffinity, ReferenceGroundLevel, ReferenceIonisationDetail } from './reference'
export {
  IONISATION_SOURCE,
  electronAffinity,
  referenceIonisationEv,
  referenceIonisationSeries,
  referenceGroundLevel,
  referenceIonisationDetail,
  referenceGroundShells,
} from './reference'
export type { BindingEnergy, DescribeOptions, DiracSummary, Estimate, ReferenceConfiguration, ScreeningEntry, SpeciesRecord, TermSummary } from './record'
export type { ScfSpeciesEstimates } from './scf/types'
export { describeSpecies } from './record'
export type { BestEstimate, ShellKind, SpeciesClass } from './best-estimate'
export { bestEstimate, speciesClass } from './best-estimate'
export type { QedCorrection } from './qed/index'
export { formatRecord } from './record-text'
