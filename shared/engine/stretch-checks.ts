import { Dec, type UnitSystem } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import type { BattenAnalysis } from './batten-analysis.js'
import { check, type Check } from './checks.js'
import type { ElasticLines } from './elastic-lines.js'
import { formatFigure, formatQuantity } from './format.js'

/** A line whose load with stretch differs from the rigid figure by more than this (in %) earns a caution. */
export const STRETCH_CAUTION_PERCENT = 10

/**
 * The rigid figure the crew reads for each line: the tension-only loads when a line is slack, else the rigid ones.
 *
 * @example
 * crewLoads(analysis)[0]?.toString() // '250' when the two-span example's middle line lets go
 */
export function crewLoads(analysis: Pick<BattenAnalysis, 'lineLoads' | 'tensionOnly'>): Decimal[] {
  return analysis.tensionOnly?.stable ? analysis.tensionOnly.lineLoads : analysis.lineLoads
}

/**
 * How far each line's load with stretch lies from its rigid figure, in % of that figure (undefined where the
 * rigid figure carries nothing: a slack line stays slack).
 *
 * @example
 * stretchDifferences([Dec(110)], [Dec(100)])[0]?.toString() // '10'
 */
export function stretchDifferences(elastic: readonly Decimal[], rigid: readonly Decimal[]): Array<Decimal | undefined> {
  return elastic.map((load, k) => (rigid[k]!.gt(0) ? load.minus(rigid[k]!).div(rigid[k]!).times(100) : undefined))
}

/**
 * A caution when stretching lines move more than 10 % of a line's load (`line-stretch-shifts-load`), naming the
 * lines and the basis of the stiffness figures; a note when lengths were given but the solve could not be made.
 *
 * @example
 * stretchChecks(analyseBatten(input), [0, 20, 40], 'imperial').map((c) => c.code) // ['line-stretch-shifts-load']
 */
export function stretchChecks(
  analysis: Pick<BattenAnalysis, 'lineLoads' | 'tensionOnly' | 'elastic'>,
  positions: readonly number[],
  units: UnitSystem,
  limit?: Decimal,
): Check[] {
  const elastic = analysis.elastic
  if (!elastic) return []
  if ('reason' in elastic)
    return [
      check(
        'line-stretch-not-worked-out',
        'info',
        `Lift line lengths are given, but the loads with stretching lines are not worked out: ${elastic.reason}`,
      ),
    ]
  const weight = (value: Decimal.Value) => formatQuantity(value, 'weight', units)
  const at = (k: number) => formatQuantity(positions[k]!, 'length', units)
  const over = limit ? overLimitOnlyWhenStretching(analysis, elastic, limit) : []
  const overChecks = over.map((k) =>
    check(
      'line-over-limit',
      'danger',
      `Lift line at ${at(k)} carries ${weight(elastic.loads[k]!)} with the lines stretching, above its working load limit of ${weight(limit!)}`,
    ),
  )
  const shifted = shiftedLines(elastic, crewLoads(analysis))
  if (shifted.length === 0) return overChecks
  const words = shifted.map(({ k, rigid, percent }) => {
    const sign = percent.gt(0) ? '+' : ''
    return `the line at ${at(k)} carries ${weight(elastic.loads[k]!)} rather than ${weight(rigid)} (${sign}${formatFigure(percent)} %)`
  })
  const pushing = shifted.filter(({ k }) => !elastic.loads[k]!.gt(0))
  const slackWords = pushing.length
    ? ` With stretch the line${pushing.length > 1 ? 's' : ''} at ${pushing.map(({ k }) => at(k)).join(', ')} would go slack.`
    : ''
  return [
    ...overChecks,
    check(
      'line-stretch-shifts-load',
      'caution',
      `Lift lines stretch, and the shorter ones take more: ${words.join('; ')}.${slackWords} Check each line against its limit with the larger figure. Stiffness basis: ${elastic.basis}`,
    ),
  ]
}

function shiftedLines(elastic: ElasticLines, rigid: readonly Decimal[]) {
  const limit = Dec(STRETCH_CAUTION_PERCENT)
  return stretchDifferences(elastic.loads, rigid).flatMap((percent, k) =>
    percent !== undefined && percent.abs().gt(limit) ? [{ k, rigid: rigid[k]!, percent }] : [],
  )
}

/** Lines above the limit only with stretch: the rigid and slack-line figures are checked by `lineChecks`. */
function overLimitOnlyWhenStretching(
  analysis: Pick<BattenAnalysis, 'lineLoads' | 'tensionOnly'>,
  elastic: ElasticLines,
  limit: Decimal,
): number[] {
  const slackLoads = analysis.tensionOnly?.stable ? analysis.tensionOnly.lineLoads : undefined
  return elastic.loads.flatMap((load, k) => {
    const checked = slackLoads ? Dec.max(analysis.lineLoads[k]!, slackLoads[k]!) : analysis.lineLoads[k]!
    return load.gt(limit) && !checked.gt(limit) ? [k] : []
  })
}
