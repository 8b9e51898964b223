import type { Chart, ChartConfiguration } from 'chart.js'

/**
 * Draws a chart.js chart on `canvas` in the browser only (chart.js is loaded on demand, so the
 * page renders and works without it) and redraws when `config` changes.
 */
export function useChart(canvas: Ref<HTMLCanvasElement | null>, config: () => ChartConfiguration) {
  let chart: Chart | null = null
  onMounted(async () => {
    const { Chart, registerables } = await import('chart.js')
    Chart.register(...registerables)
    if (!canvas.value) return
    chart = new Chart(canvas.value, config())
    watch(config, (next) => {
      if (!chart) return
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
