import { Dec } from '../../shared/units/decimal.js'
import { fromSI, toSI, type Quantity, type UnitSystem } from '../../shared/units/systems.js'

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

export function apiFromStored(value: string | null, quantity: Quantity, system: UnitSystem): number | null {
  if (value === null) return null
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
