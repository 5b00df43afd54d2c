import type { ChartOptions, ChartType } from 'chart.js'

/**
 * The options every chart here shares, with its own added: it fills the box it is drawn in (the box sets the
 * height) and draws at once, never animated, so print and a screen reader's table see the final picture.
 *
 * @example
 * chartOptions<'bar'>({ indexAxis: 'y' })
 */
export function chartOptions<Kind extends ChartType>(own: ChartOptions<Kind>): ChartOptions<Kind> {
  return { responsive: true, maintainAspectRatio: false, animation: false, ...own } as ChartOptions<Kind>
}
