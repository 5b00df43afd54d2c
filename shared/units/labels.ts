/**
 * The unit systems, the kinds of quantity and their labels: plain data with no arithmetic, so a screen that only
 * names units (a list's column headings) does not load the exact-decimal library.
 */

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

export const UNIT_LABELS: Readonly<Record<Quantity, Readonly<Record<UnitSystem, string>>>> = {
  weight: { imperial: 'lb', metric: 'kg' },
  length: { imperial: 'ft', metric: 'm' },
  shortLength: { imperial: 'in', metric: 'mm' },
  weightPerLength: { imperial: 'lb/ft', metric: 'kg/m' },
  // Fabric by area (soft goods).
  weightPerArea: { imperial: 'lb/ft²', metric: 'kg/m²' },
  speed: { imperial: 'ft/min', metric: 'm/s' },
  momentOfInertia: { imperial: 'in⁴', metric: 'mm⁴' },
  sectionModulus: { imperial: 'in³', metric: 'mm³' },
  stress: { imperial: 'ksi', metric: 'MPa' },
}

/**
 * The short label for a quantity's unit in a system.
 *
 * @example
 * unitLabel('weightPerLength', 'metric') // 'kg/m'
 */
export function unitLabel(quantity: Quantity, system: UnitSystem): string {
  return UNIT_LABELS[quantity][system]
}
