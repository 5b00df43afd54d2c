import { Dec, type DecimalInput } from './decimal.js'
import { KILOGRAMS_PER_POUND, METRES_PER_FOOT, METRES_PER_INCH, STANDARD_GRAVITY } from './factors.js'

/** How a venue writes its figures: pounds and feet, or kilograms and metres. */
export const UNIT_SYSTEMS = ['imperial', 'metric'] as const
export type UnitSystem = (typeof UNIT_SYSTEMS)[number]

/**
 * The kinds of quantity Loftledger stores. Each has one SI unit for storage and
 * one unit per system for display and entry.
 */
export const QUANTITIES = [
  'weight',
  'length',
  'shortLength',
  'weightPerLength',
  'weightPerArea',
  'speed',
  'momentOfInertia',
  'sectionModulus',
  'stress',
] as const
export type Quantity = (typeof QUANTITIES)[number]

interface UnitDefinition {
  /** How many SI units one of this unit is (SI: kg, m, kg/m, m/s, m^4, m^3, Pa). */
  readonly siPerUnit: ReturnType<typeof Dec>
  readonly label: string
}

const POUND_FORCE_NEWTONS = KILOGRAMS_PER_POUND.times(STANDARD_GRAVITY)

const UNITS: Readonly<Record<Quantity, Readonly<Record<UnitSystem, UnitDefinition>>>> = {
  weight: {
    imperial: { siPerUnit: KILOGRAMS_PER_POUND, label: 'lb' },
    metric: { siPerUnit: Dec(1), label: 'kg' },
  },
  length: {
    imperial: { siPerUnit: METRES_PER_FOOT, label: 'ft' },
    metric: { siPerUnit: Dec(1), label: 'm' },
  },
  shortLength: {
    imperial: { siPerUnit: METRES_PER_INCH, label: 'in' },
    metric: { siPerUnit: Dec('0.001'), label: 'mm' },
  },
  weightPerLength: {
    imperial: { siPerUnit: KILOGRAMS_PER_POUND.div(METRES_PER_FOOT), label: 'lb/ft' },
    metric: { siPerUnit: Dec(1), label: 'kg/m' },
  },
  // Fabric by area (soft goods): lb/ft² or kg/m².
  weightPerArea: {
    imperial: { siPerUnit: KILOGRAMS_PER_POUND.div(METRES_PER_FOOT.pow(2)), label: 'lb/ft²' },
    metric: { siPerUnit: Dec(1), label: 'kg/m²' },
  },
  speed: {
    imperial: { siPerUnit: METRES_PER_FOOT.div(60), label: 'ft/min' },
    metric: { siPerUnit: Dec(1), label: 'm/s' },
  },
  momentOfInertia: {
    imperial: { siPerUnit: METRES_PER_INCH.pow(4), label: 'in⁴' },
    metric: { siPerUnit: Dec('0.001').pow(4), label: 'mm⁴' },
  },
  sectionModulus: {
    imperial: { siPerUnit: METRES_PER_INCH.pow(3), label: 'in³' },
    metric: { siPerUnit: Dec('0.001').pow(3), label: 'mm³' },
  },
  stress: {
    imperial: { siPerUnit: POUND_FORCE_NEWTONS.times(1000).div(METRES_PER_INCH.pow(2)), label: 'ksi' },
    metric: { siPerUnit: Dec(1e6), label: 'MPa' },
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

/**
 * The short label for a quantity's unit in a system.
 *
 * @example
 * unitLabel('weightPerLength', 'metric') // 'kg/m'
 */
export function unitLabel(quantity: Quantity, system: UnitSystem): string {
  return UNITS[quantity][system].label
}
