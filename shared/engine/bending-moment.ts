import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import type { BattenModel, Region } from './batten-model.js'
import type { BeamSolution } from './continuous-beam.js'
import { sumsBefore } from './region-loads.js'

/** The largest bending moment by magnitude (sagging positive) and where it acts. */
export interface PeakMoment {
  value: Decimal
  at: Decimal
}

const TWO = Dec(2)
// x·0.5 rounds the same real number as x/2, at a fraction of a division's cost.
const HALF = Dec('0.5')

type Candidate = { magnitude: number; span: number; u: number | Decimal } | { magnitude: number; line: number }

/**
 * The largest moment along the batten. Overhang moments peak at their line, so the candidates are
 * the line moments, the moment under each point load and where the shear crosses zero under a spread
 * load. Candidates are compared in floating point (location only); the winner's moment is then
 * evaluated exactly in decimal.
 *
 * @example
 * // two equal spans of 10 under 1 per length: -12.5 over the middle line (0.125wL²)
 * peakMoment(model, solveContinuousBeam(model)) // { value: -12.5, at: 10 }
 */
export function peakMoment(model: BattenModel, solution: BeamSolution): PeakMoment {
  let best = { magnitude: -1, line: 0 } as Candidate
  const lineMoments = solution.supportMoments.map((m) => m.toNumber())
  lineMoments.forEach((m, line) => {
    if (Math.abs(m) > best.magnitude) best = { magnitude: Math.abs(m), line }
  })
  model.spans.forEach((span, k) => {
    const found = spanPeak(span, lineMoments[k]!, solution.spanStartShear[k]!.toNumber())
    if (found.magnitude > best.magnitude * (1 + 1e-12)) best = { ...found, span: k }
  })
  if ('line' in best) return { value: solution.supportMoments[best.line]!, at: model.supports[best.line]! }
  const u = typeof best.u === 'number' ? Dec(best.u.toFixed(9)) : best.u
  const k = best.span
  return {
    value: momentInSpan(model.spans[k]!, solution.supportMoments[k]!, solution.spanStartShear[k]!, u),
    at: model.supports[k]!.plus(u),
  }
}

function spanPeak(span: Region, startMoment: number, startShear: number): { magnitude: number; u: number | Decimal } {
  const events: Array<{ u: number; exact: Decimal; point: number; intensity: number }> = span.points.map((p) => ({
    u: p.float.u,
    exact: p.u,
    point: p.float.weight,
    intensity: 0,
  }))
  for (const s of span.spreads) {
    const w = s.float.weightPerLength
    events.push(
      { u: s.float.u1, exact: s.u1, point: 0, intensity: w },
      { u: s.float.u2, exact: s.u2, point: 0, intensity: -w },
    )
  }
  events.sort((a, b) => a.u - b.u)
  let best: { magnitude: number; u: number | Decimal } = { magnitude: -1, u: 0 }
  let shear = startShear,
    moment = startMoment,
    intensity = 0,
    position = 0
  const advance = (to: number) => {
    const h = to - position
    if (intensity > 0 && shear > 0 && shear / intensity < h) {
      const peak = moment + (shear * shear) / (2 * intensity)
      if (Math.abs(peak) > best.magnitude) best = { magnitude: Math.abs(peak), u: position + shear / intensity }
    }
    moment += shear * h - (intensity * h * h) / 2
    shear -= intensity * h
    position = to
  }
  for (const event of events) {
    advance(event.u)
    if (event.point !== 0 && Math.abs(moment) > best.magnitude) best = { magnitude: Math.abs(moment), u: event.exact }
    shear -= event.point
    intensity += event.intensity
  }
  return best
}

/**
 * M(u) = M0 + V0·u − Σ P(u − a) − Σ Δw(u − t)²/2 over the loads left of u, read from the span's
 * running sums: Σ P(u − a) = u·ΣP − ΣP·a and Σ Δw(u − t)² = u²·ΣΔw − 2u·ΣΔw·t + ΣΔw·t².
 */
function momentInSpan(span: Region, startMoment: Decimal, startShear: Decimal, u: Decimal): Decimal {
  const { points, steps } = sumsBefore(span.sums, u)
  const pointSum = u.times(points[0]!).minus(points[1]!)
  const spreadSum = u.times(u).times(steps[0]!).minus(u.times(TWO).times(steps[1]!)).plus(steps[2]!)
  return startMoment.plus(startShear.times(u)).minus(pointSum).minus(spreadSum.times(HALF))
}
