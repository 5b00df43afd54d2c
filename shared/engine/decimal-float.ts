import type { Decimal } from 'decimal.js'

/** Exact powers of ten as doubles (10²² is the largest a double holds exactly). */
const POWERS_OF_TEN = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`))
/** Decimal.js keeps digits in base-10⁷ words (its documented, read-only `d`, `e` and `s`). */
const WORD = 1e7

/**
 * The double nearest a decimal: what `toNumber()` gives, without writing and parsing a string.
 * A decimal of up to two words (14 digits) is an integer N < 2⁵³ times a power of ten up to
 * 10²²; both are exact doubles, so one IEEE multiply or divide rounds it correctly, exactly as
 * parsing does. Anything longer goes through `toNumber()`. Used for float twins (location only).
 *
 * @example
 * floatOf(Dec('12.34')) === 12.34 // true
 */
export function floatOf(value: Decimal): number {
  const words = value.d
  if (!words || words.length > 2) return value.toNumber()
  const first = words[0]!
  if (first === 0) return value.s < 0 ? -0 : 0
  const mantissa = words.length === 2 ? first * WORD + words[1]! : first
  // value = 0.d₀d₁… written out: the last word's last digit sits at 10^(e − digits + 1).
  const digits = String(first).length + 7 * (words.length - 1)
  const power = value.e - digits + 1
  if (power < -22 || power > 22) return value.toNumber()
  const magnitude = power < 0 ? mantissa / POWERS_OF_TEN[-power]! : mantissa * POWERS_OF_TEN[power]!
  return value.s < 0 ? -magnitude : magnitude
}
