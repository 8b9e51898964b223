/** The four roles of a laboratory's staff (DESIGN.md §2). */
export const ROLES = ['manager', 'scientist', 'technician', 'auditor'] as const
export type Role = (typeof ROLES)[number]

export const ROLE_LABELS: Record<Role, string> = {
  manager: 'Lab manager',
  scientist: 'Scientist',
  technician: 'Technician',
  auditor: 'Auditor',
}

const everyone = [...ROLES] as Role[]

/**
 * Who may do what. The server's requireRole() and the client's navigation both read this one
 * table, so a menu never offers what the server would refuse.
 */
export const CAN = {
  manageSamples: ['manager'],
  readSamples: everyone,
  recordSpecies: ['manager', 'scientist'],
  lookUpSpecies: everyone,
  custody: ['manager', 'technician'],
  printLabels: ['manager', 'technician'],
  issueCertificates: ['manager'],
  readCertificates: everyone,
  planBeams: ['manager', 'scientist'],
  readBeamPlans: everyone,
  runNotices: ['manager'],
  readAudit: ['manager', 'auditor'],
  managePeople: ['manager'],
  // The radioactive-source inventory: read by the managers and auditors (the radiation protection
  // officer's role here); licence limits set by managers.
  readInventory: ['manager', 'auditor'],
  manageLicence: ['manager'],
  useTokens: everyone,
  manageAllTokens: ['manager'],
  viewJobs: ['manager'],
  readApiDocs: everyone,
} as const satisfies Record<string, readonly Role[]>

export type Capability = keyof typeof CAN

/** True when `role` holds `capability`. */
export function can(role: Role | null | undefined, capability: Capability): boolean {
  return !!role && (CAN[capability] as readonly Role[]).includes(role)
}
