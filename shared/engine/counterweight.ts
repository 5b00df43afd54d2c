import { Dec, type UnitSystem } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import { planBricks, type BrickStock, type BrickPlan } from './brick-plan.js'
import { check, type Check } from './checks.js'
import { formatQuantity } from './format.js'

/** 1 for single purchase, 2 for double purchase (the arbor moves half as far and must weigh twice as much). */
export function purchaseRatio(kind: string): 1 | 2 {
  return kind === 'counterweight-double' ? 2 : 1
}

export interface CounterweightRequest {
  units: UnitSystem
  ratio: 1 | 2
  battenSide: Decimal
  arbor: { emptyWeight: number; capacity: number; stackLength: number; stackUsed?: number }
  pipeWeightAboard?: number
  bricks: readonly BrickStock[]
  tolerance: number
  ropeLockHolding?: number
}

export interface CounterweightFigures {
  required: Decimal
  plan: BrickPlan
  arborSide: Decimal
  outOfBalance: Decimal
  checks: Check[]
  /** Partial plans the brick searches tried, together: at most two plans' worth of BRICK_PLAN_WORK_LIMIT. */
  work: number
}

/**
 * Brick weight the arbor needs (ratio × batten side − arbor empty weight − pipe weight aboard), the
 * brick plan that meets it without going arbor heavy, and the signed out-of-balance at the batten:
 * (ratio × B − A) / ratio, positive when the batten side is heavier.
 *
 * @example
 * balanceCounterweight({ units: 'imperial', ratio: 1, battenSide: Dec(500), arbor: { emptyWeight: 90, capacity: 2000, stackLength: 60 },
 *   bricks: [{ name: 'full', weight: 20, thickness: 2, available: 80 }], tolerance: 10 }).outOfBalance.toString() // '10'
 */
export function balanceCounterweight(request: CounterweightRequest): CounterweightFigures {
  const { ratio, battenSide, arbor, units } = request
  const weight = (value: Decimal.Value) => formatQuantity(value, 'weight', units)
  const aboard = Dec(request.pipeWeightAboard ?? 0)
  const fixed = Dec(arbor.emptyWeight).plus(aboard)
  const required = battenSide.times(ratio).minus(fixed)
  const room = Dec(arbor.capacity).minus(aboard)
  const stackRoom = Dec(arbor.stackLength).minus(arbor.stackUsed ?? 0)
  // The band is the tolerance at the batten, which the purchase ratio multiplies at the arbor.
  const plan = planBricks(request.bricks, Dec.min(required, room), stackRoom, Dec(request.tolerance).times(ratio))
  const arborSide = fixed.plus(plan.loaded)
  const outOfBalance = battenSide.times(ratio).minus(arborSide).div(ratio)
  const checks: Check[] = []
  const tolerance = Dec(request.tolerance)
  if (required.gt(room))
    checks.push(
      check(
        'arbor-over-capacity',
        'danger',
        `The arbor needs ${weight(required)} of bricks but takes only ${weight(room)} more (capacity ${weight(arbor.capacity)}${aboard.isZero() ? '' : `, ${weight(aboard)} of pipe weight already aboard`})`,
      ),
    )
  const emptyTooHeavy = required.lt(0) && outOfBalance.abs().gt(tolerance)
  if (emptyTooHeavy)
    checks.push(
      check(
        'arbor-heavy-empty',
        'danger',
        `Even with no bricks the arbor side is ${weight(outOfBalance.neg())} heavier than the batten side at the batten; add weight to the batten or lighten the arbor before the set moves`,
      ),
    )
  let work = plan.work
  if (!emptyTooHeavy && outOfBalance.gt(tolerance)) {
    const shortfall = shortfallCheck(request, required, room, stackRoom, plan, outOfBalance, weight)
    checks.push(shortfall.check)
    work += shortfall.work
  }
  if (!plan.complete)
    checks.push(
      check(
        'brick-plan-unproven',
        'caution',
        `The brick plan search stopped at its work limit: this plan fits the stock, capacity and stack, but a closer one may exist; check the arbor by hand`,
      ),
    )
  if (request.ropeLockHolding !== undefined && outOfBalance.abs().gt(request.ropeLockHolding))
    checks.push(
      check(
        'beyond-rope-lock',
        'caution',
        `Out of balance by ${weight(outOfBalance)}, more than the rope lock's holding figure of ${weight(request.ropeLockHolding)}; the lock is not a brake`,
      ),
    )
  return { required, plan, arborSide, outOfBalance, checks, work }
}

/** Why the plan falls short: the stock, the stack or the capacity (danger), or only the brick sizes (caution). */
function shortfallCheck(
  request: CounterweightRequest,
  required: Decimal,
  room: Decimal,
  stackRoom: Decimal,
  plan: BrickPlan,
  outOfBalance: Decimal,
  weight: (v: Decimal.Value) => string,
): { check: Check; work: number } {
  const heavy = `the set stays ${weight(outOfBalance)} batten heavy, beyond the tolerance of ${weight(request.tolerance)}`
  const short = (cause: string) =>
    check(
      'counterweight-short',
      'danger',
      `The arbor needs ${weight(required)} of bricks but ${cause} allows only ${weight(plan.loaded)}: ${heavy}`,
    )
  // Past the capacity no stock or stack could help, so there is nothing to search for.
  if (required.gt(room)) return { check: short('the arbor capacity'), work: 0 }
  const relaxed = relaxedPlan(request.bricks, required)
  const { work } = relaxed
  // Only a finished search proves the sizes are the limit; otherwise say the stock may be short (danger).
  if (relaxed.complete && !plan.loaded.lt(relaxed.loaded))
    return { check: check('out-of-balance', 'caution', `The brick sizes cannot come closer: ${heavy}`), work }
  const cause = relaxed.stackUsed.gt(stackRoom)
    ? `the stack length (${formatQuantity(stackRoom, 'shortLength', request.units)} free)`
    : 'the bricks in stock'
  return { check: short(cause), work }
}

/**
 * The closest plan with every type in ample stock and a stack that cannot run out, to tell the sizes apart
 * from the stock and the stack. Bounded: the requirement is within the arbor's capacity here, so no type needs
 * more than requirement ÷ its weight, and the stack room is what all those bricks would take.
 */
function relaxedPlan(bricks: readonly BrickStock[], required: Decimal): BrickPlan {
  const ample = bricks.map((b) => ({ ...b, available: Dec(required).div(b.weight).floor().toNumber() + 1 }))
  const stack = ample.reduce((sum, b) => sum.plus(Dec(b.thickness).times(b.available)), Dec(0))
  return planBricks(ample, required, stack)
}
