import { describe, it, expect } from 'vitest'
import { reconcile } from '../../../shared/storage/reconcile'

const now = new Date('2026-12-02T12:00:00Z')
const ago = (minutes: number) => new Date(now.getTime() - minutes * 60_000)
const obj = (key: string, minutes: number | null) => ({ key, size: 10, lastModified: minutes === null ? null : ago(minutes) })

describe('reconcile (object store against rows)', () => {
  it('finds old unreferenced objects and rows whose object is missing, and nothing else', () => {
    const r = reconcile(
      [obj('datasheets/a', 600), obj('certificates/b', 600), obj('datasheets/orphan', 120), obj('datasheets/young', 5), obj('datasheets/undated', null)],
      [
        { key: 'datasheets/a', table: 'datasheets', id: '1' },
        { key: 'certificates/b', table: 'certificates', id: '2' },
        { key: 'certificates/gone', table: 'certificates', id: '3' },
      ],
      { now, graceMs: 3_600_000 },
    )
    expect(r.orphans.map((o) => o.key)).toEqual(['datasheets/orphan'])
    // An upload stores its object before its row: a young or undated object is never called an orphan.
    expect(r.recent.map((o) => o.key)).toEqual(['datasheets/undated', 'datasheets/young'])
    expect(r.missing).toEqual([{ key: 'certificates/gone', table: 'certificates', id: '3' }])
    expect(r).toMatchObject({ objects: 5, references: 3 })
  })

  it('with no grace, every unreferenced dated object is an orphan', () => {
    const r = reconcile([obj('x', 0), obj('y', 1)], [], { now, graceMs: 0 })
    expect(r.orphans.map((o) => o.key)).toEqual(['x', 'y'])
    expect(r.missing).toEqual([])
  })

  it('reports nothing when store and rows agree', () => {
    const r = reconcile([obj('k', 999)], [{ key: 'k', table: 'datasheets', id: '1' }], { now })
    expect(r).toMatchObject({ orphans: [], recent: [], missing: [] })
  })
})
