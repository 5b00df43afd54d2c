import type { Decimal } from 'decimal.js'
import { scaledDecimal } from './scaled-decimal.js'

/** A number's own decimal (the shortest that reads back to it) as an integer and a count of places. */
export interface NumberDigits {
  units: number
  scale: number
}

// Exact powers of ten as doubles, enough for any count of places a plain-notation number shows.
const POWERS_OF_TEN = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`))

// Two different decimals of 15 significant digits or fewer never read as the same double.
const UNIQUE_BELOW = 1e15
const MOST_PLACES = 12

/**
 * The value of `String(x)`, the very decimal `Dec(x)` reads, as a safe integer and a count of
 * places, found without writing a string: the first scale whose rounded integer reads back as x
 * (an integer below 2⁵³ over an exact power of ten rounds correctly, as parsing does). Below 10¹⁵
 * that decimal is the only one so short that reads as x, so it is the shortest, `String(x)`'s own.
 * Undefined for −0, and when no such integer exists within {@link MOST_PLACES} places.
 *
 * @example
 * numberDigits(12.35) // { units: 1235, scale: 2 }
 */
export function numberDigits(x: number): NumberDigits | undefined {
  // −0 reads as a signed decimal zero, which an integer cannot carry.
  if (Object.is(x, -0)) return undefined
  for (let scale = 0; scale <= MOST_PLACES; scale++) {
    const power = POWERS_OF_TEN[scale]!
    const units = Math.round(x * power)
    if (!(Math.abs(units) < UNIQUE_BELOW)) return undefined
    if (units / power === x) return { units, scale }
  }
  return undefined
}

/**
 * `Dec(x).minus(Dec(origin))` (negated when `outward`), worked in safe integers and read as a
 * decimal once. Why: placing a load is otherwise two decimal conversions and a decimal subtraction.
 * Every step is an exact integer (each is checked to stay below 2⁵³), so the value is the exact
 * difference, as the 40-digit decimals give; undefined where that cannot be guaranteed.
 *
 * @example
 * exactOffset(12.35, numberDigits(10)!, false)!.toString() // '2.35'
 */
export function exactOffset(x: number, origin: NumberDigits, outward: boolean): Decimal | undefined {
  const at = numberDigits(x)
  if (!at) return undefined
  const scale = Math.max(at.scale, origin.scale)
  const a = at.units * POWERS_OF_TEN[scale - at.scale]!
  const b = origin.units * POWERS_OF_TEN[scale - origin.scale]!
  const difference = outward ? b - a : a - b
  // An integer product or difference past 2⁵³ − 1 rounds to 2⁵³ or beyond, so these checks catch every inexact step.
  if (!Number.isSafeInteger(a) || !Number.isSafeInteger(b) || !Number.isSafeInteger(difference)) return undefined
  return scaledDecimal(difference, scale)
}
