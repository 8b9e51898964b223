import { describe, it, expect } from 'vitest'
import { describeChanges, changeText, showValue } from '../../../shared/audit/changes'
import { auditSentence, subjectText } from '../../../shared/audit/actions'
import { formatDay, formatWhen } from '../../../shared/format/datetime'
import { guardCell, unguardCell } from '../../../shared/csv/safe'

describe('one date format (ISO 8601 date, 24-hour time, zone named)', () => {
  it.each([
    ['2026-12-02T15:42:07.123Z', 'UTC', '2026-12-02 15:42 UTC'],
    ['2026-12-02T23:30:00Z', 'Europe/Berlin', '2026-12-03 00:30 Europe/Berlin'],
    // 2026-07-01 is summer time in Berlin, UTC+2 (IANA tz database, zone Europe/Berlin)
    ['2026-07-01T12:00:00Z', 'Europe/Berlin', '2026-07-01 14:00 Europe/Berlin'],
    ['2026-03-01T00:05:00Z', 'America/New_York', '2026-02-28 19:05 America/New_York'],
  ])('%s in %s → %s', (at, zone, text) => {
    expect(formatWhen(at, { zone })).toBe(text)
  })
  it('keeps plain days as they are and writes nothing for missing ones', () => {
    expect(formatDay('2027-01-15')).toBe('2027-01-15')
    expect(formatDay('2026-12-02T23:30:00Z', 'Europe/Berlin')).toBe('2026-12-03')
    expect(formatWhen(null)).toBe('—')
    expect(formatWhen('not a date')).toBe('—')
    expect(formatWhen('2026-12-02T15:42:07Z', { seconds: true, zone: 'UTC' })).toBe('2026-12-02 15:42:07 UTC')
  })
})

describe('changes as "field: old → new" lines', () => {
  it('lists only fields that differ, in words, hiding book-keeping', () => {
    const before = { id: 'x', version: 3, name: 'Nickel foil', massMg: 12.5, radioactive: false, notes: null, updatedAt: '2026-01-01T00:00:00Z' }
    const after = { id: 'x', version: 4, name: 'Nickel foil, rolled', massMg: 12.5, radioactive: true, notes: 'kept dry', updatedAt: '2026-02-01T00:00:00Z' }
    expect(changeText(before, after)).toBe(['name: Nickel foil → Nickel foil, rolled', 'radioactive: no → yes', 'notes: — → kept dry'].join('\n'))
  })
  it('names a storage place by its path, not its id', () => {
    const lines = describeChanges({ locationId: 'a', location: { path: 'R1 / Cab 2' } }, { locationId: 'b', location: { path: 'R2 / Desiccator' } })
    expect(lines).toEqual([{ field: 'locationId', label: 'storage place', before: 'R1 / Cab 2', after: 'R2 / Desiccator' }])
  })
  it('writes a composition as its CSV cell and lists as words', () => {
    expect(showValue([{ z: 20, massNumber: 48, fraction: 1, enrichmentPercent: 97.8 }])).toBe('Ca-48 1 enr 97.8%')
    expect(showValue(['H350i', 'H317'])).toBe('H350i, H317')
    expect(showValue({ fileName: 'cert.pdf', size: 3 })).toBe('cert.pdf')
  })
  it('reads a creation as "— → value" and a removal as "value → —"', () => {
    expect(changeText(null, { role: 'auditor' })).toBe('role: — → auditor')
    expect(changeText({ sample: 'S-2026-000001' }, null)).toBe('sample: S-2026-000001 → —')
    expect(changeText(null, null)).toBe('')
  })
})

describe('rows as sentences', () => {
  it('names the person, the verb and the record by code and name', () => {
    const subject = { type: 'sample', id: 'u', code: 'S-2026-000037', name: 'Nickel foil', href: '/samples/u' }
    expect(subjectText(subject)).toBe('sample S-2026-000037 Nickel foil')
    expect(auditSentence({ actorName: 'Ada Quist', action: 'sample.custody.checked-out', subject })).toBe('Ada Quist checked out sample S-2026-000037 Nickel foil')
    expect(auditSentence({ actorName: null, action: 'auth.sign-in-failed', subject: null })).toBe('The system failed to sign in')
  })
})

describe('CSV cells that would run as formulas', () => {
  it.each([
    ['=1+1', "'=1+1"], ['+cmd', "'+cmd"], ['-2+3', "'-2+3"], ['@SUM(A1)', "'@SUM(A1)"], ['\tx', "'\tx"], ['\rx', "'\rx"],
    ["'=x", "''=x"], ['-3.5', '-3.5'], ['+1', '+1'], ['-', '-'], ['1e-3', '1e-3'], ['Ca-48 0.2 enr 97.8%', 'Ca-48 0.2 enr 97.8%'], ["it's", "it's"], ['', ''],
  ])('%j is written %j and read back unchanged', (cell, written) => {
    expect(guardCell(cell)).toBe(written)
    expect(unguardCell(guardCell(cell))).toBe(cell)
  })
  it('leaves an apostrophe that writing did not add', () => {
    expect(unguardCell("'hello")).toBe("'hello")
    expect(unguardCell("'-5")).toBe("'-5")
  })
})
