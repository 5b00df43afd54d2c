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
  const plan = planBricks(request.bricks, Dec.min(required, room), stackRoom)
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
  if (required.lt(0) && outOfBalance.abs().gt(tolerance))
    checks.push(
      check(
        'arbor-heavy-empty',
        'danger',
        `Even with no bricks the arbor side is ${weight(outOfBalance.neg())} heavier than the batten side at the batten; add weight to the batten or lighten the arbor before the set moves`,
      ),
    )
  else if (outOfBalance.gt(tolerance))
    checks.push(shortfallCheck(request, required, room, stackRoom, plan, outOfBalance, weight))
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
  return { required, plan, arborSide, outOfBalance, checks }
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
): Check {
  const unlimited = request.bricks.map((b) => ({ ...b, available: Dec(required).div(b.weight).ceil().toNumber() + 1 }))
  const relaxed = planBricks(unlimited, required, Dec(10).pow(12))
  const heavy = `the set stays ${weight(outOfBalance)} batten heavy, beyond the tolerance of ${weight(request.tolerance)}`
  // Only a finished search proves the sizes are the limit; otherwise say the stock may be short (danger).
  if (relaxed.complete && !plan.loaded.lt(relaxed.loaded))
    return check('out-of-balance', 'caution', `The brick sizes cannot come closer: ${heavy}`)
  const cause = required.gt(room)
    ? 'the arbor capacity'
    : relaxed.stackUsed.gt(stackRoom)
      ? `the stack length (${formatQuantity(stackRoom, 'shortLength', request.units)} free)`
      : 'the bricks in stock'
  return check(
    'counterweight-short',
    'danger',
    `The arbor needs ${weight(required)} of bricks but ${cause} allows only ${weight(plan.loaded)}: ${heavy}`,
  )
}
