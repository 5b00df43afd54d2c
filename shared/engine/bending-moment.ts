import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import type { BattenModel, Region } from './batten-model.js'
import type { BeamSolution } from './continuous-beam.js'

/** The largest bending moment by magnitude (sagging positive) and where it acts. */
export interface PeakMoment { value: Decimal; at: Decimal }

interface SpanEvent { u: Decimal; point: Decimal; intensity: Decimal }

function spanEvents(region: Region): SpanEvent[] {
  const zero = Dec(0)
  const events: SpanEvent[] = region.points.map(({ u, weight }) => ({ u, point: weight, intensity: zero }))
  for (const { u1, u2, weightPerLength: w } of region.spreads) {
    events.push({ u: u1, point: zero, intensity: w }, { u: u2, point: zero, intensity: w.neg() })
  }
  return events.sort((a, b) => a.u.comparedTo(b.u))
}

/**
 * Walks each span from its left line, carrying shear and moment across the loads, and keeps the
 * largest moment: over the lines, under point loads, and where the shear crosses zero under a
 * spread load (M + V²/2q). Overhang moments peak at their line, so the line moments cover them.
 *
 * @example
 * // two equal spans of 10 under 1 per length: -12.5 over the middle line (0.125wL²)
 * peakMoment(model, solveContinuousBeam(model)) // { value: -12.5, at: 10 }
 */
export function peakMoment(model: BattenModel, solution: BeamSolution): PeakMoment {
  let best: PeakMoment = { value: solution.supportMoments[0]!, at: model.supports[0]! }
  const consider = (value: Decimal, at: Decimal) => {
    if (value.abs().gt(best.value.abs())) best = { value, at }
  }
  solution.supportMoments.forEach((m, k) => consider(m, model.supports[k]!))
  model.spans.forEach((span, k) => {
    const origin = model.supports[k]!
    let shear = solution.spanStartShear[k]!
    let moment = solution.supportMoments[k]!
    let intensity = Dec(0)
    let position = Dec(0)
    const advance = (to: Decimal) => {
      const h = to.minus(position)
      if (h.isZero()) return
      if (intensity.gt(0) && shear.gt(0)) {
        const s = shear.div(intensity)
        if (s.lt(h)) consider(moment.plus(shear.times(s).div(2)), origin.plus(position).plus(s))
      }
      moment = moment.plus(shear.times(h)).minus(intensity.times(h).times(h).div(2))
      shear = shear.minus(intensity.times(h))
      position = to
    }
    for (const event of spanEvents(span)) {
      advance(event.u)
      if (!event.point.isZero()) {
        consider(moment, origin.plus(position))
        shear = shear.minus(event.point)
      }
      intensity = intensity.plus(event.intensity)
    }
    advance(span.length)
  })
  return best
}
