import { Dec, type DecimalInput } from '../units/index.js'
import type { Decimal } from 'decimal.js'

/** What an arbor carries: its frame, any pipe weight kept aboard, and counted bricks of known weight. */
export interface ArborLoad {
  emptyWeight: DecimalInput
  pipeWeightAboard?: DecimalInput | null
  bricks: ReadonlyArray<{ unitWeight: DecimalInput; count: number }>
}

/**
 * The arbor side's weight: frame + pipe weight aboard + every brick counted on it.
 *
 * @example
 * arborWeight({ emptyWeight: 90, pipeWeightAboard: 110, bricks: [{ unitWeight: 20, count: 10 }] }).toString() // '400'
 */
export function arborWeight(arbor: ArborLoad): Decimal {
  return arbor.bricks.reduce(
    (sum, brick) => sum.plus(Dec(brick.unitWeight).times(brick.count)),
    Dec(arbor.emptyWeight).plus(arbor.pipeWeightAboard ?? 0),
  )
}

/**
 * Out of balance stated at the batten, (ratio × batten side − arbor side) ÷ ratio: positive when the batten
 * side is heavier. The ratio is 1 for single purchase and 2 for double (the arbor must weigh twice the batten side).
 *
 * @example
 * outOfBalanceAtBatten(2, 500, 980).toString() // '10'
 */
export function outOfBalanceAtBatten(ratio: 1 | 2, battenSide: DecimalInput, arborSide: DecimalInput): Decimal {
  return Dec(battenSide).times(ratio).minus(arborSide).div(ratio)
}
