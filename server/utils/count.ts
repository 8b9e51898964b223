import type { Knex } from 'knex'

// Plain imports only, no Nitro auto-imports: the sample list's query builder uses this, and
// bench/registry.ts runs that same builder outside the server.

/** The row count of a (filtered, unordered) query. */
export async function countRows(query: Knex.QueryBuilder): Promise<number> {
  const row = (await query.clone().clearSelect().clearOrder().count({ count: '*' }).first()) as { count: string | number } | undefined
  return Number(row?.count ?? 0)
}
