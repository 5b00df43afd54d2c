import { roundTo, unitLabel, type Quantity, type UnitSystem } from '../../shared/units/index.js'

/** How many decimals each quantity is shown with; enough for a crew, not more than the inputs carry. */
const PLACES: Readonly<Record<Quantity, number>> = {
  weight: 1,
  length: 2,
  shortLength: 1,
  weightPerLength: 3,
  speed: 2,
  momentOfInertia: 3,
  sectionModulus: 3,
  stress: 1,
}

/**
 * A figure with its unit, or a dash when it is not known.
 *
 * @example
 * formatFigure(40, 'length', 'imperial') // '40 ft'
 */
export function formatFigure(value: number | null | undefined, quantity: Quantity, system: UnitSystem): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—'
  const shown = roundTo(value, PLACES[quantity]).toLocaleString('en-US', { maximumFractionDigits: PLACES[quantity] })
  return `${shown} ${unitLabel(quantity, system)}`
}
