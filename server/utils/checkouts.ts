import type { Knex } from 'knex'

export type CheckoutScope = 'mine' | 'overdue' | 'open'

/**
 * The open check-outs with their sample, holder and due date, oldest due first. `mine` is what the
 * caller holds or checked out; `overdue` is what was due back before today (the server's date,
 * the same day the overdue notices use).
 */
export async function openCheckouts(db: Knex, scope: CheckoutScope, userId: string) {
  const rows = await db('sample_checkouts as k')
    .join('samples as s', 's.id', 'k.sample_id')
    .leftJoin('users as b', 'b.id', 'k.checked_out_by')
    .leftJoin('locations as l', 'l.id', 's.location_id')
    .whereNull('k.checked_in_at')
    .where((w) => {
      if (scope === 'mine') w.where('k.holder_user_id', userId).orWhere('k.checked_out_by', userId)
      if (scope === 'overdue') w.whereRaw('k.due_back < current_date')
    })
    .select(
      'k.id', 'k.holder', 'k.holder_user_id', 'k.holder_institution', 'k.run', 'k.due_back', 'k.checked_out_at',
      's.id as sample_id', 's.code', 's.name', 's.status', 'l.name as place_name', 'b.name as by_name',
      db.raw('k.due_back < current_date as overdue'), db.raw('(k.due_back - current_date)::int as days_left'),
    )
    .orderBy('k.due_back', 'asc')
    .orderBy('s.code', 'asc')
    .limit(500)
  return rows.map((r) => ({
    id: r.id as string,
    sample: { id: r.sample_id as string, code: r.code as string, name: r.name as string, status: r.status as string },
    holder: r.holder as string,
    holderUserId: (r.holder_user_id as string | null) ?? null,
    holderInstitution: (r.holder_institution as string | null) ?? null,
    heldByMe: r.holder_user_id === userId,
    run: r.run as string,
    dueBack: r.due_back as string,
    daysLeft: Number(r.days_left),
    overdue: !!r.overdue,
    checkedOutAt: r.checked_out_at as Date,
    checkedOutBy: (r.by_name as string | null) ?? null,
    homePlace: (r.place_name as string | null) ?? null,
  }))
}
