import { formatDay } from '#shared/certificates/format'

// The notice mails, each as plain text and HTML. Links lead to the page only: the reader signs
// in there, so a forwarded or leaked mail opens nothing by itself.

interface Mail {
  subject: string
  text: string
  html: string
}

const base = () => String(useRuntimeConfig().public.baseUrl).replace(/\/+$/, '')
const lab = () => String(useRuntimeConfig().public.labName)
const e = (s: string) => escapeHtml(s)
const footer = () => ({
  text: `\n--\nIonfolio, ${lab()}. You receive this as a member of the laboratory's staff; sign in to see the details.`,
  html: `<p style="color:#555;font-size:90%">Ionfolio, ${e(lab())}. You receive this as a member of the laboratory's staff; sign in to see the details.</p>`,
})

/** To the auditors: a certificate was issued (or a corrected version replaced one). */
export function certificateIssuedMail(c: { id: string; number: string; version: number; subjectLabel: string; issuedBy: string; supersedes: string | null; sha256: string }): Mail {
  const link = `${base()}/certificates/${c.id}`
  const what = c.supersedes ? `a corrected version replacing ${c.supersedes}` : 'a new certificate'
  const f = footer()
  return {
    subject: `Certificate ${c.number} issued: ${c.subjectLabel}`,
    text: [`${c.issuedBy} has issued certificate ${c.number}, version ${c.version}, for ${c.subjectLabel} (${what}).`, '', `SHA-256 of its content: ${c.sha256}`, '', `Open it in Ionfolio: ${link}`, f.text].join('\n'),
    html: `<p>${e(c.issuedBy)} has issued certificate <strong>${e(c.number)}</strong>, version ${c.version}, for ${e(c.subjectLabel)} (${e(what)}).</p>
<p>SHA-256 of its content: <code>${e(c.sha256)}</code></p>
<p><a href="${e(link)}">Open it in Ionfolio</a></p>${f.html}`,
  }
}

/** To the auditors: a certificate was revoked. */
export function certificateRevokedMail(c: { id: string; number: string; subjectLabel: string; revokedBy: string; reason: string }): Mail {
  const link = `${base()}/certificates/${c.id}`
  const f = footer()
  return {
    subject: `Certificate ${c.number} revoked: ${c.subjectLabel}`,
    text: [`${c.revokedBy} has revoked certificate ${c.number} for ${c.subjectLabel}.`, `Reason: ${c.reason}`, '', `Open it in Ionfolio: ${link}`, f.text].join('\n'),
    html: `<p>${e(c.revokedBy)} has revoked certificate <strong>${e(c.number)}</strong> for ${e(c.subjectLabel)}.</p>
<p>Reason: ${e(c.reason)}</p>
<p><a href="${e(link)}">Open it in Ionfolio</a></p>${f.html}`,
  }
}

/** To the managers: samples whose re-certify-by date is within 30 days (or already past). */
export function recertificationMail(samples: { id: string; code: string; name: string; recertifyBy: string }[]): Mail {
  const list = `${base()}/samples?due=30`
  const f = footer()
  const line = (s: (typeof samples)[number]) => `${s.code}  ${s.name}  re-certify by ${formatDay(s.recertifyBy)}`
  return {
    subject: samples.length === 1 ? `Re-certification due: ${samples[0]!.code}` : `Re-certification due for ${samples.length} samples`,
    text: [`These samples are due for re-certification within 30 days:`, '', ...samples.map(line), '', `The list in Ionfolio: ${list}`, f.text].join('\n'),
    html: `<p>These samples are due for re-certification within 30 days:</p>
<ul>${samples.map((s) => `<li><a href="${e(`${base()}/samples/${s.id}`)}">${e(s.code)}</a> ${e(s.name)}: re-certify by ${e(formatDay(s.recertifyBy))}</li>`).join('')}</ul>
<p><a href="${e(list)}">The list in Ionfolio</a></p>${f.html}`,
  }
}

/** To the technician who checked it out and the managers: a sample is past its due-back date. */
export function overdueMail(c: { code: string; name: string; holder: string; run: string; dueBack: string; checkedOutBy: string | null }): Mail {
  const link = `${base()}/scan/${encodeURIComponent(c.code)}`
  const f = footer()
  return {
    subject: `Overdue: ${c.code} was due back ${formatDay(c.dueBack)}`,
    text: [`${c.code} (${c.name}) was checked out to ${c.holder} for ${c.run}${c.checkedOutBy ? ` by ${c.checkedOutBy}` : ''} and was due back on ${formatDay(c.dueBack)}.`, '', `Check it back in on its bench card: ${link}`, f.text].join('\n'),
    html: `<p><strong>${e(c.code)}</strong> (${e(c.name)}) was checked out to ${e(c.holder)} for ${e(c.run)}${c.checkedOutBy ? ` by ${e(c.checkedOutBy)}` : ''} and was due back on ${e(formatDay(c.dueBack))}.</p>
<p><a href="${e(link)}">Check it back in on its bench card</a></p>${f.html}`,
  }
}

/** To the managers: a stored file no longer matches the digest its record holds; it was not served. */
export function storeMismatchMail(c: { what: string; label: string; key: string; expected: string; finding: string; at: string }): Mail {
  const f = footer()
  return {
    subject: `Stored file altered or missing: ${c.what} ${c.label}`,
    text: [`At ${c.at} Ionfolio refused to serve the ${c.what} ${c.label}: the object in the file store does not match its record.`, '', `Object key: ${c.key}`, `SHA-256 on record: ${c.expected}`, c.finding, '', 'Nothing was served. Restore the object from a backup and check who can write to the bucket.', f.text].join('\n'),
    html: `<p>At ${e(c.at)} Ionfolio refused to serve the ${e(c.what)} <strong>${e(c.label)}</strong>: the object in the file store does not match its record.</p>
<p>Object key: <code>${e(c.key)}</code><br>SHA-256 on record: <code>${e(c.expected)}</code><br>${e(c.finding)}</p>
<p>Nothing was served. Restore the object from a backup and check who can write to the bucket.</p>${f.html}`,
  }
}
