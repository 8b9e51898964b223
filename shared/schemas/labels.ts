import { z } from 'zod'

/** The most labels one request prints (ten A4 sheets). */
export const LABELS_MAX = 300

/** POST /api/labels: the samples in print order (a sample may repeat for several containers) and the layout. */
export const LabelsBody = z.strictObject({
  sampleIds: z.array(z.uuid({ error: 'Not a valid sample id' }), { error: 'Give the samples as a list of ids' }).min(1, 'Choose at least one sample').max(LABELS_MAX, `At most ${LABELS_MAX} labels at once`),
  layout: z.enum(['single', 'sheet'], { error: 'The layout is single or sheet' }).default('sheet'),
  /** Print even though the public address is a loopback one (the QR codes will not open on a phone). */
  allowLoopback: z.boolean({ error: 'allowLoopback is true or false' }).default(false),
})
