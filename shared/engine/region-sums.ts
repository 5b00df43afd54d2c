import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import type { Region } from './batten-model.js'

/** Total weight and first moment (about u = 0) of a region's loads. */
export interface RegionSums { weight: Decimal; moment: Decimal }

/**
 * Weight of a region's loads and their moment about the region's origin (u = 0).
 *
 * @example
 * regionSums({ length: Dec(10), points: [{ u: Dec(4), weight: Dec(5) }], spreads: [] }).moment.toString() // '20'
 */
export function regionSums(region: Region): RegionSums {
  let weight = Dec(0)
  let moment = Dec(0)
  for (const { u, weight: p } of region.points) {
    weight = weight.plus(p)
    moment = moment.plus(p.times(u))
  }
  for (const { u1, u2, weightPerLength: w } of region.spreads) {
    weight = weight.plus(w.times(u2.minus(u1)))
    moment = moment.plus(w.times(u2.times(u2).minus(u1.times(u1))).div(2))
  }
  return { weight, moment }
}

/**
 * The load terms of the three-moment equation for one span, 6·A·x̄/L:
 * `right` is taken from the span's left line (used at its right line), `left` the mirror.
 * For a point load P at a (b = L - a): right = P·a·(L² - a²)/L, left = P·b·(L² - b²)/L.
 *
 * @example
 * threeMomentTerms({ length: Dec(10), points: [], spreads: [{ u1: Dec(0), u2: Dec(10), weightPerLength: Dec(1) }] })
 *   .right.toString() // '250' (wL³/4)
 */
export function threeMomentTerms(region: Region): { left: Decimal; right: Decimal } {
  const L = region.length
  const L2 = L.times(L)
  let right = Dec(0)
  let left = Dec(0)
  const term = (a: Decimal) => a.times(L2.minus(a.times(a)))
  const spreadTerm = (a1: Decimal, a2: Decimal) => {
    const s1 = a1.times(a1)
    const s2 = a2.times(a2)
    return L2.times(s2.minus(s1)).div(2).minus(s2.times(s2).minus(s1.times(s1)).div(4))
  }
  for (const { u, weight } of region.points) {
    right = right.plus(weight.times(term(u)))
    left = left.plus(weight.times(term(L.minus(u))))
  }
  for (const { u1, u2, weightPerLength: w } of region.spreads) {
    right = right.plus(w.times(spreadTerm(u1, u2)))
    left = left.plus(w.times(spreadTerm(L.minus(u2), L.minus(u1))))
  }
  return { left: left.div(L), right: right.div(L) }
}
