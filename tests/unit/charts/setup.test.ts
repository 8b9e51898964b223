import { describe, expect, it } from 'vitest'
import { axisTitle, isDrawn, methodColour, REFERENCE_COLOUR, seriesColour, spreadColour, withChartDefaults } from '../../../app/utils/chart-setup'
import { METHOD_NAMES } from '../../../shared/physics/methods'

// The legend's filter as chart.js calls it: once per dataset, with the chart's data.
function legendNames(config: any): string[] {
  const filter = config.options.plugins.legend.labels.filter
  return config.data.datasets
    .map((d: any, i: number) => ({ text: d.label, datasetIndex: i }))
    .filter((item: any) => filter(item, config.data))
    .map((item: any) => item.text)
}

describe('the set-up every chart shares', () => {
  it('gives a chart no animation, the height of its box and a legend at the bottom, under its own settings', () => {
    const c = withChartDefaults({ type: 'line', data: { datasets: [] }, options: { interaction: { mode: 'index' }, plugins: { title: { display: true, text: 'x' } } } } as any) as any
    expect(c.options).toMatchObject({ animation: false, maintainAspectRatio: false, interaction: { mode: 'index' } })
    expect(c.options.plugins.title.text).toBe('x')
    expect(c.options.plugins.legend).toMatchObject({ position: 'bottom', labels: { boxWidth: 12 } })
    const own = withChartDefaults({ type: 'line', data: { datasets: [] }, options: { animation: { duration: 5 }, plugins: { legend: { position: 'right', labels: { boxWidth: 10 } } } } } as any) as any
    expect(own.options.animation).toEqual({ duration: 5 })
    expect(own.options.plugins.legend).toMatchObject({ position: 'right', labels: { boxWidth: 10 } })
  })

  it('names in the legend only the series that leave a mark', () => {
    const line = withChartDefaults({
      type: 'line',
      data: {
        labels: ['1', '2'],
        datasets: [
          { label: 'drawn', data: [null, 3] },
          { label: 'all missing', data: [null, null] },
          { label: 'not finite', data: [Number.NaN, Number.POSITIVE_INFINITY] },
          { label: 'zero on a linear axis', data: [0, 0] },
          { label: 'points', data: [{ x: 1, y: 2 }] },
          { label: 'points without y', data: [{ x: 1, y: null }] },
          { label: 'empty', data: [] },
        ],
      },
    } as any)
    expect(legendNames(line)).toEqual(['drawn', 'zero on a linear axis', 'points'])

    // On a logarithmic value axis nothing at or below zero is drawn.
    const log = withChartDefaults({
      type: 'scatter',
      data: { datasets: [{ label: 'positive', data: [{ x: 1, y: 5 }] }, { label: 'non-positive', data: [{ x: 1, y: 0 }, { x: 2, y: -1 }] }] },
      options: { scales: { y: { type: 'logarithmic' } } },
    } as any)
    expect(legendNames(log)).toEqual(['positive'])

    // A bar of height zero is not seen: a formula with no fraction anywhere is left out.
    const bars = withChartDefaults({ type: 'bar', data: { labels: ['1+', '2+'], datasets: [{ label: 'A', data: [0, 40] }, { label: 'B', data: [0, 0] }] } } as any)
    expect(legendNames(bars)).toEqual(['A'])
  })

  it('keeps a chart\'s own legend filter and applies both', () => {
    const c = withChartDefaults({
      type: 'line',
      data: { datasets: [{ label: 'a', data: [1] }, { label: 'b', data: [1] }, { label: 'c', data: [null] }] },
      options: { plugins: { legend: { labels: { filter: (item: any) => item.text !== 'a' } } } },
    } as any)
    expect(legendNames(c)).toEqual(['b'])
  })

  it('isDrawn reads a dataset\'s own type in a mixed chart', () => {
    expect(isDrawn({ type: 'bar', data: [0] }, 'line', false)).toBe(false)
    expect(isDrawn({ data: [0] }, 'line', false)).toBe(true)
    expect(isDrawn(undefined, 'line', false)).toBe(false)
  })

  it('colours: one per method, one per place in order, hues spread over many states', () => {
    expect(methodColour('scf-delta')).not.toBe(methodColour('scf-eigenvalue'))
    expect(methodColour('a-method-not-yet-coloured')).toBe('#64748b')
    expect(new Set(Array.from({ length: 10 }, (_, i) => seriesColour(i))).size).toBe(10)
    expect(seriesColour(10)).toBe(seriesColour(0))
    expect(spreadColour(0, 5)).toBe('hsl(0 70% 40%)')
    expect(spreadColour(4, 5)).toBe('hsl(300 70% 40%)')
    expect(spreadColour(0, 1)).toBe('hsl(0 70% 40%)')
    expect(axisTitle('r / bohr')).toEqual({ display: true, text: 'r / bohr' })
  })

  it('gives every ionisation-energy method of the engine a colour of its own, none the reference ink', () => {
    const colours = METHOD_NAMES.map((m) => methodColour(m))
    expect(colours).not.toContain('#64748b')
    expect(new Set(colours).size).toBe(METHOD_NAMES.length)
    expect(colours).not.toContain(REFERENCE_COLOUR)
  })
})
