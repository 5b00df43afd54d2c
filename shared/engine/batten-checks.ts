import { unitLabel, type UnitSystem } from '../units/index.js'
import { ALLOWABLE_BENDING_BASIS, type BattenAnalysis } from './batten-analysis.js'
import { check, type Check } from './checks.js'
import { formatFigure, formatQuantity } from './format.js'

/** Kinds where a load commonly hangs straight from one point. */
const SINGLE_POINT_KINDS = new Set(['hemp-single', 'spot-line'])

/**
 * Findings about the batten itself: a single pick point under an eccentric load, and bending stress.
 *
 * @example
 * battenChecks(analysis, 'counterweight-single', [20], 'imperial').map((c) => c.code) // e.g. ['single-pick-point', ...]
 */
export function battenChecks(
  analysis: BattenAnalysis,
  kind: string,
  pickPoints: readonly number[],
  units: UnitSystem,
): Check[] {
  const checks: Check[] = []
  const momentUnit = `${unitLabel('weight', units)}·${unitLabel('length', units)}`
  if (pickPoints.length === 1) {
    const at = formatQuantity(pickPoints[0]!, 'length', units)
    if (!analysis.unbalancedMoment.isZero())
      checks.push(
        check(
          'single-pick-eccentric',
          'danger',
          `The batten hangs from one pick point at ${at} but its load is off centre by a moment of ${formatFigure(analysis.unbalancedMoment.abs())} ${momentUnit}: it will tip; hang the load at the point or add lines`,
        ),
      )
    else if (!SINGLE_POINT_KINDS.has(kind))
      checks.push(
        check(
          'single-pick-point',
          'caution',
          `The batten hangs from one pick point at ${at}; it is free to rotate and any change to the load will tip it`,
        ),
      )
  }
  const { bending } = analysis
  const moment = `${formatFigure(analysis.peak.value.abs())} ${momentUnit} at ${formatQuantity(analysis.peak.at, 'length', units)}`
  if (!bending) {
    checks.push(
      check(
        'batten-bending-unchecked',
        'info',
        `No pipe size was given, so bending stress was not checked (peak moment ${moment})`,
      ),
    )
    return checks
  }
  const stress = `${formatFigure(bending.stress)} ${unitLabel('stress', units)}`
  const allowable = `${formatFigure(bending.allowable)} ${unitLabel('stress', units)}`
  if (bending.stress.gt(bending.allowable))
    checks.push(
      check(
        'batten-overstressed',
        'danger',
        `Bending stress ${stress} (peak moment ${moment}) is above the allowable ${allowable}, taken as ${ALLOWABLE_BENDING_BASIS}`,
      ),
    )
  else
    checks.push(
      check(
        'batten-bending',
        'info',
        `Bending stress ${stress} (peak moment ${moment}) is within the allowable ${allowable}, taken as ${ALLOWABLE_BENDING_BASIS}`,
      ),
    )
  return checks
}
