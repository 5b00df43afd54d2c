import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import type { BattenModel, Region } from './batten-model.js'
import type { BeamSolution } from './continuous-beam.js'

/** The largest bending moment by magnitude (sagging positive) and where it acts. */
export interface PeakMoment { value: Decimal; at: Decimal }

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
  solution.supportMoments.forEach((m, line) => {
    if (Math.abs(m.toNumber()) > best.magnitude) best = { magnitude: Math.abs(m.toNumber()), line }
  })
  model.spans.forEach((span, k) => {
    const found = spanPeak(span, solution.supportMoments[k]!.toNumber(), solution.spanStartShear[k]!.toNumber())
    if (found.magnitude > best.magnitude * (1 + 1e-12)) best = { ...found, span: k }
  })
  if ('line' in best) return { value: solution.supportMoments[best.line]!, at: model.supports[best.line]! }
  const u = typeof best.u === 'number' ? Dec(best.u.toFixed(9)) : best.u
  const k = best.span
  return { value: momentInSpan(model.spans[k]!, solution.supportMoments[k]!, solution.spanStartShear[k]!, u), at: model.supports[k]!.plus(u) }
}

function spanPeak(span: Region, startMoment: number, startShear: number): { magnitude: number; u: number | Decimal } {
  const events: Array<{ u: number; exact: Decimal; point: number; intensity: number }> = span.points.map((p) => ({ u: p.u.toNumber(), exact: p.u, point: p.weight.toNumber(), intensity: 0 }))
  for (const s of span.spreads) {
    const w = s.weightPerLength.toNumber()
    events.push({ u: s.u1.toNumber(), exact: s.u1, point: 0, intensity: w }, { u: s.u2.toNumber(), exact: s.u2, point: 0, intensity: -w })
  }
  events.sort((a, b) => a.u - b.u)
  let best: { magnitude: number; u: number | Decimal } = { magnitude: -1, u: 0 }
  let shear = startShear, moment = startMoment, intensity = 0, position = 0
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

/** M(u) = M0 + V0·u − Σ P(u − a) − Σ w[(u − u1)² − (u − u2)²]/2 over the loads left of u. */
function momentInSpan(span: Region, startMoment: Decimal, startShear: Decimal, u: Decimal): Decimal {
  let pointSum = Dec(0)
  let spreadSum = Dec(0)
  for (const p of span.points) if (p.u.lt(u)) pointSum = pointSum.plus(p.weight.times(u.minus(p.u)))
  for (const { u1, u2, weightPerLength: w } of span.spreads) {
    if (!u1.lt(u)) continue
    const a = u.minus(u1)
    const b = u2.lt(u) ? u.minus(u2) : Dec(0)
    spreadSum = spreadSum.plus(w.times(a.times(a).minus(b.times(b))))
  }
  return startMoment.plus(startShear.times(u)).minus(pointSum).minus(spreadSum.div(2))
}
