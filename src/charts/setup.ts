import {
  BarController,
  BarElement,
  CategoryScale,
  Chart,
  Filler,
  Legend,
  LineController,
  LineElement,
  LinearScale,
  PointElement,
  Tooltip,
} from 'chart.js'

// Only what the three charts draw: lines (travel), bars (line loads, stock), their scales, the band fill and labels.
Chart.register(
  BarController,
  BarElement,
  CategoryScale,
  Filler,
  Legend,
  LineController,
  LineElement,
  LinearScale,
  PointElement,
  Tooltip,
)
Chart.defaults.font.family = 'Roboto, sans-serif'
Chart.defaults.color = '#1b1b1b'

/** Chart colours: each at least 4.5:1 on white (WCAG AA) except the fills, which always carry a dark edge. */
export const CHART_COLOURS = {
  ink: '#1b1b1b',
  slate: '#1f3a4d',
  brass: '#7a5518',
  teal: '#2d6a8a',
  danger: '#b3261e',
  band: 'rgba(46, 125, 79, 0.16)',
  bandEdge: '#2e7d4f',
  grid: '#d5d0c4',
} as const

/**
 * A fill with a pattern of its own, so two series never differ by colour alone (stripes, dots or solid).
 * Falls back to the plain colour where a canvas cannot be made.
 */
export function patternFill(colour: string, kind: 'solid' | 'stripes' | 'dots'): string | CanvasPattern {
  if (kind === 'solid' || typeof document === 'undefined') return colour
  const tile = document.createElement('canvas')
  tile.width = tile.height = 8
  const pen = tile.getContext('2d')
  if (!pen) return colour
  pen.fillStyle = '#ffffff'
  pen.fillRect(0, 0, 8, 8)
  pen.fillStyle = colour
  pen.strokeStyle = colour
  if (kind === 'stripes') {
    pen.lineWidth = 2.5
    pen.beginPath()
    pen.moveTo(0, 8)
    pen.lineTo(8, 0)
    pen.stroke()
  } else {
    pen.beginPath()
    pen.arc(4, 4, 2, 0, Math.PI * 2)
    pen.fill()
  }
  return pen.createPattern(tile, 'repeat') ?? colour
}
