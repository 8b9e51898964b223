import type { Capability } from '#shared/auth/roles'

export interface NavItem {
  to: string
  label: string
  capability: Capability | null
}

/** The main navigation; each entry shows only to roles holding its capability. */
export const NAVIGATION: NavItem[] = [
  { to: '/', label: 'Overview', capability: null },
  { to: '/samples', label: 'Samples', capability: 'readSamples' },
  { to: '/species', label: 'Species', capability: 'lookUpSpecies' },
  { to: '/species/registry', label: 'Recorded species', capability: 'lookUpSpecies' },
  { to: '/beam', label: 'Beam planning', capability: 'readBeamPlans' },
  { to: '/certificates', label: 'Certificates', capability: 'readCertificates' },
  { to: '/scan', label: 'Scan', capability: 'custody' },
  { to: '/checkouts', label: 'Check-outs', capability: 'custody' },
  { to: '/inventory', label: 'Sources', capability: 'readInventory' },
  { to: '/audit', label: 'Audit trail', capability: 'readAudit' },
  { to: '/people', label: 'People', capability: 'managePeople' },
  { to: '/jobs', label: 'Jobs', capability: 'viewJobs' },
]
