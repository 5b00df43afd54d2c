import { Dec, type UnitSystem } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import type { BattenAnalysis } from './batten-analysis.js'
import { check, type Check } from './checks.js'
import { formatQuantity } from './format.js'

/** "a, b and c" */
const list = (parts: string[]) =>
  parts.length < 2 ? (parts[0] ?? '') : `${parts.slice(0, -1).join(', ')} and ${parts[parts.length - 1]}`

/**
 * What the crew must know when a line goes slack: which line, what the others then carry and which of them is
 * closest to its limit (`line-slack`), or that the batten cannot hang level at all (`batten-tips`).
 *
 * @example
 * slackChecks(analyseBatten(input), [2, 11, 20, 29, 38, 47], 'imperial', Dec(875)).map((c) => c.code) // ['line-slack']
 */
export function slackChecks(
  analysis: Pick<BattenAnalysis, 'lineLoads' | 'tensionOnly' | 'totalLoad'>,
  positions: readonly number[],
  units: UnitSystem,
  limit?: Decimal,
): Check[] {
  const tension = analysis.tensionOnly
  if (!tension) return []
  const weight = (value: Decimal.Value) => formatQuantity(value, 'weight', units)
  const at = (k: number) => formatQuantity(positions[k]!, 'length', units)
  const rigid = analysis.lineLoads
  if (!tension.stable) return [tipsCheck(analysis, positions, units)]
  const isSlack = new Set(tension.slackLines)
  const why = (k: number) =>
    rigid[k]!.lt(0)
      ? `would have to push up ${weight(rigid[k]!.neg())}`
      : rigid[k]!.isZero()
        ? 'carries no load'
        : `carries ${weight(rigid[k]!)} as a rigid line`
  const slack = tension.slackLines
  const named =
    slack.length === 1
      ? `Lift line at ${at(slack[0]!)} ${why(slack[0]!)}: it goes slack and the batten lifts there`
      : `Lift lines at ${list(slack.map((k) => `${at(k)} (${why(k)})`))} go slack and the batten lifts there`
  const holding = tension.lineLoads.flatMap((load, k) => (isSlack.has(k) ? [] : [{ k, load }]))
  const carry = list(holding.map(({ k, load }) => `${weight(load)} at ${at(k)}`))
  const heaviest = holding.reduce((a, b) => (b.load.gt(a.load) ? b : a))
  const closest = limit
    ? `the line at ${at(heaviest.k)} is then closest to its limit (${weight(heaviest.load)} of ${weight(limit)})`
    : `the line at ${at(heaviest.k)} then carries the most (no working load limit was given to check it against)`
  const message = `${named}. The other lines then carry ${carry}; ${closest}. Move load or add a line`
  return [check('line-slack', 'danger', message)]
}

function tipsCheck(
  analysis: Pick<BattenAnalysis, 'lineLoads' | 'totalLoad'>,
  positions: readonly number[],
  units: UnitSystem,
): Check {
  const length = (value: Decimal.Value) => formatQuantity(value, 'length', units)
  // The rigid loads balance the items, so their moment gives the centre of load.
  const moment = analysis.lineLoads.reduce((sum, load, k) => sum.plus(load.times(positions[k]!)), Dec(0))
  const centre = moment.div(analysis.totalLoad)
  const [first, last] = [positions[0]!, positions[positions.length - 1]!]
  const where = centre.lt(first)
    ? `the centre of its load, at ${length(centre)}, lies beyond the end line at ${length(first)}`
    : centre.gt(last)
      ? `the centre of its load, at ${length(centre)}, lies beyond the end line at ${length(last)}`
      : `once the lines that would push go slack, fewer than two lines hold it (the centre of its load is at ${length(centre)})`
  return check(
    'batten-tips',
    'danger',
    `The batten cannot hang level: ${where}, so it tips. No brick plan is offered; move the load between the lines or add a line`,
  )
}
