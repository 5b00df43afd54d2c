import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import type { Region } from './batten-model.js'

/**
 * The first four moments of a region's loads about u = 0: Σ P·uᵏ plus ∫ w·uᵏ du, k = 0..3.
 * Weight, moment and the three-moment load terms all follow from them.
 */
export interface RegionMoments { m0: Decimal; m1: Decimal; m2: Decimal; m3: Decimal }

/**
 * Moments of a region's loads. Spread integrals are summed as w·(u2ᵏ⁺¹ − u1ᵏ⁺¹) and divided by k + 1
 * once per region, so the per-load work stays in short exact decimals.
 *
 * @example
 * regionMoments({ length: Dec(10), points: [{ u: Dec(4), weight: Dec(5) }], spreads: [] }).m1.toString() // '20'
 */
export function regionMoments(region: Region): RegionMoments {
  let p0 = Dec(0), p1 = Dec(0), p2 = Dec(0), p3 = Dec(0)
  for (const { u, weight } of region.points) {
    const first = weight.times(u)
    const second = first.times(u)
    p0 = p0.plus(weight)
    p1 = p1.plus(first)
    p2 = p2.plus(second)
    p3 = p3.plus(second.times(u))
  }
  let s1 = Dec(0), s2 = Dec(0), s3 = Dec(0), s4 = Dec(0)
  for (const { u1, u2, weightPerLength: w } of region.spreads) {
    const a2 = u1.times(u1), b2 = u2.times(u2)
    s1 = s1.plus(w.times(u2.minus(u1)))
    s2 = s2.plus(w.times(b2.minus(a2)))
    s3 = s3.plus(w.times(b2.times(u2).minus(a2.times(u1))))
    s4 = s4.plus(w.times(b2.times(b2).minus(a2.times(a2))))
  }
  return { m0: p0.plus(s1), m1: p1.plus(s2.div(2)), m2: p2.plus(s3.div(3)), m3: p3.plus(s4.div(4)) }
}

/** Total weight and first moment (about u = 0) of a region's loads. */
export interface RegionSums { weight: Decimal; moment: Decimal }

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
    left: L2.times(m1).times(2).minus(length.times(m2).times(3)).plus(m3).div(length),
  }
}
