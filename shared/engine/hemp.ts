import { Dec, type UnitSystem } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import { check, type Check } from './checks.js'
import { formatQuantity } from './format.js'

export interface HaulFigures {
  load: Decimal
  sandbag: Decimal
  force: Decimal
  checks: Check[]
}

/**
 * Haul force on a hemp set: load − sandbag. The sandbag must stay lighter than the load so the load
 * side stays heavy; a sandbag heavier than the load is a danger.
 *
 * @example
 * hempHaul(Dec(120), 40, 'imperial').force.toString() // '80'
 */
export function hempHaul(load: Decimal, sandbagWeight: number | undefined, units: UnitSystem): HaulFigures {
  const sandbag = Dec(sandbagWeight ?? 0)
  const force = load.minus(sandbag)
  const weight = (value: Decimal.Value) => formatQuantity(value, 'weight', units)
  const checks: Check[] = []
  if (sandbag.gt(load))
    checks.push(
      check(
        'sandbag-heavier-than-load',
        'danger',
        `The sandbag (${weight(sandbag)}) outweighs the load (${weight(load)}) by ${weight(sandbag.minus(load))}: the set will run out when released`,
      ),
    )
  else
    checks.push(
      check(
        'haul-force',
        'info',
        `The operator hauls ${weight(force)}${sandbag.isZero() ? '' : ` (load ${weight(load)} less sandbag ${weight(sandbag)})`}`,
      ),
    )
  return { load, sandbag, force, checks }
}
