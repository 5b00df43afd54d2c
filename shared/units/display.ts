import type { Decimal } from 'decimal.js'
import { Dec } from './decimal.js'
import { unitLabel, type Quantity, type UnitSystem } from './systems.js'

/**
 * The one display-rounding rule: how many decimals a figure of each quantity is shown with, in lists, forms'
 * read-outs, results and the engine's own messages alike (trailing zeros dropped), so the same weight never
 * reads 19.5 lb on one screen and 19.50 lb or 20 lb on another.
 */
export const DISPLAY_PLACES: Readonly<Record<Quantity, number>> = {
  weight: 2,
  length: 2,
  shortLength: 2,
  weightPerLength: 3,
  weightPerArea: 4,
  speed: 2,
  momentOfInertia: 3,
  sectionModulus: 3,
  stress: 2,
}

/**
 * A number rounded half away from zero to `places`, thousands separated, trailing zeros dropped.
 *
 * @example
 * displayNumber(1016.564, 2) // '1,016.56'
 * displayNumber('-1234.5', 2) // '-1,234.5'
 */
export function displayNumber(value: Decimal.Value, places: number): string {
  const rounded = Dec(value).toDecimalPlaces(places, Dec.ROUND_HALF_UP)
  // A decimal's toFixed never turns to exponent notation, however large the figure.
  const [whole, fraction = ''] = rounded.abs().toFixed(places).split('.') as [string, string?]
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',')
  const tail = fraction.replace(/0+$/, '')
  return `${rounded.isNegative() && !rounded.isZero() ? '-' : ''}${grouped}${tail ? `.${tail}` : ''}`
}

/**
 * A figure of a quantity with its unit label, by the one display rule.
 *
 * @example
 * displayQuantity(19.5, 'weight', 'imperial') // '19.5 lb'
 * displayQuantity(1016.564, 'weight', 'imperial') // '1,016.56 lb'
 */
export function displayQuantity(value: Decimal.Value, quantity: Quantity, system: UnitSystem): string {
  return `${displayNumber(value, DISPLAY_PLACES[quantity])} ${unitLabel(quantity, system)}`
}
