/**
 * The technician's actions on a sample (POST /api/samples/:id/custody), one schema per action in
 * a discriminated union on `action`. Each carries the sample version it was made against.
 */
import { z } from 'zod'

const version = z.number({ error: 'Send the version of the sample you acted on (a whole number)' }).int().min(1)
const note = (max: number) => z.string().trim().max(max, `Use at most ${max} characters`)
const blankToUndefined = (v: unknown) => (v === '' || v === null ? undefined : v)

const externalText = (what: string) => z.string({ error: what }).trim().min(2, what).max(120, 'Use at most 120 characters')

/**
 * Who takes a sample: a person of the lab (an active user, picked from the list) or an external
 * user, named with their institution. Free text alone is not accepted: a holder must be findable.
 */
export const CheckOutHolder = z.union(
  [
    z.strictObject({ userId: z.string({ error: 'Choose the person from the list' }).trim().min(1, 'Choose the person from the list').max(64, 'Choose the person from the list') }),
    z.strictObject({ name: externalText("Give the external user's name"), institution: externalText("Give the external user's institution") }),
  ],
  { error: 'Say who takes it: a person from the list ({ userId }) or an external user ({ name, institution })' },
)
export type CheckOutHolderData = z.output<typeof CheckOutHolder>

export const CUSTODY_ACTIONS = ['move', 'check-out', 'check-in', 'consume', 'condition'] as const
export type CustodyAction = (typeof CUSTODY_ACTIONS)[number]

export const MoveAction = z.strictObject({
  action: z.literal('move'),
  version,
  locationId: z.uuid({ error: 'Choose a storage place from the list' }),
  note: z.preprocess(blankToUndefined, note(500).optional()),
})

export const CheckOutAction = z.strictObject({
  action: z.literal('check-out'),
  version,
  holder: CheckOutHolder,
  run: z.string({ error: 'Name the beam time or run' }).trim().min(1, 'Name the beam time or run').max(120, 'Use at most 120 characters'),
  dueBack: z.iso.date({ error: 'Give the day it is due back as YYYY-MM-DD' }),
  note: z.preprocess(blankToUndefined, note(500).optional()),
})

export const CheckInAction = z.strictObject({
  action: z.literal('check-in'),
  version,
  locationId: z.preprocess(blankToUndefined, z.uuid({ error: 'Choose a storage place from the list' }).optional()),
  note: z.preprocess(blankToUndefined, note(500).optional()),
})

export const ConsumeAction = z.strictObject({
  action: z.literal('consume'),
  version,
  amount: z.number({ error: 'Enter the amount used as a number' }).gt(0, 'The amount used must be more than 0').max(1e7, 'That amount is not plausible'),
  unit: z.enum(['mg', 'cm2'], { error: 'The unit is mg (mass) or cm2 (area)' }),
  note: z.preprocess(blankToUndefined, note(500).optional()),
})

export const ConditionAction = z.strictObject({
  action: z.literal('condition'),
  version,
  note: z.string({ error: 'Describe the condition' }).trim().min(3, 'Describe the condition (at least 3 characters)').max(2000, 'Use at most 2000 characters'),
})

export const CustodyBody = z.discriminatedUnion('action', [MoveAction, CheckOutAction, CheckInAction, ConsumeAction, ConditionAction], {
  error: `The action is one of: ${CUSTODY_ACTIONS.join(', ')}`,
})
export type CustodyInput = z.input<typeof CustodyBody>
export type CustodyData = z.output<typeof CustodyBody>

export const CUSTODY_KIND_LABELS: Record<string, string> = {
  moved: 'Moved',
  checked_out: 'Checked out',
  checked_in: 'Checked back in',
  consumed: 'Consumption recorded',
  condition: 'Condition noted',
}

/** GET /api/checkouts: the open check-outs, all of them, the caller's own, or the overdue ones. */
export const CHECKOUT_SCOPES = ['mine', 'overdue', 'open'] as const
export const CheckoutListQuery = z.object({
  scope: z.enum(CHECKOUT_SCOPES, { error: `The scope is one of: ${CHECKOUT_SCOPES.join(', ')}` }).default('mine'),
})

/** GET /api/custody/people: the active people a sample can be checked out to, searched by name. */
export const HolderSearchQuery = z.object({ q: z.string().trim().max(80, 'Use at most 80 characters').optional() })
