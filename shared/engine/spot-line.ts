import type { UnitSystem } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import { check, type Check } from './checks.js'
import { formatQuantity } from './format.js'

/**
 * Each spot line's load against the rating of the block it runs over.
 *
 * @example
 * spotLineChecks([Dec(300)], [0], 250, 'imperial')[0]!.code // 'block-over-rating'
 */
export function spotLineChecks(
  loads: readonly Decimal[],
  positions: readonly number[],
  blockRating: number | undefined,
  units: UnitSystem,
): Check[] {
  if (blockRating === undefined)
    return [
      check('block-rating-unchecked', 'info', 'No block rating was given, so the spot line blocks were not checked'),
    ]
  const checks: Check[] = []
  loads.forEach((load, k) => {
    if (load.gt(blockRating))
      checks.push(
        check(
          'block-over-rating',
          'danger',
          `Spot line at ${formatQuantity(positions[k]!, 'length', units)} puts ${formatQuantity(load, 'weight', units)} on its block, above the block rating of ${formatQuantity(blockRating, 'weight', units)}`,
        ),
      )
  })
  return checks
}
