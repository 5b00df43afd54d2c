import type { Quantity, UnitSystem } from '../../shared/units/index.js'
import { formatFigure } from './figures'
import { dayAndTime } from './moments'

const SECOND = 1000
// Each step: up to how many milliseconds it is used, and the unit it counts in.
const STEPS: Array<[number, Intl.RelativeTimeFormatUnit, number]> = [
  [60 * SECOND, 'second', SECOND],
  [60 * 60 * SECOND, 'minute', 60 * SECOND],
  [24 * 60 * 60 * SECOND, 'hour', 60 * 60 * SECOND],
  [7 * 24 * 60 * 60 * SECOND, 'day', 24 * 60 * 60 * SECOND],
  [30 * 24 * 60 * 60 * SECOND, 'week', 7 * 24 * 60 * 60 * SECOND],
  [365 * 24 * 60 * 60 * SECOND, 'month', 30 * 24 * 60 * 60 * SECOND],
  [Infinity, 'year', 365 * 24 * 60 * 60 * SECOND],
]
const relative = new Intl.RelativeTimeFormat('en', { numeric: 'auto' })

/**
 * When something happened, in words: how long ago ("3 hours ago", "yesterday") and the date and time itself,
 * in the browser's time zone unless one is given.
 *
 * @example
 * timeInWords('2025-05-12T12:00:00Z', { now: new Date('2025-05-12T15:00:00Z'), timeZone: 'UTC' })
 * // { ago: '3 hours ago', at: '12 May 2025, 12:00' }
 */
export function timeInWords(iso: string, { now = new Date(), timeZone }: { now?: Date; timeZone?: string } = {}) {
  const when = new Date(iso)
  const elapsed = now.getTime() - when.getTime()
  const [, unit, size] = STEPS.find(([limit]) => Math.abs(elapsed) < limit)!
  const ago = Math.abs(elapsed) < 45 * SECOND ? 'just now' : relative.format(-Math.round(elapsed / size), unit)
  return { ago, at: dayAndTime(when, timeZone) }
}

/**
 * A difference with its sign (minus as the typographic minus), by the app's one display rule.
 *
 * @example
 * signedFigure(28, 'weight', 'imperial') // '+28 lb'
 * signedFigure(-3.5, 'weight', 'metric') // '−3.5 kg'
 * signedFigure(0.001, 'weight', 'metric') // '±0 kg'
 */
export function signedFigure(change: number | null, quantity: Quantity, units: UnitSystem): string {
  if (change === null) return '—'
  const size = formatFigure(Math.abs(change), quantity, units)
  if (size.startsWith('0 ')) return `±${size}`
  return `${change > 0 ? '+' : '−'}${size}`
}

/**
 * A difference in a count (bricks, items) with its sign.
 *
 * @example
 * signedCount(-1) // '−1'
 */
export const signedCount = (change: number) => (change === 0 ? '±0' : `${change > 0 ? '+' : '−'}${Math.abs(change)}`)
