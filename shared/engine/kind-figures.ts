import { Dec, roundTo, type UnitSystem } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import type { CalculationInput, CalculationResult } from '../schemas/calculation.js'
import { check, type Check } from './checks.js'
import { balanceCounterweight, purchaseRatio } from './counterweight.js'
import { formatQuantity } from './format.js'
import { hempHaul } from './hemp.js'
import { motorLoad } from './motorized.js'
import { spotLineChecks } from './spot-line.js'
import { arborTravel, battenTravel, travelShift } from './travel-shift.js'

const r = (value: Decimal.Value) => roundTo(value, 2)
type KindFigures = Pick<CalculationResult, 'counterweight' | 'travel' | 'haul' | 'motor'>

/**
 * The figures particular to the lineset's kind, adding their findings to `checks`. A batten that tips
 * (`tips`) gets no counterweight plan: balancing the arbor against it would read as a set that can fly.
 *
 * @example
 * kindFigures(input, { totalLoad: Dec(1208.8), lineLoads }, checks).counterweight?.ratio // 1
 */
export function kindFigures(
  input: CalculationInput,
  loads: { totalLoad: Decimal; lineLoads: Decimal[]; tips?: boolean },
  checks: Check[],
): KindFigures {
  const { units } = input
  const { totalLoad } = loads
  if (input.kind === 'counterweight-single' || input.kind === 'counterweight-double')
    return loads.tips ? {} : counterweightFigures(input, totalLoad, checks)
  const figures: KindFigures = {}
  const travel = battenTravel(input)
  if (travel) figures.travel = { batten: r(travel) }
  if (input.kind === 'hemp-single' || input.kind === 'hemp-multi') {
    const haul = hempHaul(totalLoad, input.sandbag?.weight, units)
    checks.push(...haul.checks)
    figures.haul = { load: r(haul.load), sandbag: r(haul.sandbag), force: r(haul.force) }
  } else if (input.kind === 'spot-line') {
    checks.push(...spotLineChecks(loads.lineLoads, input.batten.pickPoints, input.spotLine?.blockRating, units))
  } else if (input.kind === 'motorized' && input.hoist) {
    const motor = motorLoad(totalLoad, input.hoist, units)
    checks.push(...motor.checks)
    figures.motor = {
      ratedCapacity: r(motor.ratedCapacity),
      load: r(motor.load),
      counterweightAssist: r(motor.counterweightAssist),
    }
  }
  return figures
}

function counterweightFigures(input: CalculationInput, totalLoad: Decimal, checks: Check[]): KindFigures {
  const { units } = input
  const ratio = purchaseRatio(input.kind)
  const figures = balanceCounterweight({
    units,
    ratio,
    battenSide: totalLoad,
    arbor: input.arbor!,
    pipeWeightAboard: input.pipeWeightAboard,
    bricks: input.bricks ?? [],
    tolerance: input.tolerance ?? 0,
    ropeLockHolding: input.ropeLockHolding,
  })
  checks.push(...figures.checks, planCheck(input, figures.plan.counts, figures.plan.loaded, units))
  const result: KindFigures = {
    counterweight: {
      ratio,
      battenSide: r(totalLoad),
      required: r(figures.required),
      bricks: (input.bricks ?? []).map((b, k) => ({
        name: b.name,
        count: figures.plan.counts[k]!,
        weight: r(Dec(b.weight).times(figures.plan.counts[k]!)),
      })),
      loaded: r(figures.plan.loaded),
      stackUsed: r(figures.plan.stackUsed),
      arborSide: r(figures.arborSide),
      outOfBalance: r(figures.outOfBalance),
    },
  }
  const travel = battenTravel(input)
  if (travel) {
    result.travel = { batten: r(travel), arbor: r(arborTravel(travel, ratio)) }
    const lineWeight = input.liftLine?.weightPerLength
    if (lineWeight !== undefined) {
      const shift = travelShift({
        ratio,
        lines: input.batten.pickPoints.length,
        lineWeightPerLength: lineWeight,
        travel,
      })
      result.travel.shift = r(shift)
      const weight = formatQuantity(shift, 'weight', units)
      const message = `Over ${formatQuantity(travel, 'length', units)} of travel the lift lines move ${weight} (at the batten) toward the arbor side as the set flies out: balanced at the in trim, it is ${weight} arbor heavy at the out trim`
      checks.push(
        check('travel-shift', input.tolerance !== undefined && shift.gt(input.tolerance) ? 'caution' : 'info', message),
      )
    }
  }
  return result
}

function planCheck(input: CalculationInput, counts: number[], loaded: Decimal, units: UnitSystem): Check {
  const parts = (input.bricks ?? []).flatMap((b, k) => (counts[k] ? [`${counts[k]} × ${b.name}`] : []))
  const plan = parts.length ? parts.join(', ') : 'no bricks'
  return check(
    'brick-plan',
    'info',
    // A total for the hang, never an amount to add: a loader reading it as the latter would double the weight.
    `In all, the arbor should hold ${plan} (${formatQuantity(loaded, 'weight', units)}): a total, not bricks to add; load the batten before the arbor`,
  )
}
