import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import type { Region } from './batten-model.js'
import type { RegionMoments } from './region-sums.js'
import { sumsBefore, totalSums } from './region-loads.js'

const TWO = Dec(2)
const THREE = Dec(3)
const FOUR = Dec(4)
// x·0.5 and x·0.25 round the same real number as x/2 and x/4, at a fraction of a division's cost.
const HALF = Dec('0.5')
const QUARTER = Dec('0.25')
const SIX = Dec(6)
const TWENTY_FOUR = Dec(24)

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
    const loads = L2.times(L)
      .times(m0)
      .minus(L2.times(m1).times(THREE))
      .plus(L.times(m2).times(THREE))
      .minus(m3)
      .div(SIX)
    const atEnd = startMoment.times(L2).times(HALF).plus(startShear.times(L2).times(L).div(SIX)).minus(loads)
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
    const loads = L.times(L).times(m0).minus(L.times(m1).times(TWO)).plus(m2).times(HALF)
    const slope = this.startMoment.times(L).plus(this.startShear.times(L).times(L).times(HALF)).minus(loads)
    return { start: this.constant, end: slope.plus(this.constant) }
  }

  /** Where |y| is largest: sampled at sixteenths, then narrowed by golden-section search (floating point, location only). */
  largestAt(): Decimal {
    const L = this.span.length.toNumber()
    const f = this.floatShape()
    // f is pure: each sixteenth evaluated once picks the same sample as re-evaluating the best each time.
    const samples = new Float64Array(16)
    for (let j = 1; j < 16; j++) samples[j] = Math.abs(f((j * L) / 16))
    let bestIndex = 8
    for (let j = 1; j < 16; j++) if (samples[j]! > samples[bestIndex]!) bestIndex = j
    let low = ((bestIndex - 1) * L) / 16
    let high = ((bestIndex + 1) * L) / 16
    const ratio = (Math.sqrt(5) - 1) / 2
    // A new probe often lands exactly on the last one kept: reuse its value rather than evaluate again.
    let last = { u: NaN, size: 0 },
      kept = last
    const size = (u: number) => (u === last.u ? last.size : u === kept.u ? kept.size : Math.abs(f(u)))
    for (let i = 0; i < 32; i++) {
      const a = high - ratio * (high - low)
      const b = low + ratio * (high - low)
      const atA = size(a)
      const atB = size(b)
      ;[last, kept] = [
        { u: a, size: atA },
        { u: b, size: atB },
      ]
      if (atA >= atB) high = b
      else low = a
    }
    return Dec(((low + high) / 2).toFixed(6))
  }

  /**
   * EI·y at u without the C·u term: M0u²/2 + V0u³/6 − Σ P(u − a)³/6 − Σ Δw(u − t)⁴/24 over the loads
   * left of u, both sums expanded in powers of u over the span's running sums (Horner's rule).
   */
  private withoutConstant(u: Decimal): Decimal {
    const u2 = u.times(u)
    const value = this.startMoment.times(u2).times(HALF).plus(this.startShear.times(u2).times(u).div(SIX))
    const { points: p, steps: s } = sumsBefore(this.span.sums, u)
    const pointSum = p[0]!.times(u).minus(p[1]!.times(THREE)).times(u).plus(p[2]!.times(THREE)).times(u).minus(p[3]!)
    const spreadSum = s[0]!
      .times(u)
      .minus(s[1]!.times(FOUR))
      .times(u)
      .plus(s[2]!.times(SIX))
      .times(u)
      .minus(s[3]!.times(FOUR))
      .times(u)
      .plus(s[4]!)
    return value.minus(pointSum.div(SIX)).minus(spreadSum.div(TWENTY_FOUR))
  }

  private floatShape(): (u: number) => number {
    const m0 = this.startMoment.toNumber()
    const v0 = this.startShear.toNumber()
    const c = this.constant.toNumber()
    // Filled by plain loops: Float64Array.from with a map function is many times slower here.
    const { points: pointLoads, spreads: spreadLoads } = this.span
    const at = new Float64Array(pointLoads.length)
    const weight = new Float64Array(pointLoads.length)
    pointLoads.forEach((p, i) => ((at[i] = p.float.u), (weight[i] = p.float.weight)))
    const starts = new Float64Array(spreadLoads.length)
    const ends = new Float64Array(spreadLoads.length)
    const intensity = new Float64Array(spreadLoads.length)
    spreadLoads.forEach(
      (s, i) => ((starts[i] = s.float.u1), (ends[i] = s.float.u2), (intensity[i] = s.float.weightPerLength)),
    )
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
 * P·u²(3c − u)/6 for a point load at u, integrated for spread loads, from the overhang's load sums:
 * (3c·ΣP·u² − ΣP·u³ + c·Σw(u2³ − u1³) − Σw(u2⁴ − u1⁴)/4)/6.
 *
 * @example
 * const model = buildBattenModel({ length: 12, pickPoints: [0, 10], points: [{ at: 12, weight: 3 }], spreads: [] })
 * cantileverTipDrop(model.endOverhang).toString() // '8' (PL³/3)
 */
export function cantileverTipDrop(region: Region): Decimal {
  const c = region.length
  const { points, steps } = totalSums(region.sums)
  // The steps' sums are −Σ w·(u2ᵏ − u1ᵏ), hence the signs.
  const pointPart = c.times(THREE).times(points[2]!).minus(points[3]!)
  const spreadPart = steps[4]!.times(QUARTER).minus(c.times(steps[3]!))
  return pointPart.plus(spreadPart).div(SIX)
}
