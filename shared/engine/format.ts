import type { Decimal } from 'decimal.js'
import { displayNumber, displayQuantity, type Quantity, type UnitSystem } from '../units/index.js'

/**
 * A plain figure for a message: rounded to 0.01, thousands separated, trailing zeros dropped.
 *
 * @example
 * formatFigure(1020) // '1,020'
 * formatFigure('-1234.567') // '-1,234.57'
 */
export function formatFigure(value: Decimal.Value): string {
  return displayNumber(value, 2)
}

/**
 * A figure with its unit label, for a message, by the app's one display rule (`DISPLAY_PLACES`).
 *
 * @example
 * formatQuantity(875, 'weight', 'imperial') // '875 lb'
 */
export function formatQuantity(value: Decimal.Value, quantity: Quantity, units: UnitSystem): string {
  return displayQuantity(value, quantity, units)
}
