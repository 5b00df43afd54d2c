import { z } from 'zod'
import { Dec, fromSI, unitLabel, UNIT_SYSTEMS, type UnitSystem } from '../units/index.js'
import { COUNT_RANGES, DESIGN_FACTOR_RANGE, FIGURE_RANGES, SMALLEST_STEP, type FigureName } from './ranges.js'

/**
 * Field builders shared by every form and route, so a figure is refused with the same words on the screen
 * and from the API, and every figure is held to its range in `ranges.ts`.
 */

/** A figure range in one unit system, as the rule applies it and the message states it. */
export interface RangeInUnits {
  min: number
  max: number
  unit: string
  places?: number
}

/** Thousands grouped, never exponent notation: `44,000`, `0.000001`. */
export function formatBound(value: number): string {
  const [whole, fraction] = Dec(value).toFixed().split('.') as [string, string | undefined]
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',')
  return fraction ? `${grouped}.${fraction}` : grouped
}

const made = new Map<string, RangeInUnits>()

/**
 * A named range in the units someone types in: the SI bounds converted and rounded inward to three
 * significant digits (so the bounds read cleanly and the stated range is exactly the rule); a non-zero
 * lower bound is at least the smallest figure that survives the API's rounding.
 *
 * @example
 * figureRange('battenLength', 'imperial') // { min: 0.0329, max: 131, unit: 'ft' }
 */
export function figureRange(name: FigureName, units: UnitSystem): RangeInUnits {
  const key = `${name} ${units}`
  const known = made.get(key)
  if (known) return known
  const range = FIGURE_RANGES[name]
  const max = fromSI(range.max, range.quantity, units).toSignificantDigits(3, Dec.ROUND_DOWN).toNumber()
  const rawMin = fromSI(range.min, range.quantity, units)
  const min = rawMin.isZero() ? 0 : Math.max(rawMin.toSignificantDigits(3, Dec.ROUND_UP).toNumber(), SMALLEST_STEP)
  const found: RangeInUnits = { min, max, unit: unitLabel(range.quantity, units) }
  if ('places' in range) found.places = range.places
  made.set(key, found)
  return found
}

const numberError = (label: string) => ({
  error: (issue: { input?: unknown }) => (issue.input == null ? `${label} is required` : `${label} must be a number`),
})

/**
 * A figure held to its named range, in the units it was typed in, refused with a message that states the range.
 * Where zero is allowed, a figure too small to survive the API's six-decimal rounding is refused as well.
 *
 * @example
 * figure('battenLength', 'metric', 'Batten length').safeParse(50).error?.issues[0]?.message
 * // 'Batten length must be between 0.01 and 40 m'
 */
export function figure(name: FigureName, units: UnitSystem, label: string) {
  const { min, max, unit, places } = figureRange(name, units)
  const between = `${label} must be between ${formatBound(min)} and ${formatBound(max)} ${unit}`
  let schema = z.number(numberError(label)).min(min, between).max(max, between)
  if (min === 0)
    schema = schema.refine(
      (value) => !(value > 0 && value < SMALLEST_STEP),
      `${label} must be 0 or at least ${formatBound(SMALLEST_STEP)} ${unit}; a smaller figure reads back as 0`,
    )
  if (places !== undefined)
    schema = schema.refine(
      (value) => Dec(value).decimalPlaces() <= places,
      `${label} can have at most ${places} decimal places`,
    )
  return schema
}

/** A figure that may be left out: `null` or absent means "not known / not fitted". */
export const optionalFigure = (name: FigureName, units: UnitSystem, label: string) =>
  figure(name, units, label).nullable().optional()

/**
 * A whole number held to its named range.
 *
 * @example
 * count('bricks', 'Bricks available').safeParse(1.5).success // false
 */
export function count(name: keyof typeof COUNT_RANGES, label: string) {
  const { min, max } = COUNT_RANGES[name]
  const between = `${label} must be a whole number between ${formatBound(min)} and ${formatBound(max)}`
  return z.number(numberError(label)).int(between).min(min, between).max(max, between)
}

/** A wire-rope design factor (breaking strength ÷ working load). */
export function designFactor(label: string) {
  const { min, max } = DESIGN_FACTOR_RANGE
  const between = `${label} must be between ${min} and ${max}`
  return z.number(numberError(label)).min(min, between).max(max, between)
}

/** Optimistic-lock token every update carries; a stale one is refused with 409, an impossible one with 400. */
export const versionField = () => count('version', 'Version')

/**
 * The unit system a write's figures were typed in (the venue's, as the form last read it). It picks the
 * ranges the figures are held to, and the server refuses the write with 409 when the venue has switched
 * since, so 40 ft is never stored as 40 m.
 */
export const typedInField = () => z.enum(UNIT_SYSTEMS, { error: 'Say which units the figures were typed in' })

/**
 * The units a body says it was typed in, to pick its schema; a body that names none is read as imperial,
 * and its schema then refuses it on `unitSystem`.
 */
export const unitsTypedIn = (body: unknown): UnitSystem => {
  const named = (body as { unitSystem?: unknown } | null)?.unitSystem
  return UNIT_SYSTEMS.includes(named as UnitSystem) ? (named as UnitSystem) : 'imperial'
}
