import { STRETCH_CAUTION_PERCENT } from '../../../shared/engine/stretch-checks.js'
import type { CalculationResult, LineLoad } from '../../../shared/schemas/calculation-result.js'
import { displayNumber, displayQuantity } from '../../../shared/units/display.js'
import { convert, type UnitSystem } from '../../../shared/units/systems.js'

/**
 * The lift line figures the crew acts on, in words first and in the venue's units: a batten that tips, the line
 * that goes slack and what the others then carry, or the loads as the lines share them; then the loads with
 * stretching lines when the lineset says how its lines stretch.
 *
 * @example
 * railCardLoadLines(result, 'imperial')[0] // 'Slack: the lift line at 2 ft goes slack and carries nothing.'
 */
export function railCardLoadLines(result: CalculationResult | undefined, system: UnitSystem): string[] {
  if (!result || result.lineLoads.length === 0) return ['No hang saved, so no line loads.']
  const weight = (value: number) => displayQuantity(convert(value, 'weight', result.units, system), 'weight', system)
  const at = (position: number) => displayQuantity(convert(position, 'length', result.units, system), 'length', system)
  const listed = (lines: LineLoad[]) => lines.map((line) => `${weight(line.load)} at ${at(line.at)}`).join(', ')
  const tension = result.tensionOnly
  const lines: string[] = []
  if (tension && !tension.stable)
    lines.push('DANGER: the batten cannot hang level as loaded (it tips). Do not fly it; move the load or add a line.')
  else if (tension) {
    const slack = tension.slackLines.map((k) => at(tension.lineLoads[k]!.at))
    const which = slack.length === 1 ? `the lift line at ${slack[0]} goes` : `the lift lines at ${slack.join(', ')} go`
    const holding = tension.lineLoads.filter((_, k) => !tension.slackLines.includes(k))
    lines.push(`DANGER, slack line: ${which} slack and carries nothing.`, `The others then carry ${listed(holding)}.`)
  } else lines.push(`Each line carries ${listed(result.lineLoads)}.`)
  const elastic = result.elasticLines
  if (elastic) {
    if (elastic.largestDifference > STRETCH_CAUTION_PERCENT)
      lines.push(
        `CAUTION: stretching lines move up to ${displayNumber(elastic.largestDifference, 1)} % of a line's load; check each line with the larger figure.`,
      )
    lines.push(`With the lines stretching: ${listed(elastic.lineLoads)}.`, `Stiffness basis: ${elastic.basis}.`)
  }
  return lines
}

/**
 * The heaviest load any lift line may see: the larger of the rigid, slack-line and stretching-line figures.
 *
 * @example
 * heaviestLineLoad(result) // 456.49
 */
export function heaviestLineLoad(result: CalculationResult): number {
  const all = [result.lineLoads, result.tensionOnly?.lineLoads ?? [], result.elasticLines?.lineLoads ?? []]
  return Math.max(...all.flat().map((line) => line.load))
}
