import { displayQuantity } from '../../shared/units/display.js'
import type { Quantity, UnitSystem } from '../../shared/units/systems.js'

/**
 * A figure with its unit by the app's one display rule (`DISPLAY_PLACES` in shared/units), or a dash when it
 * is not known. Lists, read-outs and results all show figures through this.
 *
 * @example
 * formatFigure(40, 'length', 'imperial') // '40 ft'
 * formatFigure(null, 'weight', 'metric') // '—'
 */
export function formatFigure(value: number | null | undefined, quantity: Quantity, system: UnitSystem): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—'
  return displayQuantity(value, quantity, system)
}
