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
