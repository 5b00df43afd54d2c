import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import type { Region } from './batten-model.js'
import { totalSums } from './region-loads.js'

/**
 * The first four moments of a region's loads about u = 0: Σ P·uᵏ plus ∫ w·uᵏ du, k = 0..3.
 * Weight, moment and the three-moment load terms all follow from them.
 */
export interface RegionMoments {
  m0: Decimal
  m1: Decimal
  m2: Decimal
  m3: Decimal
}

const TWO = Dec(2)
const THREE = Dec(3)
// x·0.5 and x·0.25 round the same real number as x/2 and x/4, at a fraction of a division's cost.
const HALF = Dec('0.5')
const QUARTER = Dec('0.25')

/**
 * Moments of a region's loads, read from its running sums (see `LoadSums` in region-loads.ts). Spread integrals
 * ∫ w·uᵏ du = w·(u2ᵏ⁺¹ − u1ᵏ⁺¹)/(k + 1) are summed over the loads and divided by k + 1 once per
 * region, so the per-load work stays in short exact decimals.
 *
 * @example
 * regionMoments(buildBattenModel({ length: 10, pickPoints: [0, 10], points: [{ at: 4, weight: 5 }], spreads: [] })
 *   .spans[0]!).m1.toString() // '20'
 */
export function regionMoments(region: Region): RegionMoments {
  const { points, steps } = totalSums(region.sums)
  // The steps' sums are −Σ w·(u2ᵏ − u1ᵏ): subtract them.
  return {
    m0: points[0]!.minus(steps[1]!),
    m1: points[1]!.minus(steps[2]!.times(HALF)),
    m2: points[2]!.minus(steps[3]!.div(THREE)),
    m3: points[3]!.minus(steps[4]!.times(QUARTER)),
  }
}

/** Total weight and first moment (about u = 0) of a region's loads. */
export interface RegionSums {
  weight: Decimal
  moment: Decimal
}

/**
 * Weight of a region's loads and their moment about the region's origin (u = 0).
 *
 * @example
 * regionSums(regionMoments(region)).weight
 */
export function regionSums(moments: RegionMoments): RegionSums {
  return { weight: moments.m0, moment: moments.m1 }
}

/**
 * The load terms of the three-moment equation for one span, 6·A·x̄/L. For a point load P at a
 * (b = L − a): right = P·a·(L² − a²)/L, taken from the left line; left = P·b·(L² − b²)/L, the mirror.
 * Expanded in the load moments: right = (L²·m1 − m3)/L, left = (2L²·m1 − 3L·m2 + m3)/L.
 *
 * @example
 * // 1 per length over a span of 10: both terms wL³/4 = 250
 * threeMomentTerms(Dec(10), regionMoments(span)).right.toString() // '250'
 */
export function threeMomentTerms(length: Decimal, moments: RegionMoments): { left: Decimal; right: Decimal } {
  const L2 = length.times(length)
  const { m1, m2, m3 } = moments
  return {
    right: L2.times(m1).minus(m3).div(length),
    left: L2.times(m1).times(TWO).minus(length.times(m2).times(THREE)).plus(m3).div(length),
  }
}
