import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import type { BattenModel } from './batten-model.js'
import { regionMoments, regionSums, threeMomentTerms, type RegionMoments } from './region-sums.js'

/** Line loads and the bending moments over the lines (sagging positive). */
export interface BeamSolution {
  reactions: Decimal[]
  supportMoments: Decimal[]
  /** Shear just right of each span's left line (upward positive). */
  spanStartShear: Decimal[]
  /** Load moments of each span about its left line (reused for deflections). */
  spanMoments: RegionMoments[]
  /** With one line: the unbalanced moment of all loads about it (positive turns the far end down). */
  unbalancedMoment: Decimal
}

/**
 * Analyses the batten as a continuous beam on rigid supports with overhangs (three-moment equation,
 * constant EI). The moments over the end lines come from the overhangs; the interior ones from a
 * tridiagonal solve. One or two lines are statically determinate and fall out of the same steps.
 *
 * @example
 * // two equal spans of 10 under 1 per length: 3.75, 12.5, 3.75 (0.375wL, 1.25wL)
 * solveContinuousBeam(buildBattenModel({ length: 20, pickPoints: [0, 10, 20], points: [],
 *   spreads: [{ from: 0, to: 20, weightPerLength: 1 }] })).reactions.map(String) // ['3.75', '12.5', '3.75']
 */
export function solveContinuousBeam(model: BattenModel): BeamSolution {
  const n = model.supports.length
  const start = regionSums(regionMoments(model.startOverhang))
  const end = regionSums(regionMoments(model.endOverhang))
  const moments: Decimal[] = new Array(n).fill(Dec(0))
  moments[0] = start.moment.neg()
  moments[n - 1] = end.moment.neg()
  if (n === 1) {
    const reaction = start.weight.plus(end.weight).plus(model.direct[0]!)
    // One line: both overhangs hang from it, so compare their own moments (moments[0] and moments[n - 1] are one slot).
    const [startMoment, endMoment] = [start.moment.neg(), end.moment.neg()]
    const supportMoment = startMoment.abs().gte(endMoment.abs()) ? startMoment : endMoment
    return {
      reactions: [reaction],
      supportMoments: [supportMoment],
      spanStartShear: [],
      spanMoments: [],
      unbalancedMoment: end.moment.minus(start.moment),
    }
  }
  const spanMoments = model.spans.map(regionMoments)
  const spanSums = spanMoments.map(regionSums)
  const terms = model.spans.map((span, k) => threeMomentTerms(span.length, spanMoments[k]!))
  solveInteriorMoments(model, terms, moments)
  const reactions = model.direct.map((d) => d)
  reactions[0] = reactions[0]!.plus(start.weight)
  reactions[n - 1] = reactions[n - 1]!.plus(end.weight)
  const spanStartShear = model.spans.map((span, k) => {
    const { weight, moment } = spanSums[k]!
    const left = moments[k + 1]!.minus(moments[k]!).plus(weight.times(span.length)).minus(moment).div(span.length)
    reactions[k] = reactions[k]!.plus(left)
    reactions[k + 1] = reactions[k + 1]!.plus(weight.minus(left))
    return left
  })
  return { reactions, supportMoments: moments, spanStartShear, spanMoments, unbalancedMoment: Dec(0) }
}

/** Thomas algorithm on M(k-1)·L(k) + 2·M(k)·(L(k) + L(k+1)) + M(k+1)·L(k+1) = -(terms). */
function solveInteriorMoments(
  model: BattenModel,
  terms: Array<{ left: Decimal; right: Decimal }>,
  moments: Decimal[],
): void {
  const n = model.supports.length
  const unknowns = n - 2
  if (unknowns < 1) return
  const lengths = model.spans.map((span) => span.length)
  const diagonal: Decimal[] = []
  const rhs: Decimal[] = []
  for (let k = 1; k <= unknowns; k++) {
    const before = lengths[k - 1]!
    const after = lengths[k]!
    let value = terms[k - 1]!.right.plus(terms[k]!.left).neg()
    if (k === 1) value = value.minus(moments[0]!.times(before))
    if (k === unknowns) value = value.minus(moments[n - 1]!.times(after))
    diagonal.push(before.plus(after).times(2))
    rhs.push(value)
  }
  for (let i = 1; i < unknowns; i++) {
    const factor = lengths[i]!.div(diagonal[i - 1]!)
    diagonal[i] = diagonal[i]!.minus(factor.times(lengths[i]!))
    rhs[i] = rhs[i]!.minus(factor.times(rhs[i - 1]!))
  }
  for (let i = unknowns - 1; i >= 0; i--) {
    const next = i + 1 < unknowns ? lengths[i + 1]!.times(moments[i + 2]!) : Dec(0)
    moments[i + 1] = rhs[i]!.minus(next).div(diagonal[i]!)
  }
}
