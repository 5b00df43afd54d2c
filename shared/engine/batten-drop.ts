import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import type { BattenModel, Region } from './batten-model.js'
import type { BeamSolution } from './continuous-beam.js'
import { SpanShape } from './span-deflection.js'

const TWO = Dec(2)
const THREE = Dec(3)
const SIX = Dec(6)
const TWENTY_FOUR = Dec(24)

/**
 * EI times the downward drop of the batten at x below the level of its lines, for a solved model with two
 * lines or more: in a span from its deflected shape, beyond an end line from that line's slope plus the
 * overhang bending as a cantilever. The sign is what the tension-only solve needs: positive where the batten
 * sinks below a line's level there, negative where it rises above it.
 *
 * @example
 * // a simple span of 10 with 1 per length: 5wL⁴/384 = 130.2083... at 5
 * battenDropAt(model, solveContinuousBeam(model), Dec(5))
 */
export function battenDropAt(model: BattenModel, solution: BeamSolution, x: Decimal): Decimal {
  const { supports, spans } = model
  const last = supports.length - 1
  const shape = (k: number) =>
    new SpanShape(spans[k]!, solution.supportMoments[k]!, solution.spanStartShear[k]!, solution.spanMoments[k]!)
  if (x.lt(supports[0]!)) {
    const a = supports[0]!.minus(x)
    return shape(0).endSlopes().start.times(a).plus(cantileverDropAt(model.startOverhang, a))
  }
  if (x.gt(supports[last]!)) {
    const a = x.minus(supports[last]!)
    return shape(last - 1)
      .endSlopes()
      .end.times(a)
      .neg()
      .plus(cantileverDropAt(model.endOverhang, a))
  }
  let k = 0
  while (k < last - 1 && x.gte(supports[k + 1]!)) k++
  return shape(k).at(x.minus(supports[k]!)).neg()
}

/**
 * EI times the drop at a from the fixed line of an overhang treated as a cantilever: a point load P at p
 * gives P·a²(3p − a)/6 when p ≥ a and P·p²(3a − p)/6 when p < a; a spread load integrates the same over
 * its length (common practice: cantilever beam formulas).
 */
function cantileverDropAt(region: Region, a: Decimal): Decimal {
  let sum = Dec(0)
  const beyond = (p: Decimal) => a.times(a).times(p.times(p).times(THREE).div(TWO).minus(a.times(p)))
  const within = (p: Decimal) => a.times(p.pow(3)).times(4).minus(p.pow(4))
  for (const point of region.points) {
    const { u: p, weight } = point
    const part = p.gte(a) ? a.times(a).times(p.times(THREE).minus(a)) : p.times(p).times(a.times(THREE).minus(p))
    sum = sum.plus(weight.times(part).div(SIX))
  }
  for (const spread of region.spreads) {
    const { u1, u2, weightPerLength: w } = spread
    const inner = Dec.min(u2, a)
    if (u1.lt(inner)) sum = sum.plus(w.times(within(inner).minus(within(u1))).div(TWENTY_FOUR))
    const outer = Dec.max(u1, a)
    if (outer.lt(u2)) sum = sum.plus(w.times(beyond(u2).minus(beyond(outer))).div(SIX))
  }
  return sum
}
