import type { Role } from '../auth/roles'

// Row shapes of the tables, as Knex returns them (snake_case columns, timestamps as Date).

export interface UserRow {
  id: string
  email: string
  name: string
  role: Role
  password_hash: string
  active: boolean
  created_at: Date
  updated_at: Date
  deactivated_at: Date | null
}

export interface SessionRow {
  id: string
  user_id: string
  expires_at: Date
  created_at: Date
}

export interface InvitationRow {
  id: string
  email: string
  name: string
  role: Role
  token_hash: string
  invited_by: string
  expires_at: Date
  accepted_at: Date | null
  revoked_at: Date | null
  created_at: Date
}

export interface SignInFailureRow {
  id: number
  email: string
  address: string
  at: Date
}

export interface AuditRow {
  id: number
  at: Date
  actor_id: string | null
  actor_email: string | null
  action: string
  entity_type: string
  entity_id: string | null
  before: unknown
  after: unknown
  address: string | null
}

export interface LocationRow {
  id: string
  parent_id: string | null
  kind: 'room' | 'cabinet' | 'shelf'
  code: string
  name: string
  created_by: string | null
  created_at: Date
}

export interface SampleRow {
  id: string
  code: string
  name: string
  material: string
  formula: string | null
  form: string
  status: string
  areal_density_ug_cm2: number | null
  areal_density_unc_ug_cm2: number | null
  thickness_nm: number | null
  bulk_density_g_cm3: number | null
  mass_mg: number | null
  backing: string | null
  supplier: string | null
  lot: string | null
  /** DATE columns, as 'YYYY-MM-DD' (server/utils/db.ts reads dates as text) */
  received_on: string | null
  recertify_by: string | null
  location_id: string | null
  hazard_statements: string[]
  hazard_kinds: string[]
  radioactive: boolean
  nuclide: string | null
  activity_bq: number | null
  activity_reference_on: string | null
  notes: string | null
  version: number
  created_by: string | null
  updated_by: string | null
  created_at: Date
  updated_at: Date
  retired_at: Date | null
  /** kept by a trigger: code, name, material, formula, supplier, lot and the place's path, lower-cased */
  search_text: string
}

export interface SampleComponentRow {
  id: number
  sample_id: string
  position: number
  z: number
  mass_number: number | null
  fraction: number
  fraction_basis: 'atom' | 'mass'
  enrichment_pct: number | null
  fraction_unc: number | null
  enrichment_unc_pct: number | null
}

export interface LicenceLimitRow {
  id: string
  nuclide: string
  location_id: string | null
  limit_bq: number
  set_by: string | null
  updated_at: Date
}

export interface SampleComponentIsotopeRow {
  id: number
  component_id: number
  position: number
  mass_number: number
  atom_pct: number
  atom_unc_pct: number | null
}

export interface DatasheetRow {
  id: string
  sample_id: string
  object_key: string
  original_name: string
  content_type: string
  size_bytes: number | string
  sha256: string
  uploaded_by: string | null
  uploaded_at: Date
  /** 1 for a first upload; the replaced sheet's version + 1 for a replacement */
  version?: number
  replaces_id?: string | null
  replaced_at?: Date | null
  withdrawn_at?: Date | null
  withdrawn_by?: string | null
  withdrawn_reason?: string | null
}

export interface ScfCacheRow {
  z: number
  charge: number
  method: string
  engine_version: string
  converged: boolean
  result: unknown
  seconds: number
  computed_at: Date
}

export interface SpeciesRow {
  id: string
  z: number
  charge: number
  mass_number: number | null
  label: string
  spectroscopic: string
  symbol: string
  element_name: string
  isoelectronic: string | null
  created_by: string | null
  created_at: Date
}

export interface SpeciesResultRow {
  id: string
  species_id: string
  engine_version: string
  methods: string[]
  result: unknown
  recorded_by: string | null
  recorded_at: Date
}

export interface SampleSpeciesRow {
  sample_id: string
  species_id: string
  linked_by: string | null
  linked_at: Date
}

export interface CertificateRow {
  id: string
  number: string
  subject_type: 'sample' | 'species'
  subject_id: string
  subject_label: string
  version: number
  status: 'issued' | 'superseded' | 'revoked'
  payload: unknown
  sha256: string
  object_key: string
  pdf_sha256: string
  pdf_bytes: number
  issued_by: string
  issued_at: Date
  /** DATE, as 'YYYY-MM-DD' */
  valid_until: string | null
  supersedes_id: string | null
  correction_reason: string | null
  superseded_by: string | null
  superseded_at: Date | null
  revoked_at: Date | null
  revoked_by: string | null
  revoke_reason: string | null
}

export interface CustodyEventRow {
  id: number | string
  sample_id: string
  kind: 'moved' | 'checked_out' | 'checked_in' | 'consumed' | 'condition'
  details: unknown
  by: string | null
  at: Date
  /** Check-outs only (null on rows written before holders were people) */
  holder_user_id?: string | null
  holder_name?: string | null
  holder_institution?: string | null
  due_back?: string | null
}

export interface SampleCheckoutRow {
  id: string
  sample_id: string
  holder: string
  /** the lab's person who holds it; null for an external user (then holder_institution is set) */
  holder_user_id?: string | null
  holder_institution?: string | null
  run: string
  /** DATE, as 'YYYY-MM-DD' */
  due_back: string
  checked_out_by: string | null
  checked_out_at: Date
  checked_in_by: string | null
  checked_in_at: Date | null
}

export interface NoticeRow {
  id: number | string
  kind: 'certificate_issued' | 'certificate_revoked' | 'recertification_due' | 'checkout_overdue'
  key: string
  recipients: string[]
  subject: string
  sent_at: Date
}

export interface ApiTokenRow {
  id: string
  user_id: string
  name: string
  scope: 'read' | 'read-write'
  secret_hash: string
  prefix: string
  /** DATE, as 'YYYY-MM-DD' */
  expires_on: string
  created_at: Date
  last_used_at: Date | null
  last_used_address: string | null
  revoked_at: Date | null
  revoked_by: string | null
}

export interface ApiTokenAddressRow {
  token_id: string
  address: string
  first_at: Date
}

export interface BeamPlanRow {
  id: string
  title: string
  z: number
  mass_number: number
  ion_label: string
  energy_mev_u: number
  medium: string
  charge_state: number | null
  charge_fraction: number | null
  rigidity_tm: number | null
  stripper_sample_id: string | null
  source_sample_id: string | null
  engine_version: string
  inputs: unknown
  result: unknown
  note: string | null
  created_by: string | null
  created_at: Date
}
