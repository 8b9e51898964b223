/**
 * The technician's actions on a sample (POST /api/samples/:id/custody), one schema per action in
 * a discriminated union on `action`. Each carries the sample version it was made against.
 */
import { z } from 'zod'

const version = z.number({ error: 'Send the version of the sample you acted on (a whole number)' }).int().min(1)
const note = (max: number) => z.string().trim().max(max, `Use at most ${max} characters`)
const blankToUndefined = (v: unknown) => (v === '' || v === null ? undefined : v)

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
  holder: z.string({ error: 'Say who takes it' }).trim().min(2, 'Say who takes it').max(120, 'Use at most 120 characters'),
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
  amount: z.number({ error: 'Enter the amount used as a number' }).gt(0, 'The amount used is more than 0').max(1e7, 'That amount is not plausible'),
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
