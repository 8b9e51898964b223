import { describe, expect, it } from 'vitest'
import { GHS_RED, ghsDiamondVectors } from '../../../server/pdf/ghs-diamonds'
import { PICTOGRAM_NAMES, type Pictogram } from '../../../shared/labels/pictograms'

// UN GHS Rev. 10 (2023), Annex 3, Section 4: a black symbol on a white ground within a red
// frame, a square set at a point (a diamond). These check the frame rule, for every pictogram.
describe('GHS pictograms drawn as diamonds', () => {
  it.each(Object.keys(PICTOGRAM_NAMES) as Pictogram[])('%s: a red-framed white diamond with a black symbol inside it', (code) => {
    const size = 20
    const v = ghsDiamondVectors(code, 100, 200, size) as any[]
    const frame = v[0]
    expect(frame).toMatchObject({ type: 'polyline', closePath: true, color: '#ffffff', lineColor: GHS_RED })
    // Set on a point: top, right, bottom and left vertices on the box's midlines.
    const [top, right, bottom, left] = frame.points
    expect(top.x).toBeCloseTo(110)
    expect(bottom.x).toBeCloseTo(110)
    expect(left.y).toBeCloseTo(210)
    expect(right.y).toBeCloseTo(210)
    expect(bottom.y - top.y).toBeGreaterThan(size * 0.9)
    const symbol = v.slice(1)
    expect(symbol.length).toBeGreaterThan(0)
    expect(symbol.some((s) => s.color === '#000000' || s.lineColor === '#000000')).toBe(true)
    // Every point of the symbol lies inside the diamond (|dx| + |dy| within half the size).
    for (const s of symbol) {
      const pts = s.type === 'path' ? [...s.d.matchAll(/(-?[\d.]+) (-?[\d.]+)(?=[LZA]|$)/g)].map((m: RegExpMatchArray) => ({ x: Number(m[1]), y: Number(m[2]) })) : (s.points ?? (s.type === 'line' ? [{ x: s.x1, y: s.y1 }, { x: s.x2, y: s.y2 }] : [{ x: s.x, y: s.y }]))
      for (const p of pts) expect(Math.abs(p.x - 110) + Math.abs(p.y - 210)).toBeLessThan(size / 2 - size / 12)
    }
  })

  it('draws different symbols for different pictograms', () => {
    const shapes = (Object.keys(PICTOGRAM_NAMES) as Pictogram[]).map((c) => JSON.stringify(ghsDiamondVectors(c, 0, 0, 10).slice(1)))
    expect(new Set(shapes).size).toBe(9)
  })
})
