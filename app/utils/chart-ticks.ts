import type { ChartConfiguration } from 'chart.js'

// Compact numbers for axis labels: 7000 → "7k", 100000 → "100k", 0.05 → "0.05", never
// "100,000.0". Short labels are what keeps neighbours from running into each other.
// Written out here rather than by Intl's compact notation, whose letters differ between engines.
const short = (v: number) => String(Number(v.toPrecision(3)))
export function tickText(v: number): string {
  if (v === 0) return '0'
  const a = Math.abs(v)
  if (a >= 1e6) return `${short(v / 1e6)}M`
  if (a >= 1e4) return `${short(v / 1e3)}k`
  if (a < 1e-3) return v.toExponential(1)
  return short(v)
}

const leading = (v: number) => Number((v / 10 ** Math.floor(Math.log10(v) + 1e-9)).toPrecision(3))
const major = (v: number) => [1, 2, 5].includes(leading(v))

/**
 * On a logarithmic axis only 1, 2 and 5 × 10ⁿ are labelled, the other grid lines stay
 * unlabelled; on an axis spanning too little for three such labels, every tick is labelled.
 */
export function logTickText(v: number, all: readonly number[] = []): string {
  if (all.length && all.filter(major).length < 3) return tickText(v)
  return major(v) ? tickText(v) : ''
}

/**
 * Every chart's axes get readable ticks, set once here rather than per chart: horizontal labels,
 * skipped when they would touch (with a gap), a bounded count, and compact numbers.
 */
export function withReadableTicks<T extends ChartConfiguration>(config: T): T {
  const scales = ((config.options ??= {}) as { scales?: Record<string, Record<string, any>> }).scales ?? {}
  ;(config.options as any).scales = scales
  for (const id of ['x', 'y', ...Object.keys(scales)]) {
    const s = (scales[id] ??= {})
    const log = s.type === 'logarithmic'
    const category = !s.type && id === 'x' && config.type !== 'scatter'
    s.ticks = {
      autoSkip: true,
      autoSkipPadding: 12,
      maxRotation: 0,
      ...(category ? {} : { maxTicksLimit: id === 'x' ? 8 : 7, callback: (v: number | string, _i: number, ticks: { value: number }[]) => (typeof v === 'number' ? (log ? logTickText(v, ticks.map((t) => t.value)) : tickText(v)) : v) }),
      ...s.ticks,
    }
  }
  return config
}
