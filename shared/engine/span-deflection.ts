import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import type { Region } from './batten-model.js'
import type { RegionMoments } from './region-sums.js'

/**
 * The deflected shape of one span between two lines, as EI·y (up positive) in the input's
 * weight and length units, from its left-line moment M0 and shear V0 (Macaulay's method, y = 0 at both lines).
 */
export class SpanShape {
  private readonly constant: Decimal
  constructor(
    private readonly span: Region,
    private readonly startMoment: Decimal,
    private readonly startShear: Decimal,
    private readonly moments: RegionMoments,
  ) {
    // At u = L every load is to the left: Σ P(L − u)³/6 = (L³m0 − 3L²m1 + 3Lm2 − m3)/6 over the load moments.
    const L = span.length
    const L2 = L.times(L)
    const { m0, m1, m2, m3 } = moments
    const loads = L2.times(L).times(m0).minus(L2.times(m1).times(3)).plus(L.times(m2).times(3)).minus(m3).div(6)
    const atEnd = startMoment.times(L2).div(2).plus(startShear.times(L2).times(L).div(6)).minus(loads)
    this.constant = atEnd.div(L).neg()
  }

  /** EI·y at u (decimal). */
  at(u: Decimal): Decimal {
    return this.withoutConstant(u).plus(this.constant.times(u))
  }

  /** EI·dy/du at u = 0 and u = L. */
  endSlopes(): { start: Decimal; end: Decimal } {
    // Σ P(L − u)²/2 = (L²m0 − 2Lm1 + m2)/2 over the load moments.
    const L = this.span.length
    const { m0, m1, m2 } = this.moments
    const loads = L.times(L).times(m0).minus(L.times(m1).times(2)).plus(m2).div(2)
    const slope = this.startMoment.times(L).plus(this.startShear.times(L).times(L).div(2)).minus(loads)
    return { start: this.constant, end: slope.plus(this.constant) }
  }

  /** Where |y| is largest: sampled at sixteenths, then narrowed by golden-section search (floating point, location only). */
  largestAt(): Decimal {
    const L = this.span.length.toNumber()
    const f = this.floatShape()
    let bestIndex = 8
    for (let j = 1; j < 16; j++) if (Math.abs(f((j * L) / 16)) > Math.abs(f((bestIndex * L) / 16))) bestIndex = j
    let low = ((bestIndex - 1) * L) / 16
    let high = ((bestIndex + 1) * L) / 16
    const ratio = (Math.sqrt(5) - 1) / 2
    for (let i = 0; i < 32; i++) {
      const a = high - ratio * (high - low)
      const b = low + ratio * (high - low)
      if (Math.abs(f(a)) >= Math.abs(f(b))) high = b
      else low = a
    }
    return Dec(((low + high) / 2).toFixed(6))
  }

  private withoutConstant(u: Decimal): Decimal {
    const u2 = u.times(u)
    let value = this.startMoment.times(u2).div(2).plus(this.startShear.times(u2).times(u).div(6))
    let pointSum = Dec(0)
    let spreadSum = Dec(0)
    for (const point of this.span.points) {
      if (!point.u.lt(u)) continue
      const d = u.minus(point.u)
      pointSum = pointSum.plus(point.weight.times(d.times(d).times(d)))
    }
    for (const { u1, u2: end, weightPerLength: w } of this.span.spreads) {
      if (u1.gte(u)) continue
      const a = u.minus(u1).times(u.minus(u1))
      const b = end.lt(u) ? u.minus(end).times(u.minus(end)) : Dec(0)
      spreadSum = spreadSum.plus(w.times(a.times(a).minus(b.times(b))))
    }
    return value.minus(pointSum.div(6)).minus(spreadSum.div(24))
  }

  private floatShape(): (u: number) => number {
    const m0 = this.startMoment.toNumber()
    const v0 = this.startShear.toNumber()
    const c = this.constant.toNumber()
    const at = Float64Array.from(this.span.points, (p) => p.u.toNumber())
    const weight = Float64Array.from(this.span.points, (p) => p.weight.toNumber())
    const starts = Float64Array.from(this.span.spreads, (s) => s.u1.toNumber())
    const ends = Float64Array.from(this.span.spreads, (s) => s.u2.toNumber())
    const intensity = Float64Array.from(this.span.spreads, (s) => s.weightPerLength.toNumber())
    return (u) => {
      let points = 0
      for (let i = 0; i < at.length; i++) {
        const d = u - at[i]!
        if (d > 0) points += weight[i]! * d * d * d
      }
      let spreads = 0
      for (let i = 0; i < starts.length; i++) {
        const a = u - starts[i]!
        if (a <= 0) continue
        const b = u - ends[i]!
        spreads += intensity[i]! * (a * a * a * a - (b > 0 ? b * b * b * b : 0))
      }
      return (m0 * u * u) / 2 + (v0 * u * u * u) / 6 + c * u - points / 6 - spreads / 24
    }
  }
}

/**
 * EI times the downward tip deflection of an overhang treated as a cantilever fixed at its line:
 * P·u²(3c - u)/6 for a point load at u, integrated for spread loads.
 *
 * @example
 * cantileverTipDrop({ length: Dec(2), points: [{ u: Dec(2), weight: Dec(3) }], spreads: [] }).toString() // '8' (PL³/3)
 */
export function cantileverTipDrop(region: Region): Decimal {
  const c = region.length
  let drop = Dec(0)
  for (const { u, weight } of region.points) drop = drop.plus(weight.times(u.times(u)).times(c.times(3).minus(u)).div(6))
  for (const { u1, u2, weightPerLength: w } of region.spreads) {
    const cubes = u2.pow(3).minus(u1.pow(3)).times(c)
    const fourths = u2.pow(4).minus(u1.pow(4)).div(4)
    drop = drop.plus(w.times(cubes.minus(fourths)).div(6))
  }
  return drop
}
