import type { Decimal } from 'decimal.js'
import type { BattenModel } from './batten-model.js'
import type { BeamSolution } from './continuous-beam.js'
import { SpanShape, cantileverTipDrop } from './span-deflection.js'

/** Downward deflections as EI·δ in the input's units (divide by EI to get a length). */
export interface DeflectionFigures {
  spans: Array<{ from: Decimal; to: Decimal; drop: Decimal; at: Decimal }>
  overhangs: Array<{ end: 'start' | 'end'; length: Decimal; drop: Decimal }>
}

/**
 * Largest deflection in each span and the drop at each overhang tip (line slope times overhang,
 * plus the overhang bending as a cantilever). Needs two lines or more.
 *
 * @example
 * // simple span of 10 under 1 per length: 5wL⁴/384 = 130.2083... at 5
 * battenDeflections(model, solveContinuousBeam(model)).spans[0]!.drop
 */
export function battenDeflections(model: BattenModel, solution: BeamSolution): DeflectionFigures {
  const shapes = model.spans.map(
    (span, k) =>
      new SpanShape(span, solution.supportMoments[k]!, solution.spanStartShear[k]!, solution.spanMoments[k]!),
  )
  const spans = shapes.map((shape, k) => {
    const origin = model.supports[k]!
    const u = shape.largestAt()
    return { from: origin, to: model.supports[k + 1]!, drop: shape.at(u).neg(), at: origin.plus(u) }
  })
  const overhangs: DeflectionFigures['overhangs'] = []
  const first = shapes[0]
  const last = shapes[shapes.length - 1]
  if (first && model.startOverhang.length.gt(0)) {
    const c = model.startOverhang.length
    overhangs.push({
      end: 'start',
      length: c,
      drop: first.endSlopes().start.times(c).plus(cantileverTipDrop(model.startOverhang)),
    })
  }
  if (last && model.endOverhang.length.gt(0)) {
    const c = model.endOverhang.length
    overhangs.push({
      end: 'end',
      length: c,
      drop: last.endSlopes().end.times(c).neg().plus(cantileverTipDrop(model.endOverhang)),
    })
  }
  return { spans, overhangs }
}
