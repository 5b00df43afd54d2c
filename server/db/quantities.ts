import { Dec } from '../../shared/units/decimal.js'
import { fromSI, siPerUnit, toSI, type Quantity, type UnitSystem } from '../../shared/units/systems.js'

/**
 * API figures are in the venue's units; stored figures are SI decimal strings.
 * Into storage: exact (one multiplication or a 40-digit division). Out of storage: rounded once,
 * to this many places, which round-trips anything typed with up to six decimals unchanged.
 */
const API_PLACES = 6

export function storedFromApi(value: number | null | undefined, quantity: Quantity, system: UnitSystem): string | null {
  if (value === null || value === undefined) return null
  return toSI(value, quantity, system).toString()
}

const API_SCALE = 10 ** API_PLACES
// Floating point divides within a few parts in 1e16; a quotient this far from a rounding tie rounds alike either way.
const TIE_MARGIN = 1e-12
// Beyond this the scaled figure would pass 2^53, where doubles stop holding every integer.
const LARGEST_FAST = 1e9

// Unit factors never change: kept per system and quantity, looked up without building a key per figure.
const factorNumbers: Partial<Record<UnitSystem, Partial<Record<Quantity, number>>>> = {}
function factorNumber(quantity: Quantity, system: UnitSystem): number {
  const factors = (factorNumbers[system] ??= {})
  return (factors[quantity] ??= siPerUnit(quantity, system).toNumber())
}

/**
 * A stored SI figure in the venue's units, rounded half up to six places, exactly as the 40-digit decimal
 * division rounds it. Lists map thousands of figures per answer, so this divides in floating point first and
 * keeps that answer only when the scaled quotient is clearly away from a half: then both round to the same
 * integer N, and N / 10^6 is the double nearest N millionths, as the decimal's `toNumber()` is. Anything near a
 * tie, or too large, goes the decimal way.
 */
export function apiFromStored(value: string | null, quantity: Quantity, system: UnitSystem): number | null {
  if (value === null) return null
  const scaled = (Number(value) / factorNumber(quantity, system)) * API_SCALE
  const distanceFromTie = Math.abs(scaled - Math.floor(scaled) - 0.5)
  if (Math.abs(scaled) < LARGEST_FAST * API_SCALE && distanceFromTie > TIE_MARGIN * (1 + Math.abs(scaled)))
    return Math.round(scaled) / API_SCALE
  return exactApiFromStored(value, quantity, system)
}

/** The decimal way: exact to 40 digits, then rounded half up (away from zero) to six places. */
export function exactApiFromStored(value: string, quantity: Quantity, system: UnitSystem): number {
  return fromSI(value, quantity, system).toDecimalPlaces(API_PLACES, Dec.ROUND_HALF_UP).toNumber()
}

/** `{ apiField: quantity }` for a model whose attribute names equal the API's field names. */
export type QuantityMap<T extends string> = Readonly<Record<T, Quantity>>

export function toStoredFields<M extends QuantityMap<string>>(
  map: M,
  body: { [K in keyof M]?: number | null },
  system: UnitSystem,
) {
  const out = {} as { [K in keyof M]: string | null }
  for (const field of Object.keys(map) as (keyof M & string)[])
    out[field] = storedFromApi(body[field], map[field]!, system)
  return out
}

export function toApiFields<M extends QuantityMap<string>>(
  map: M,
  row: { [K in keyof M]: string | null },
  system: UnitSystem,
) {
  const out = {} as { [K in keyof M]: number | null }
  for (const field of Object.keys(map) as (keyof M & string)[])
    out[field] = apiFromStored(row[field], map[field]!, system)
  return out
}
