import { Dec, type UnitSystem } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import type { CalculationInput } from '../schemas/calculation.js'
import { buildBattenModel, type BattenLoads } from './batten-model.js'
import { solveContinuousBeam } from './continuous-beam.js'
import { peakMoment, type PeakMoment } from './bending-moment.js'
import { battenDeflections } from './deflection.js'
import { resolvePipe, type PipeProperties } from './pipe-properties.js'
import { bendingStress, deflectionConverter } from './structural-units.js'
import { solveTensionOnly } from './tension-only.js'
import { elasticLines, type ElasticLines, type ElasticUnavailable } from './elastic-lines.js'

/**
 * Allowable bending stress 0.66·Fy: the allowable-stress-design value for compact sections, common
 * practice for round steel tube whose D/t is far below the compact limit (1-1/2 in Sch 40: D/t ≈ 13).
 */
export const ALLOWABLE_BENDING_FACTOR = Dec('0.66')
export const ALLOWABLE_BENDING_BASIS = '0.66 × Fy (allowable stress design, compact round tube), on the nominal wall'

export interface BattenAnalysis {
  battenWeight: Decimal
  hardwareWeight: Decimal
  itemsWeight: Decimal
  totalLoad: Decimal
  /** Loads with every line rigid (a line may come out pushing: negative). */
  lineLoads: Decimal[]
  /**
   * Present when a rigid line load is zero or below: the loads with lines that can only pull, the slack lines'
   * indices, and whether the batten still hangs level. The peak, stress and deflections below are then this
   * solution's whenever it is stable.
   */
  tensionOnly?: { lineLoads: Decimal[]; slackLines: number[]; stable: boolean }
  /**
   * Present when the lineset gives its lines' lengths: the loads with lines that stretch (on the lines that hold),
   * or why they could not be worked out.
   */
  elastic?: ElasticLines | ElasticUnavailable
  peak: PeakMoment
  /** One line only: moment of all loads about it (zero when the load hangs at the point). */
  unbalancedMoment: Decimal
  pipe?: PipeProperties
  bending?: { stress: Decimal; allowable: Decimal }
  /** In or mm, downward positive. */
  deflection?: {
    spans: Array<{ from: Decimal; to: Decimal; max: Decimal; at: Decimal }>
    overhangs: Array<{ end: 'start' | 'end'; length: Decimal; tip: Decimal }>
  }
}

/**
 * Batten self weight, hardware (shared equally at the pick points, where it hangs) and items, the
 * per-line loads from the continuous-beam analysis, the peak moment, stress and deflections.
 *
 * @example
 * analyseBatten(parsedInput).lineLoads.map(String) // one load per pick point, summing to the total
 */
export function analyseBatten(input: CalculationInput): BattenAnalysis {
  const { batten, units } = input
  const pipe = resolvePipe(batten, units)
  const selfWeightPerLength =
    batten.weightPerLength === undefined ? (pipe?.weightPerLength ?? Dec(0)) : Dec(batten.weightPerLength)
  const loads = collectLoads(input, selfWeightPerLength)
  // The model converts and totals the items in the same pass that places them.
  const rigidModel = buildBattenModel(loads.beam)
  const rigid = solveContinuousBeam(rigidModel)
  const { battenWeight, hardwareWeight } = loads
  const totalLoad = battenWeight.plus(hardwareWeight).plus(rigidModel.itemsWeight)
  const slack = rigid.reactions.length >= 2 && totalLoad.gt(0) && rigid.reactions.some((load) => load.lte(0))
  const tension = slack ? solveTensionOnly(loads.beam, rigid.reactions, rigidModel) : undefined
  // The batten's bending follows the lines that actually hold; a tipping batten has no such state, so keep the rigid one.
  const { model, solution } = tension?.held ?? { model: rigidModel, solution: rigid }
  const analysis: BattenAnalysis = {
    battenWeight,
    hardwareWeight,
    itemsWeight: rigidModel.itemsWeight,
    totalLoad,
    lineLoads: rigid.reactions,
    peak: peakMoment(model, solution),
    unbalancedMoment: rigid.unbalancedMoment,
  }
  if (tension) analysis.tensionOnly = { lineLoads: tension.loads, slackLines: tension.slack, stable: tension.stable }
  const slackLines = new Set(tension?.slack ?? [])
  const heldLines = batten.pickPoints.flatMap((_, k) => (slackLines.has(k) ? [] : [k]))
  const held = tension && !tension.stable ? undefined : { model, solution }
  const elastic = elasticLines(input.liftLine, held, heldLines, pipe, units)
  if (elastic) analysis.elastic = elastic
  if (!pipe) return analysis
  analysis.pipe = pipe
  analysis.bending = {
    stress: bendingStress(analysis.peak.value.abs(), pipe.sectionModulus, units),
    allowable: pipe.yieldStrength.times(ALLOWABLE_BENDING_FACTOR),
  }
  if (model.supports.length >= 2) analysis.deflection = toLengths(battenDeflections(model, solution), pipe, units)
  return analysis
}

function collectLoads(input: CalculationInput, selfWeightPerLength: Decimal) {
  const { batten } = input
  const points: BattenLoads['points'] = []
  const spreads: BattenLoads['spreads'] = []
  for (const item of input.items) {
    if (item.at !== undefined && item.weight !== undefined) points.push({ at: item.at, weight: item.weight })
    else if (item.weightPerLength !== undefined)
      spreads.push({ from: item.from ?? 0, to: item.to ?? batten.length, weightPerLength: item.weightPerLength })
  }
  const hardwareWeight = Dec(input.hardwareWeight ?? 0)
  const atEachLine = hardwareWeight.isZero() ? undefined : hardwareWeight.div(batten.pickPoints.length)
  return {
    beam: { length: batten.length, pickPoints: batten.pickPoints, points, spreads, selfWeightPerLength, atEachLine },
    hardwareWeight,
    battenWeight: selfWeightPerLength.times(batten.length),
  }
}

function toLengths(figures: ReturnType<typeof battenDeflections>, pipe: PipeProperties, units: UnitSystem) {
  const length = deflectionConverter(pipe.elasticModulus, pipe.momentOfInertia, units)
  return {
    spans: figures.spans.map(({ from, to, drop, at }) => ({ from, to, max: length(drop), at })),
    overhangs: figures.overhangs.map(({ end, length: overhang, drop }) => ({
      end,
      length: overhang,
      tip: length(drop),
    })),
  }
}
