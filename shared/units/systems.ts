import { Dec, type DecimalInput } from './decimal.js'
import { KILOGRAMS_PER_POUND, METRES_PER_FOOT, METRES_PER_INCH, STANDARD_GRAVITY } from './factors.js'
import { type Quantity, type UnitSystem } from './labels.js'

export { QUANTITIES, UNIT_LABELS, UNIT_SYSTEMS, unitLabel, type Quantity, type UnitSystem } from './labels.js'

interface UnitDefinition {
  /** How many SI units one of this unit is (SI: kg, m, kg/m, m/s, m^4, m^3, Pa). */
  readonly siPerUnit: ReturnType<typeof Dec>
}

const POUND_FORCE_NEWTONS = KILOGRAMS_PER_POUND.times(STANDARD_GRAVITY)

const UNITS: Readonly<Record<Quantity, Readonly<Record<UnitSystem, UnitDefinition>>>> = {
  weight: {
    imperial: { siPerUnit: KILOGRAMS_PER_POUND },
    metric: { siPerUnit: Dec(1) },
  },
  length: {
    imperial: { siPerUnit: METRES_PER_FOOT },
    metric: { siPerUnit: Dec(1) },
  },
  shortLength: {
    imperial: { siPerUnit: METRES_PER_INCH },
    metric: { siPerUnit: Dec('0.001') },
  },
  weightPerLength: {
    imperial: { siPerUnit: KILOGRAMS_PER_POUND.div(METRES_PER_FOOT) },
    metric: { siPerUnit: Dec(1) },
  },
  // Fabric by area (soft goods).
  weightPerArea: {
    imperial: { siPerUnit: KILOGRAMS_PER_POUND.div(METRES_PER_FOOT.pow(2)) },
    metric: { siPerUnit: Dec(1) },
  },
  speed: {
    imperial: { siPerUnit: METRES_PER_FOOT.div(60) },
    metric: { siPerUnit: Dec(1) },
  },
  momentOfInertia: {
    imperial: { siPerUnit: METRES_PER_INCH.pow(4) },
    metric: { siPerUnit: Dec('0.001').pow(4) },
  },
  sectionModulus: {
    imperial: { siPerUnit: METRES_PER_INCH.pow(3) },
    metric: { siPerUnit: Dec('0.001').pow(3) },
  },
  stress: {
    imperial: { siPerUnit: POUND_FORCE_NEWTONS.times(1000).div(METRES_PER_INCH.pow(2)) },
    metric: { siPerUnit: Dec(1e6) },
  },
}

/**
 * Converts a figure entered in a unit system into its SI storage value.
 *
 * @example
 * toSI(100, 'weight', 'imperial').toString() // '45.359237'
 */
export function toSI(value: DecimalInput, quantity: Quantity, system: UnitSystem) {
  return Dec(value).times(UNITS[quantity][system].siPerUnit)
}

/**
 * Converts an SI storage value into a unit system's figure, unrounded.
 *
 * @example
 * fromSI('45.359237', 'weight', 'imperial').toString() // '100'
 */
export function fromSI(value: DecimalInput, quantity: Quantity, system: UnitSystem) {
  return Dec(value).div(UNITS[quantity][system].siPerUnit)
}

/**
 * How many SI units one unit of a quantity is in a system (the factor `toSI` multiplies by).
 *
 * @example
 * siPerUnit('weight', 'imperial').toString() // '0.45359237'
 */
export function siPerUnit(quantity: Quantity, system: UnitSystem) {
  return UNITS[quantity][system].siPerUnit
}

/**
 * Converts a figure between unit systems, unrounded.
 *
 * @example
 * convert(10, 'length', 'imperial', 'metric').toString() // '3.048'
 */
export function convert(value: DecimalInput, quantity: Quantity, from: UnitSystem, to: UnitSystem) {
  return from === to ? Dec(value) : fromSI(toSI(value, quantity, from), quantity, to)
}
