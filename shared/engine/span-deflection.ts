import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import type { Region } from './batten-model.js'

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
  ) {
    this.constant = this.withoutConstant(span.length).div(span.length).neg()
  }

  /** EI·y at u (decimal). */
  at(u: Decimal): Decimal {
    return this.withoutConstant(u).plus(this.constant.times(u))
  }

  /** EI·dy/du at u = 0 and u = L. */
  endSlopes(): { start: Decimal; end: Decimal } {
    const L = this.span.length
    let slope = this.startMoment.times(L).plus(this.startShear.times(L).times(L).div(2))
    for (const { u, weight } of this.span.points) { const d = L.minus(u); slope = slope.minus(weight.times(d.times(d)).div(2)) }
    for (const { u1, u2, weightPerLength: w } of this.span.spreads)
    {
      const a = L.minus(u1)
      const b = L.minus(u2)
      slope = slope.minus(w.times(a.times(a).times(a).minus(b.times(b).times(b))).div(6))
    }
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
    for (let i = 0; i < 48; i++) {
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
    const points = this.span.points.map((p) => [p.u.toNumber(), p.weight.toNumber()] as const)
    const spreads = this.span.spreads.map((s) => [s.u1.toNumber(), s.u2.toNumber(), s.weightPerLength.toNumber()] as const)
    return (u) => {
      let value = (m0 * u * u) / 2 + (v0 * u * u * u) / 6 + c * u
      for (const [a, p] of points) if (a < u) value -= (p * (u - a) ** 3) / 6
      for (const [a, b, w] of spreads) if (a < u) value -= (w * ((u - a) ** 4 - (b < u ? (u - b) ** 4 : 0))) / 24
      return value
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
