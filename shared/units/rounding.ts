import { Dec, type DecimalInput } from './decimal.js'

/**
 * Rounds a figure once, for display or for a JSON answer, half away from zero.
 * Negative zero is returned as 0.
 *
 * @example
 * roundTo('1208.8049', 2) // 1208.8
 */
export function roundTo(value: DecimalInput, places: number): number {
  const rounded = Dec(value).toDecimalPlaces(places, Dec.ROUND_HALF_UP).toNumber()
  return rounded === 0 ? 0 : rounded
}
