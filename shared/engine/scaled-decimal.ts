import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'

// 10⁻ᵏ, made once per k on first use.
const TENTHS: Decimal[] = []

/**
 * units × 10^−scale as a decimal. Why not parse `${units}e-${scale}`: a short integer becomes a
 * decimal without parsing, and the product with an exact power of ten keeps every digit (far
 * fewer than 40), so the value is the same, at about half the cost.
 *
 * @example
 * scaledDecimal(235, 2).toString() // '2.35'
 */
export function scaledDecimal(units: number | bigint, scale: number): Decimal {
  const whole =
    typeof units === 'number'
      ? Dec(units)
      : units >= -MAX_SAFE && units <= MAX_SAFE
        ? Dec(Number(units))
        : Dec(units.toString())
  if (scale === 0) return whole
  return whole.times((TENTHS[scale] ??= Dec(`1e-${scale}`)))
}

const MAX_SAFE = BigInt(Number.MAX_SAFE_INTEGER)
