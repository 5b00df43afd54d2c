import { Dec, roundTo, unitLabel } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import { validationErrorBody, type ErrorBody } from '../errors/fields.js'
import { calculationInputSchema, type CalculationInput, type CalculationResult } from '../schemas/calculation.js'
import { analyseBatten } from './batten-analysis.js'
import { battenChecks } from './batten-checks.js'
import { lineChecks, ratedLoadChecks, workingLoadLimit } from './capacity-checks.js'
import { sortChecks, type Check } from './checks.js'
import { FIGURES_DISCLAIMER } from './cautions.js'
import { kindFigures } from './kind-figures.js'
import { slackChecks } from './slack-checks.js'
import { crewLoads, stretchChecks, stretchDifferences } from './stretch-checks.js'

const r = (value: Decimal.Value) => roundTo(value, 2)

/**
 * Balances one lineset: batten analysis, per-line loads, counterweight and brick plan, travel shift,
 * capacities and the kind's own checks. Assumes input already parsed by {@link calculationInputSchema}.
 *
 * @example
 * calculate(calculationInputSchema.parse(raw)).lineLoads // [{ at: 0, load: ... }, ...]
 */
export function calculate(input: CalculationInput): CalculationResult {
  const { units, batten } = input
  const analysis = analyseBatten(input)
  const { tensionOnly } = analysis
  const limit =
    input.liftLine?.breakingStrength === undefined
      ? undefined
      : workingLoadLimit(input.liftLine.breakingStrength, input.liftLine.designFactor)
  const checks: Check[] = [
    ...slackChecks(analysis, batten.pickPoints, units, limit),
    ...stretchChecks(analysis, batten.pickPoints, units, limit),
    ...lineChecks(analysis.lineLoads, batten.pickPoints, units, input.liftLine, tensionOnly),
    ...ratedLoadChecks(analysis.totalLoad, input.ratedLoad, units),
    ...battenChecks(analysis, input.kind, batten.pickPoints, units),
  ]
  const result: CalculationResult = {
    units,
    kind: input.kind,
    notice: FIGURES_DISCLAIMER,
    unitLabels: {
      weight: unitLabel('weight', units),
      length: unitLabel('length', units),
      shortLength: unitLabel('shortLength', units),
      moment: `${unitLabel('weight', units)}·${unitLabel('length', units)}`,
      stress: unitLabel('stress', units),
    },
    battenWeight: r(analysis.battenWeight),
    hardwareWeight: r(analysis.hardwareWeight),
    itemsWeight: r(analysis.itemsWeight),
    totalLoad: r(analysis.totalLoad),
    lineLoads: analysis.lineLoads.map((load, k) => ({ at: batten.pickPoints[k]!, load: r(load) })),
    moment: { max: r(analysis.peak.value), at: r(analysis.peak.at) },
    checks,
  }
  if (tensionOnly)
    result.tensionOnly = {
      lineLoads: tensionOnly.lineLoads.map((load, k) => ({ at: batten.pickPoints[k]!, load: r(load) })),
      slackLines: tensionOnly.slackLines,
      stable: tensionOnly.stable,
    }
  const { elastic } = analysis
  if (elastic && !('reason' in elastic)) {
    const differences = stretchDifferences(elastic.loads, crewLoads(analysis))
    const largest = differences.reduce<Decimal>((most, d) => (d && d.abs().gt(most) ? d.abs() : most), Dec(0))
    result.elasticLines = {
      lineLoads: elastic.loads.map((load, k) => ({ at: batten.pickPoints[k]!, load: r(load) })),
      stiffness: elastic.stiffness.map((k, line) => ({ at: batten.pickPoints[line]!, stiffness: r(k) })),
      largestDifference: r(largest),
      basis: elastic.basis,
    }
  }
  if (limit) result.lineWorkingLoadLimit = r(limit)
  if (analysis.bending) {
    const { stress, allowable } = analysis.bending
    result.bending = {
      stress: r(stress),
      allowable: r(allowable),
      utilisation: roundTo(stress.div(allowable), 4),
      basis: 'nominal wall; allowable 0.66 × Fy',
    }
  }
  if (analysis.deflection) {
    result.deflection = {
      spans: analysis.deflection.spans.map((s) => ({ from: r(s.from), to: r(s.to), max: r(s.max), at: r(s.at) })),
      overhangs: analysis.deflection.overhangs.map((o) => ({ end: o.end, length: r(o.length), tip: r(o.tip) })),
    }
  }
  // A block, like a line, must take the largest of the loads it may see (rigid, once slack, with stretch).
  const stretched = elastic && !('reason' in elastic) ? elastic.loads : undefined
  const heavier = analysis.lineLoads.map((load, k) => {
    const slackOrRigid = tensionOnly?.stable ? Dec.max(load, tensionOnly.lineLoads[k]!) : load
    return stretched ? Dec.max(slackOrRigid, stretched[k]!) : slackOrRigid
  })
  const tips = tensionOnly?.stable === false
  Object.assign(result, kindFigures(input, { totalLoad: analysis.totalLoad, lineLoads: heavier, tips }, checks))
  result.checks = sortChecks(checks)
  return result
}

/**
 * Validates raw input (from JSON) and calculates, or answers the one error shape naming the fields.
 *
 * @example
 * runCalculation({ units: 'furlongs' }) // { ok: false, error: { error: { code: 'validation_failed', ... } } }
 */
export function runCalculation(
  raw: unknown,
): { ok: true; result: CalculationResult } | { ok: false; error: ErrorBody } {
  const parsed = calculationInputSchema.safeParse(raw)
  if (!parsed.success) return { ok: false, error: validationErrorBody(parsed.error.issues) }
  return { ok: true, result: calculate(parsed.data) }
}
