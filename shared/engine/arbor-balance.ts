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

/** One brick type on a planned arbor: its unit weight, how many the plan puts aboard, how many were counted. */
export interface PlannedAndRecorded {
  unitWeight: DecimalInput
  planned: number
  recorded: number
}

/**
 * Out of balance at the batten once the arbor holds the recorded counts instead of the plan's, from the plan's
 * own out of balance: the batten side is the same, and the arbor's frame and pipe weight cancel out, so only the
 * bricks that differ move the figure. Positive when the batten side is heavier, as everywhere.
 *
 * @example
 * // Single purchase, planned 3.5 batten heavy; one more 20 brick aboard than planned.
 * outOfBalanceAsRecorded(1, 3.5, [{ unitWeight: 20, planned: 14, recorded: 15 }]).toString() // '-16.5'
 */
export function outOfBalanceAsRecorded(
  ratio: 1 | 2,
  plannedOutOfBalance: DecimalInput,
  bricks: readonly PlannedAndRecorded[],
): Decimal {
  const planned = arborWeight({
    emptyWeight: 0,
    bricks: bricks.map((b) => ({ unitWeight: b.unitWeight, count: b.planned })),
  })
  const recorded = arborWeight({
    emptyWeight: 0,
    bricks: bricks.map((b) => ({ unitWeight: b.unitWeight, count: b.recorded })),
  })
  // The batten side less the fixed arbor weight (stated at the batten) is what the planned bricks left over.
  const battenSideBeyondFixed = Dec(plannedOutOfBalance).plus(planned.div(ratio))
  return outOfBalanceAtBatten(ratio, battenSideBeyondFixed, recorded)
}
