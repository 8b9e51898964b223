import type { Chart, ChartConfiguration } from 'chart.js'

/**
 * Draws a chart.js chart on `canvas` in the browser only (chart.js is loaded on demand, so the
 * page renders and works without it) and redraws when `config` changes. Every chart gets the
 * shared set-up (app/utils/chart-setup.ts) and every axis the shared readable ticks
 * (app/utils/chart-ticks.ts).
 */
export function useChart(canvas: Ref<HTMLCanvasElement | null>, config: () => ChartConfiguration) {
  let chart: Chart | null = null
  const build = (raw: ChartConfiguration) => withReadableTicks(withChartDefaults(raw))
  onMounted(async () => {
    const { Chart, registerables } = await import('chart.js')
    Chart.register(...registerables)
    if (!canvas.value) return
    chart = new Chart(canvas.value, build(config()))
    watch(config, (raw) => {
      if (!chart) return
      const next = build(raw)
      chart.data = next.data
      chart.options = next.options ?? {}
      chart.update()
    })
  })
  onBeforeUnmount(() => {
    chart?.destroy()
    chart = null
  })
}
