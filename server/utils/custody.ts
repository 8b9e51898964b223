import type { H3Event } from 'h3'
import type { Knex } from 'knex'
import type { User } from 'lucia'
import { deriveSample } from '#shared/samples/derived'
import type { CheckOutHolderData, CustodyData } from '#shared/schemas/custody'
import type { CustodyEventRow, SampleCheckoutRow } from '#shared/types/db'

const KIND = { move: 'moved', 'check-out': 'checked_out', 'check-in': 'checked_in', consume: 'consumed', condition: 'condition' } as const

// Masses are kept to a nanogram: enough for any balance, and no 1e-13 mg left by subtraction.
const roundMg = (v: number) => Math.round(v * 1e6) / 1e6

function checkoutOut(k: SampleCheckoutRow & { by_name?: string | null }) {
  return {
    id: k.id,
    holder: k.holder,
    holderUserId: k.holder_user_id ?? null,
    holderInstitution: k.holder_institution ?? null,
    run: k.run,
    dueBack: k.due_back,
    checkedOutAt: k.checked_out_at,
    checkedOutBy: k.by_name ?? null,
  }
}

/** Who takes a sample: an active person of the lab by id, or an external user as given. */
async function resolveHolder(trx: Knex.Transaction, h: CheckOutHolderData) {
  if ('userId' in h) {
    const person = await trx('users').where({ id: h.userId, active: true }).first('id', 'name')
    if (!person) invalidField('holder.userId', 'Choose an active person from the list')
    return { userId: person.id, name: person.name, institution: null }
  }
  return { userId: null, name: h.name, institution: h.institution }
}

// A mass as the technician reads it on a balance: at most six significant digits, no trailing zeros.
const mgText = (v: number) => `${Number(v.toPrecision(6))} mg`

/** A sample's custody: the open check-out (if any), the area used so far, and the events, newest first. */
export async function custodyState(db: Knex | Knex.Transaction, sampleId: string) {
  const open = (await db('sample_checkouts as k').leftJoin('users as u', 'u.id', 'k.checked_out_by').where('k.sample_id', sampleId).whereNull('k.checked_in_at').first('k.*', 'u.name as by_name')) as (SampleCheckoutRow & { by_name: string | null }) | undefined
  const events = (await db('custody_events as e').leftJoin('users as u', 'u.id', 'e.by').where('e.sample_id', sampleId).orderBy('e.id', 'desc').limit(200).select('e.*', 'u.name as by_name')) as (CustodyEventRow & { by_name: string | null })[]
  const area = await db('custody_events').where({ sample_id: sampleId, kind: 'consumed' }).whereRaw(`details->>'unit' = 'cm2'`).sum({ total: db.raw(`(details->>'amount')::float8`) }).first()
  return {
    checkout: open ? checkoutOut(open) : null,
    areaUsedCm2: Number((area as { total: number | null } | undefined)?.total ?? 0),
    events: events.map((e) => ({ id: Number(e.id), kind: e.kind, details: e.details as Record<string, unknown>, by: e.by_name, at: e.at })),
  }
}

/** The bench card's data: the sample and its custody. */
export async function benchState(db: Knex | Knex.Transaction, sampleId: string) {
  return { sample: (await findSample(db, sampleId))!, custody: await custodyState(db, sampleId) }
}

function conflict(message: string, data: Record<string, unknown>): never {
  throw createError({ statusCode: 409, statusMessage: 'Conflict', message, data })
}

/**
 * Applies one custody action to a sample locked for update, against the version the technician
 * saw: a stale version, a retired sample or a second check-out is refused (409) with the current
 * state; a consumption beyond what is left is a 400 that says how much is left. Writes the sample, the custody event and the audit
 * row in the caller's transaction; answers the new bench state.
 */
