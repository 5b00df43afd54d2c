import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'

/**
 * Balance shift from the lift lines' own weight over a batten travel d, stated at the batten:
 * 2·n·w·d single purchase, 1.5·n·w·d double purchase (derived from the potential energy of the
 * hanging rope; no published table). Flying out moves that weight toward the arbor side.
 *
 * @example
 * travelShift({ ratio: 1, lines: 5, lineWeightPerLength: 0.11, travel: 50 }).toString() // '55'
 */
export function travelShift(options: {
  ratio: 1 | 2
  lines: number
  lineWeightPerLength: Decimal.Value
  travel: Decimal.Value
}): Decimal {
  const factor = options.ratio === 2 ? Dec('1.5') : Dec(2)
  return factor.times(options.lines).times(options.lineWeightPerLength).times(options.travel)
}

/**
 * Batten travel from an explicit travel or from the in and out trims.
 *
 * @example
 * battenTravel({ trims: { in: 4, out: 52 } })?.toString() // '48'
 */
export function battenTravel(input: { travel?: number; trims?: { in: number; out: number } }): Decimal | undefined {
  if (input.travel !== undefined) return Dec(input.travel)
  if (input.trims) return Dec(input.trims.out).minus(input.trims.in).abs()
  return undefined
}

/**
 * Arbor travel: batten travel divided by the purchase ratio.
 *
 * @example
 * arborTravel(Dec(48), 2).toString() // '24'
 */
export function arborTravel(travel: Decimal, ratio: 1 | 2): Decimal {
  return travel.div(ratio)
}
