import knexFactory, { type Knex } from 'knex'
import pg from 'pg'
import type { ApiTokenAddressRow, ApiTokenRow, AuditRow, BeamPlanRow, CertificateRow, CustodyEventRow, DatasheetRow, NoticeRow, SampleCheckoutRow, InvitationRow, LocationRow, LicenceLimitRow, SampleComponentIsotopeRow, SampleComponentRow, SampleRow, SampleSpeciesRow, ScfCacheRow, SessionRow, SignInFailureRow, SpeciesResultRow, SpeciesRow, UserRow } from '#shared/types/db'

// Typed tables: `db('users')` knows its columns. Declared here, beside useDb, so every
// project that compiles a route (the server's and the pages' type inference) sees it.
declare module 'knex/types/tables' {
  interface Tables {
    users: UserRow
    sessions: SessionRow
    invitations: InvitationRow
    sign_in_failures: SignInFailureRow
    audit_log: AuditRow
    locations: LocationRow
    samples: SampleRow
    sample_components: SampleComponentRow
    sample_component_isotopes: SampleComponentIsotopeRow
    licence_limits: LicenceLimitRow
    datasheets: DatasheetRow
    species_scf_cache: ScfCacheRow
    species: SpeciesRow
    species_results: SpeciesResultRow
    sample_species: SampleSpeciesRow
    certificates: CertificateRow
    custody_events: CustodyEventRow
    sample_checkouts: SampleCheckoutRow
    notices: NoticeRow
    beam_plans: BeamPlanRow
    api_tokens: ApiTokenRow
    api_token_addresses: ApiTokenAddressRow
  }
}

// A DATE is a calendar day with no time zone: read it as the 'YYYY-MM-DD' it holds, not as a
// JavaScript Date at local midnight that shifts a day when serialised in another zone.
pg.types.setTypeParser(pg.types.builtins.DATE, (v: string) => v)

let instance: Knex | null = null

/** The app's one Knex instance, created on first use from runtimeConfig.databaseUrl. */
export function useDb(): Knex {
  if (!instance) {
    const config = useRuntimeConfig()
    instance = knexFactory({
      client: 'pg',
      connection: config.databaseUrl,
      pool: { min: 0, max: Number(config.databasePoolMax) || 10 },
      acquireConnectionTimeout: 5_000,
    })
  }
  return instance
}

/** Closes the pool (Nitro's close hook). */
export async function closeDb(): Promise<void> {
  if (instance) {
    const k = instance
    instance = null
    await k.destroy()
  }
}

const UNAVAILABLE_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', 'ENOTFOUND', '57P01', '57P02', '57P03', '08000', '08001', '08003', '08006'])

/** True when an error means the database could not be reached (not that a query was wrong). */
export function isDatabaseUnavailable(error: unknown): boolean {
  let e: any = error
  for (let depth = 0; e && depth < 5; depth++) {
    if (UNAVAILABLE_CODES.has(e.code)) return true
    if (typeof e.message === 'string' && /Knex: Timeout acquiring a connection|Connection terminated|Client has encountered a connection error|Connection ended unexpectedly|terminating connection due to administrator command/.test(e.message)) return true
    if (Array.isArray(e.errors) && e.errors.some(isDatabaseUnavailable)) return true
    e = e.cause
  }
  return false
}
