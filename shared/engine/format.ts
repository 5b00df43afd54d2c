import { Dec, unitLabel, type Quantity, type UnitSystem } from '../units/index.js'
import type { Decimal } from 'decimal.js'

/**
 * A figure for a message: rounded to 0.01, thousands separated, trailing zeros dropped.
 *
 * @example
 * formatFigure(1020) // '1,020'
 * formatFigure('-1234.567') // '-1,234.57'
 */
export function formatFigure(value: Decimal.Value): string {
  const rounded = Dec(value).toDecimalPlaces(2, Dec.ROUND_HALF_UP)
  // A decimal's toFixed never turns to exponent notation, however large the figure.
  const [whole, fraction] = rounded.abs().toFixed(2).split('.') as [string, string]
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',')
  const tail = fraction.replace(/0+$/, '')
  return `${rounded.isNegative() && !rounded.isZero() ? '-' : ''}${grouped}${tail ? `.${tail}` : ''}`
}

/**
 * A figure with its unit label, for a message.
 *
 * @example
 * formatQuantity(875, 'weight', 'imperial') // '875 lb'
 */
export function formatQuantity(value: Decimal.Value, quantity: Quantity, units: UnitSystem): string {
  return `${formatFigure(value)} ${unitLabel(quantity, units)}`
}
