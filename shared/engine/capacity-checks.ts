import { Dec, type UnitSystem } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import { check, type Check } from './checks.js'
import { formatQuantity } from './format.js'

/** Wire-rope lift lines are commonly designed at 8:1 (common practice) when no design factor is given. */
export const DEFAULT_DESIGN_FACTOR = 8

/**
 * Working load limit of a lift line: breaking strength ÷ design factor.
 *
 * @example
 * workingLoadLimit(7000, 8).toString() // '875'
 */
export function workingLoadLimit(
  breakingStrength: Decimal.Value,
  designFactor: Decimal.Value = DEFAULT_DESIGN_FACTOR,
): Decimal {
  return Dec(breakingStrength).div(designFactor)
}

/**
 * Each lift line against slack (zero or negative load) and against its working load limit. With `tensionOnly`
 * loads (lines that can only pull) each line is checked against the larger of its two loads, and when the
 * batten still hangs level the slack lines are left to `slackChecks`, which says what the others carry.
 *
 * @example
 * lineChecks([Dec(-3)], [20], 'imperial')[0]!.code // 'line-slack'
 */
export function lineChecks(
  loads: readonly Decimal[],
  positions: readonly number[],
  units: UnitSystem,
  line?: { breakingStrength?: number; designFactor?: number },
  tensionOnly?: { lineLoads: readonly Decimal[]; stable: boolean },
): Check[] {
  const checks: Check[] = []
  const place = (k: number) => `Lift line at ${formatQuantity(positions[k]!, 'length', units)}`
  const limit =
    line?.breakingStrength === undefined ? undefined : workingLoadLimit(line.breakingStrength, line.designFactor)
  const weight = (value: Decimal.Value) => formatQuantity(value, 'weight', units)
  // When the batten still hangs level, the slack lines are told once, with what the other lines then carry.
  const tellSlack = !tensionOnly?.stable
  loads.forEach((load, k) => {
    if (tellSlack && load.lt(0))
      checks.push(
        check(
          'line-slack',
          'danger',
          `${place(k)} would have to push up ${weight(load.neg())}: it goes slack and the batten lifts there; move load or add a line`,
        ),
      )
    else if (tellSlack && load.isZero())
      checks.push(check('line-slack', 'danger', `${place(k)} carries no load and hangs slack`))
    const slackLoad = tensionOnly?.stable ? tensionOnly.lineLoads[k] : undefined
    const larger = slackLoad && slackLoad.gt(load) ? slackLoad : load
    if (limit && larger.gt(limit)) {
      const factor = line?.designFactor ?? DEFAULT_DESIGN_FACTOR
      const carries =
        larger === load
          ? `carries ${weight(load)}`
          : `carries ${weight(larger)} once a line goes slack (${weight(load)} as a rigid line)`
      checks.push(
        check(
          'line-over-limit',
          'danger',
          `${place(k)} ${carries}, above its working load limit of ${weight(limit)} (${weight(line!.breakingStrength!)} ÷ ${factor})`,
        ),
      )
    }
  })
  if (!limit)
    checks.push(
      check(
        'line-limit-unchecked',
        'info',
        'No lift line breaking strength was given, so the line loads were not checked against a working load limit',
      ),
    )
  return checks
}

/**
 * The set's total load against its posted rated load.
 *
 * @example
 * ratedLoadChecks(Dec(1300), 1200, 'imperial')[0]!.code // 'over-rated-load'
 */
export function ratedLoadChecks(totalLoad: Decimal, ratedLoad: number | undefined, units: UnitSystem): Check[] {
  if (ratedLoad === undefined || totalLoad.lte(ratedLoad)) return []
  return [
    check(
      'over-rated-load',
      'danger',
      `The batten carries ${formatQuantity(totalLoad, 'weight', units)}, above the lineset's rated load of ${formatQuantity(ratedLoad, 'weight', units)}`,
    ),
  ]
}
