import { Decimal } from 'decimal.js'

/**
 * The one decimal constructor every quantity in Loftledger goes through.
 *
 * Forty significant digits keeps the one non-terminating step (dividing by an
 * exact factor such as 0.3048) far below anything a display or a check can see.
 *
 * @example
 * Dec('2.72').times('40').toString() // '108.8'
 */
export const Dec = Decimal.clone({ precision: 40, rounding: Decimal.ROUND_HALF_UP })
export type Dec = Decimal

/** Anything a quantity can be given as: a number, a decimal string or a Decimal. */
export type DecimalInput = Decimal.Value
