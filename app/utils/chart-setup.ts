import type { ChartConfiguration, ChartData, LegendItem } from 'chart.js'

// The looks every Ionfolio chart shares (the species and beam pages alike), set once here: our own
// colours, axis titles, and a legend at the bottom that names only the series actually drawn.
// useChart applies withChartDefaults to every chart, after which each chart says only what is its own.

/** Our own colours for the ionisation-energy methods; the reference values are drawn in ink. */
export const METHOD_COLOURS: Readonly<Record<string, string>> = {
  'slater-hydrogenic': '#b45309',
  'slater-total-energy': '#7c3aed',
  'dirac-hydrogen-like': '#0f766e',
  'dirac-qed-hydrogen-like': '#15803d',
  'scf-delta': '#2563eb',
  'scf-eigenvalue': '#db2777',
  'dirac-scf-delta': '#0891b2',
  'dirac-scf-eigenvalue': '#c2410c',
  'dirac-lsd-delta': '#65a30d',
  'dirac-scf-delta-qed': '#4f46e5',
  'hf-delta': '#a21caf',
  'hf-correlated-delta': '#be123c',
}
export const REFERENCE_COLOUR = '#0f172a'
const OTHER_COLOUR = '#64748b'

/** A method's colour (slate for a method the table does not know yet). */
export const methodColour = (method: string): string => METHOD_COLOURS[method] ?? OTHER_COLOUR

/** Colours for series told apart by their order (subshells, formulas), repeating after ten. */
export const SERIES_COLOURS = ['#1e3a8a', '#0f766e', '#b45309', '#7c3aed', '#be123c', '#15803d', '#0369a1', '#a16207', '#6d28d9', '#9f1239'] as const
export const seriesColour = (i: number): string => SERIES_COLOURS[i % SERIES_COLOURS.length]!

/** Hues spread evenly from red to violet over n ordered series, too many for a fixed list (charge states). */
export const spreadColour = (i: number, n: number): string => `hsl(${Math.round((300 * i) / Math.max(n - 1, 1))} 70% 40%)`

/** An axis title. */
export const axisTitle = (text: string) => ({ display: true, text })

type Point = number | null | undefined | { y?: unknown } | [unknown, unknown]

function yOf(p: Point): number | null {
  if (typeof p === 'number') return p
  if (Array.isArray(p)) return typeof p[1] === 'number' ? p[1] : null
  if (p && typeof p === 'object') return typeof p.y === 'number' ? p.y : null
  return null
}

/**
 * Whether a dataset leaves a mark: some value is finite, and positive on a logarithmic value axis
 * (where the rest is not drawn), and not zero in a bar chart (a bar of height zero is not seen).
 */
export function isDrawn(dataset: { data?: readonly unknown[]; type?: string } | undefined, chartType: string, logValueAxis: boolean): boolean {
  const bar = (dataset?.type ?? chartType) === 'bar'
  return (dataset?.data ?? []).some((p) => {
    const y = yOf(p as Point)
    return y !== null && Number.isFinite(y) && (logValueAxis ? y > 0 : !bar || y !== 0)
  })
}

/**
 * The shared set-up, under whatever the chart sets itself: no animation (a redraw on new data is
 * immediate), height from the surrounding box, the legend at the bottom with small swatches,
 * leaving out every series with nothing drawn (the chart's own legend filter still applies).
 */
export function withChartDefaults<T extends ChartConfiguration>(config: T): T {
  const options = (config.options ?? {}) as Record<string, any>
  const plugins = options.plugins ?? {}
  const legend = plugins.legend ?? {}
  const labels = legend.labels ?? {}
  const own = labels.filter as ((item: LegendItem, data: ChartData) => boolean) | undefined
  const logValueAxis = options.scales?.y?.type === 'logarithmic'
  const filter = (item: LegendItem, data: ChartData) =>
    (item.datasetIndex === undefined || isDrawn(data.datasets[item.datasetIndex], config.type, logValueAxis)) && (!own || own(item, data))
  config.options = {
    animation: false,
    maintainAspectRatio: false,
    ...options,
    plugins: { ...plugins, legend: { position: 'bottom', ...legend, labels: { boxWidth: 12, ...labels, filter } } },
  } as T['options']
  return config
}