export async function applyCustody(trx: Knex.Transaction, event: H3Event, user: User, sampleId: string, a: CustodyData) {
  const before = await requireSample(trx, sampleId, { lock: true })
  const current = async () => ({ current: await benchState(trx, sampleId) })
  if (before.status === 'retired') conflict('This sample is retired: custody actions are closed', { reason: 'retired', retiredAt: before.retiredAt, ...(await current()) })
  if (before.version !== a.version) conflict('Someone changed this sample after you opened it', await current())

  const open = await trx('sample_checkouts').where({ sample_id: sampleId }).whereNull('checked_in_at').forUpdate().first()
  const changes: Record<string, unknown> = {}
  let details: Record<string, unknown> = { note: a.note ?? null }
  let columns: { holder_user_id?: string | null; holder_name?: string; holder_institution?: string | null; due_back?: string } = {}
  const placePath = async (id: string | null) => (id ? ((await placesById(trx)).get(id)?.path ?? null) : null)

  if (a.action === 'move' || (a.action === 'check-in' && a.locationId)) {
    const to = a.locationId!
    await assertPlace(trx, to)
    if (a.action === 'move' && to === before.locationId) invalidField('locationId', 'The sample is already there')
    changes.location_id = to
    details = { ...details, from: { id: before.locationId, path: before.location?.path ?? null }, to: { id: to, path: await placePath(to) } }
  }
  if (a.action === 'check-out') {
    if (open) conflict('This sample is already checked out', { checkout: checkoutOut(open), ...(await current()) })
    if (before.status === 'quarantined' || before.status === 'depleted') conflict(before.status === 'quarantined' ? 'A quarantined sample cannot be checked out: release it first' : 'A depleted sample cannot be checked out', { reason: before.status, ...(await current()) })
    if (a.dueBack < new Date().toISOString().slice(0, 10)) invalidField('dueBack', 'The due-back day is in the past')
    const who = await resolveHolder(trx, a.holder)
    const [k] = await trx('sample_checkouts')
      .insert({ sample_id: sampleId, holder: who.name, holder_user_id: who.userId, holder_institution: who.institution, run: a.run, due_back: a.dueBack, checked_out_by: user.id })
      .returning('id')
    changes.status = 'in_use'
    columns = { holder_user_id: who.userId, holder_name: who.name, holder_institution: who.institution, due_back: a.dueBack }
    details = { ...details, checkoutId: k!.id, holder: who.name, holderUserId: who.userId, holderInstitution: who.institution, run: a.run, dueBack: a.dueBack, statusBefore: before.status }
  }
  if (a.action === 'check-in') {
    if (!open) conflict('This sample is not checked out', await current())
    await trx('sample_checkouts').where({ id: open.id }).update({ checked_in_at: trx.fn.now(), checked_in_by: user.id })
    if (before.status === 'in_use') changes.status = 'available'
    details = { ...details, checkoutId: open.id, holder: open.holder, holderUserId: open.holder_user_id ?? null, holderInstitution: open.holder_institution ?? null, run: open.run, dueBack: open.due_back }
  }
  if (a.action === 'consume') {
    const areal = deriveSample(before).arealDensity
    const usedMg = a.unit === 'mg' ? a.amount : areal ? roundMg((a.amount * areal.value) / 1000) : null
    let after: number | null = before.massMg
    if (before.massMg !== null && usedMg !== null) {
      // More than is left is a mistake in what was typed, not a clash with someone else: a 400
      // that says how much is left (a value from the record, never the input).
      if (usedMg > before.massMg + 1e-9) {
        const message = `Only ${mgText(before.massMg)} left`
        throw createError({ statusCode: 400, statusMessage: 'Invalid input', message, data: { remainingMg: before.massMg, usedMg, issues: [{ path: 'amount', message }] } })
      }
      after = Math.max(0, roundMg(before.massMg - usedMg))
      changes.mass_mg = after
      if (after === 0) changes.status = 'depleted'
    }
    details = {
      ...details,
      amount: a.amount,
      unit: a.unit,
      massUsedMg: usedMg,
      arealDensityUgCm2: a.unit === 'cm2' ? (areal?.value ?? null) : null,
      massBeforeMg: before.massMg,
      massAfterMg: after,
      // Said in the record when nothing could be subtracted, so a reader knows why.
      unchanged: before.massMg === null ? 'no mass on record' : usedMg === null ? 'no areal density on record to turn the area into a mass' : null,
    }
  }

  // A move of a radioactive source that crosses a licence limit is made, and answered with a warning.
  const licence = before.radioactive && changes.location_id ? await licenceWarnings(trx, { move: { sampleId, locationId: changes.location_id as string } }) : []
  const [row] = await trx('samples')
    .where({ id: sampleId, version: a.version })
    .update({ ...changes, version: a.version + 1, updated_by: user.id, updated_at: trx.fn.now() })
    .returning('id')
  if (!row) conflict('Someone changed this sample after you opened it', await current())
  const kind = KIND[a.action]
  await trx('custody_events').insert({ sample_id: sampleId, kind, details: JSON.stringify(details) as never, by: user.id, ...columns })
  const after = (await findSample(trx, sampleId))!
  await writeAudit(trx, event, { action: `sample.custody.${kind.replace('_', '-')}`, entityType: 'sample', entityId: sampleId, before, after: { ...after, custody: { kind, ...details } } })
  return { sample: after, custody: await custodyState(trx, sampleId), licenceWarnings: licence }
}
