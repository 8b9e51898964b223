import { describe, expect, it } from 'vitest'
import { logTickText, tickText, withReadableTicks } from '../../../app/utils/chart-ticks'

describe('readable chart ticks', () => {
  it('writes numbers short: no thousands separators piling up, no trailing .0', () => {
    expect(tickText(100000)).toBe('100k')
    expect(tickText(50000)).toBe('50k')
    expect(tickText(7000)).toBe('7000')
    expect(tickText(12.5)).toBe('12.5')
    expect(tickText(0)).toBe('0')
  })
  it('labels only 1, 2 and 5 × 10ⁿ on a logarithmic axis, so 7 000 never sits under 10 000', () => {
    const shown = [1000, 2000, 3000, 5000, 7000, 9000, 10000, 20000].map((v) => logTickText(v))
    expect(shown).toEqual(['1000', '2000', '', '5000', '', '', '10k', '20k'])
  })
  it('labels every tick of a log axis spanning less than a decade (200 to 500 eV)', () => {
    const ticks = [200, 300, 400, 500]
    expect(ticks.map((t) => logTickText(t, ticks))).toEqual(['200', '300', '400', '500'])
  })
  it('keeps the tick settings of a chart and adds the shared ones to every axis', () => {
    const c = withReadableTicks({ type: 'line', data: { datasets: [] }, options: { scales: { y: { type: 'logarithmic', ticks: { color: 'red' } } } } } as any)
    const y = (c.options as any).scales.y.ticks
    expect(y).toMatchObject({ color: 'red', autoSkip: true, maxRotation: 0 })
    expect(y.callback(3000, 2, [1000, 2000, 3000, 5000, 10000].map((value) => ({ value })))).toBe('')
    expect((c.options as any).scales.x.ticks.maxRotation).toBe(0)
  })
})
