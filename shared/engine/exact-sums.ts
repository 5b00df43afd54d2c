import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import { scaledDecimal } from './scaled-decimal.js'

/** Running sums kept as columns (one per power of position), read one row at a time. */
export interface SumColumns {
  /** How many rows: one more than the loads (row 0 is zero). */
  readonly rows: number
  /** The sums over the first i loads, one per column. */
  row(i: number): Decimal[]
}

// Past 30 places a figure is not one a crew typed; the decimal path takes it.
const MAX_SCALE = 30
// Every integer below 10⁴⁰ is exact in a 40-digit decimal, so while each term and partial sum stays
// below it the decimal path never rounds either, and the two agree exactly.
const LIMIT = 10n ** 40n
const POWERS_OF_TEN = Array.from({ length: MAX_SCALE + 1 }, (_, k) => 10n ** BigInt(k))
const WORD = 10_000_000n

/**
 * A finite decimal as units × 10^−scale with the fewest places, read from decimal.js's documented
 * `d`, `e` and `s` (no string round trip); undefined past {@link MAX_SCALE} places.
 *
 * @example
 * scaledInteger(Dec('12.50')) // { units: 125n, scale: 1 }
 */
export function scaledInteger(value: Decimal): { units: bigint; scale: number } | undefined {
  const words = value.d
  if (!words) return undefined
  if (words[0] === 0) return { units: 0n, scale: 0 }
  let power = value.e - (String(words[0]).length + 7 * (words.length - 1)) + 1
  // Up to two words the digits are below 10¹⁴ < 2⁵³: exact as a double, and far cheaper to trim there.
  if (words.length <= 2) {
    let digits = words.length === 2 ? words[0]! * 1e7 + words[1]! : words[0]!
    for (; power < 0 && digits % 10 === 0; power++) digits /= 10
    if (power < -MAX_SCALE) return undefined
    let small = BigInt(digits)
    if (power > 0) small *= 10n ** BigInt(power)
    return { units: value.s < 0 ? -small : small, scale: Math.max(0, -power) }
  }
  // Integers only, never a double: every step here is exact.
  let units = 0n
  for (const word of words) units = units * WORD + BigInt(word)
  for (; power < 0 && units % 10n === 0n; power++) units /= 10n
  if (power < -MAX_SCALE) return undefined
  if (power > 0) units *= 10n ** BigInt(power)
  return { units: value.s < 0 ? -units : units, scale: Math.max(0, -power) }
}

/**
 * Running sums of c·xᵏ (k = 0 … columns − 1) over coefficient c at position x, exact in integers
 * scaled by a common power of ten per column, turned into decimals only for the rows read.
 * Why: a load's powers in decimals cost several decimal operations each; in integers they are
 * a few machine-fast steps, and no rounding happens on either path while they stay in bounds.
 * Returns undefined (the caller keeps its decimal sums) when a figure has more than 30 places or a
 * term or sum reaches 10⁴⁰, where the 40-digit decimal path would round and could differ.
 *
 * @example
 * exactRunningSums([Dec(4), Dec('2.5')], [Dec(5), Dec(2)], 2)!.row(2).map(String) // ['7', '25']
 */
export function exactRunningSums(
  at: readonly Decimal[],
  coefficient: readonly Decimal[],
  columns: number,
): SumColumns | undefined {
  const xs = scaleAll(at)
  const cs = scaleAll(coefficient)
  if (!xs || !cs) return undefined
  const sums = Array.from({ length: columns }, () => [0n])
  for (let i = 0; i < xs.units.length; i++) {
    let term = cs.units[i]!
    for (let k = 0; k < columns; k++) {
      const column = sums[k]!
      const total = column[column.length - 1]! + term
      if (total >= LIMIT || total <= -LIMIT) return undefined
      column.push(total)
      if (k + 1 < columns) term *= xs.units[i]!
    }
    // |c·xᵏ| grows with k for a nonzero integer x, so the last term bounds every product before it.
    if (term >= LIMIT || term <= -LIMIT) return undefined
  }
  const scales = sums.map((_, k) => cs.scale + k * xs.scale)
  const made: Decimal[][] = []
  return {
    rows: xs.units.length + 1,
    row: (i) => (made[i] ??= sums.map((column, k) => toDecimal(column[i]!, scales[k]!))),
  }
}

/** Each figure as an integer at the list's largest scale. */
function scaleAll(values: readonly Decimal[]): { units: bigint[]; scale: number } | undefined {
  const scaled = []
  let scale = 0
  for (const value of values) {
    const one = scaledInteger(value)
    if (!one) return undefined
    scaled.push(one)
    scale = Math.max(scale, one.scale)
  }
  return { units: scaled.map((one) => one.units * POWERS_OF_TEN[scale - one.scale]!), scale }
}

const ZERO = Dec(0)
// Row 0, and any column a region leaves empty, is zero: no digits to read.
const toDecimal = (units: bigint, scale: number) => (units === 0n ? ZERO : scaledDecimal(units, scale))
