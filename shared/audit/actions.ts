/**
 * What each kind of audit row says, in words: "changed", "checked out", "revoked". A row reads as a
 * sentence: who, the verb, the record ("Ada Quist checked out sample S-2026-000037 Nickel foil").
 * The kinds group actions for the filter on the audit page; sign-ins are a kind of their own,
 * hidden unless asked for, because they outnumber everything else.
 */

export const ACTION_VERBS: Record<string, string> = {
  'sample.created': 'registered',
  'sample.imported': 'registered by CSV import',
  'sample.seeded': 'registered with the demo data',
  'sample.updated': 'changed',
  'sample.retired': 'retired',
  'sample.restored': 'brought back into the stock',
  'sample.datasheet-added': 'added a datasheet to',
  'sample.label-printed': 'printed a label for',
  'sample.import-finished': 'imported samples from a CSV file',
  'sample.custody.moved': 'moved',
  'sample.custody.checked-out': 'checked out',
  'sample.custody.checked-in': 'checked back in',
  'sample.custody.consumed': 'recorded use of',
  'sample.custody.condition': 'noted the condition of',
  'certificate.issued': 'issued',
  'certificate.superseded': 'superseded',
  'certificate.revoked': 'revoked',
  'species.recorded': 'recorded',
  'species.sample-linked': 'linked a sample to',
  'species.sample-unlinked': 'unlinked a sample from',
  'beam_plan.saved': 'saved',
  'location.created': 'created the storage place',
  'user.invited': 'invited',
  'user.invitation-resent': 'sent a new invitation to',
  'user.joined': 'joined as',
  'user.role-changed': 'changed the role of',
  'user.deactivated': 'deactivated',
  'user.reactivated': 'reactivated',
  'user.reset-sent': 'sent a password reset link to',
  'auth.sign-in': 'signed in',
  'auth.sign-out': 'signed out',
  'auth.sign-in-failed': 'failed to sign in',
  'auth.sign-in-refused': 'was refused sign-in (too many attempts)',
  'auth.locked-out': 'was locked out of signing in',
  'auth.password-changed': 'changed their password',
  'auth.password-reset-requested': 'asked for a password reset',
  'auth.password-reset': 'reset their password',
  'audit.exported': 'exported the audit trail',
  'notices.run': 'sent the daily notices',
}

/** The verb of an action; an unknown action is shown as its code. */
export function actionVerb(action: string): string {
  return ACTION_VERBS[action] ?? action
}

/** Kinds of action for the filter: each is a list of action prefixes. */
export const ACTION_KINDS = {
  samples: { label: 'Samples', prefixes: ['sample.created', 'sample.imported', 'sample.seeded', 'sample.updated', 'sample.retired', 'sample.restored', 'sample.datasheet', 'sample.label', 'sample.import'] },
  custody: { label: 'Custody', prefixes: ['sample.custody.'] },
  certificates: { label: 'Certificates', prefixes: ['certificate.'] },
  species: { label: 'Species', prefixes: ['species.'] },
  beam: { label: 'Beam plans', prefixes: ['beam_plan.'] },
  people: { label: 'People', prefixes: ['user.'] },
  'sign-ins': { label: 'Sign-ins and passwords', prefixes: ['auth.'] },
  other: { label: 'Places, notices, exports', prefixes: ['location.', 'notices.', 'audit.'] },
} as const
export type ActionKind = keyof typeof ACTION_KINDS
export const ACTION_KIND_NAMES = Object.keys(ACTION_KINDS) as ActionKind[]

/** Actions that are hidden unless sign-ins are asked for. */
export const SIGN_IN_PREFIX = 'auth.'

/** A record named for people: its code and name, e.g. "sample S-2026-000037 Nickel foil". */
export interface AuditSubject {
  type: string
  id: string | null
  /** the code or number people use: S-2026-000037, C-2026-000004, Fe13+, an e-mail */
  code: string | null
  /** the name beside it, when there is one */
  name: string | null
  /** the page that shows it, when there is one */
  href: string | null
}

const NOUNS: Record<string, string> = { sample: 'sample', certificate: 'certificate', species: 'species', user: '', invitation: '', location: 'place', beam_plan: 'beam plan', sample_import: '', audit_log: '', notices: '' }

/** The record in words: "sample S-2026-000037 Nickel foil", "certificate C-2026-000004". */
export function subjectText(s: AuditSubject | null): string {
  if (!s) return ''
  const noun = NOUNS[s.type] ?? s.type
  const body = [s.code, s.name].filter(Boolean).join(' ') || (s.id ?? '')
  return [noun, body].filter(Boolean).join(' ')
}

/** The whole row as one sentence, without the changes: "Ada Quist changed sample S-2026-000037 Nickel foil". */
export function auditSentence(row: { actorName: string | null; action: string; subject: AuditSubject | null }): string {
  const who = row.actorName ?? 'The system'
  const what = subjectText(row.subject)
  const self = row.action.startsWith('auth.') || row.action === 'audit.exported' || row.action === 'notices.run' || row.action === 'sample.import-finished'
  return self || !what ? `${who} ${actionVerb(row.action)}` : `${who} ${actionVerb(row.action)} ${what}`
}
