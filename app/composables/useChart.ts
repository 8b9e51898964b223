import type { Chart, ChartConfiguration } from 'chart.js'

/**
 * Draws a chart.js chart on `canvas` in the browser only (chart.js is loaded on demand, so the
 * page renders and works without it) and redraws when `config` changes. Every axis gets the
 * shared readable ticks (app/utils/chart-ticks.ts).
 */
export function useChart(canvas: Ref<HTMLCanvasElement | null>, config: () => ChartConfiguration) {
  let chart: Chart | null = null
  onMounted(async () => {
    const { Chart, registerables } = await import('chart.js')
    Chart.register(...registerables)
    if (!canvas.value) return
    chart = new Chart(canvas.value, withReadableTicks(config()))
    watch(config, (raw) => {
      if (!chart) return
      const next = withReadableTicks(raw)
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
