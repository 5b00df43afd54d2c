import { Dec, type UnitSystem } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import { check, type Check } from './checks.js'
import { formatQuantity } from './format.js'

export interface MotorFigures {
  ratedCapacity: Decimal
  load: Decimal
  counterweightAssist: Decimal
  checks: Check[]
}

/**
 * What the hoist carries: the whole load, or where counterweight assists, the imbalance
 * (load − assist; negative when the counterweight side is heavier, which the motor must hold back too).
 *
 * @example
 * motorLoad(Dec(900), { ratedCapacity: 500, counterweightAssist: 600 }, 'imperial').load.toString() // '300'
 */
export function motorLoad(
  totalLoad: Decimal,
  hoist: { ratedCapacity: number; counterweightAssist?: number },
  units: UnitSystem,
): MotorFigures {
  const assist = Dec(hoist.counterweightAssist ?? 0)
  const load = totalLoad.minus(assist)
  const weight = (value: Decimal.Value) => formatQuantity(value, 'weight', units)
  const checks: Check[] = []
  const carried = assist.isZero()
    ? `the load of ${weight(load)}`
    : `an imbalance of ${weight(load.abs())} (load ${weight(totalLoad)}, counterweight ${weight(assist)})`
  if (load.abs().gt(hoist.ratedCapacity))
    checks.push(
      check(
        'hoist-over-capacity',
        'danger',
        `The hoist would carry ${carried}, above its rated capacity of ${weight(hoist.ratedCapacity)}`,
      ),
    )
  else
    checks.push(
      check(
        'hoist-load',
        'info',
        `The hoist carries ${carried}, within its rated capacity of ${weight(hoist.ratedCapacity)}`,
      ),
    )
  if (load.lt(0))
    checks.push(
      check(
        'hoist-counterweight-heavy',
        'caution',
        `The counterweight outweighs the load by ${weight(load.neg())}; the hoist and its brake hold the set against the arbor`,
      ),
    )
  return { ratedCapacity: Dec(hoist.ratedCapacity), load, counterweightAssist: assist, checks }
}
