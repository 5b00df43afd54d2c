import type { CalculationInput } from '../schemas/calculation.js'
import type { CalculationResult } from '../schemas/calculation-result.js'

/** The out of balance at one place in the batten's travel (positive: batten heavy). */
export interface TravelBalancePoint {
  /** Travel from the in trim, in the input's length unit. */
  travelled: number
  /** Height of the batten when trims are known (in trim plus the travel toward the out trim), else undefined. */
  height?: number
  outOfBalance: number
}

/**
 * The out of balance across the batten's travel, from the in trim to the out trim, for drawing. The engine's
 * out of balance holds at the in trim; flying out moves the lift lines' shift toward the arbor side in
 * proportion to the travel (see `travelShift`), so the batten side grows lighter along a straight line.
 * Undefined without a counterweight, a travel or the lift lines' weight.
 *
 * @example
 * // 4 lb batten heavy at the in trim, a shift of 12 lb over 48 ft: 4 at 0, -2 at 24, -8 at 48
 * travelBalance(input, result, 2)?.map((p) => p.outOfBalance) // [4, -2, -8]
 */
export function travelBalance(
  input: Pick<CalculationInput, 'trims'>,
  result: Pick<CalculationResult, 'counterweight' | 'travel'>,
  steps = 24,
): TravelBalancePoint[] | undefined {
  const { counterweight, travel } = result
  if (!counterweight || travel?.shift === undefined || !(travel.batten > 0)) return undefined
  const trims = input.trims
  const direction = trims && trims.out < trims.in ? -1 : 1
  return Array.from({ length: steps + 1 }, (_, k) => {
    const travelled = (travel.batten * k) / steps
    const point: TravelBalancePoint = {
      travelled,
      outOfBalance: counterweight.outOfBalance - (travel.shift! * k) / steps,
    }
    if (trims) point.height = trims.in + direction * travelled
    return point
  })
}
