import type { HangEntry } from '../hang/hang-items.js'
import { ITEM_CATEGORY_LABELS } from '../schemas/item-type.js'
import { unitLabel, type Quantity, type UnitSystem } from '../units/systems.js'
import type { CsvCell } from './csv.js'

/** Every column a hang's CSV may carry, in the order an export writes them. */
export const HANG_COLUMNS = [
  'label',
  'category',
  'item',
  'weight',
  'weightPerLength',
  'quantity',
  'at',
  'from',
  'to',
  'points',
  'fabricGrade',
  'fabricWeightPerArea',
  'fabricHeight',
  'fabricFullness',
] as const
export type HangColumn = (typeof HANG_COLUMNS)[number]

/** Each column's words and, for figures, the quantity whose unit the header names. */
export const HANG_COLUMN_LOOK: Readonly<Record<HangColumn, { words: string; quantity?: Quantity }>> = {
  label: { words: 'Label' },
  category: { words: 'Category' },
  item: { words: 'Library item' },
  weight: { words: 'Weight', quantity: 'weight' },
  weightPerLength: { words: 'Weight per length', quantity: 'weightPerLength' },
  quantity: { words: 'Quantity' },
  at: { words: 'Position', quantity: 'length' },
  from: { words: 'Stretch from', quantity: 'length' },
  to: { words: 'Stretch to', quantity: 'length' },
  points: { words: 'Pick points', quantity: 'length' },
  fabricGrade: { words: 'Fabric grade (oz per running yard)' },
  fabricWeightPerArea: { words: 'Fabric weight per area', quantity: 'weightPerArea' },
  fabricHeight: { words: 'Finished height', quantity: 'length' },
  fabricFullness: { words: 'Fullness (%)' },
}

/**
 * A column's header in a unit system: its words, and the unit in brackets for a figure.
 *
 * @example
 * hangColumnHeader('weight', 'imperial') // 'Weight (lb)'
 */
export function hangColumnHeader(column: HangColumn, units: UnitSystem): string {
  const { words, quantity } = HANG_COLUMN_LOOK[column]
  return quantity ? `${words} (${unitLabel(quantity, units)})` : words
}

/** Pick points share one cell, separated by semicolons (a comma would be the decimal mark somewhere). */
export const POINTS_SEPARATOR = '; '

/**
 * One hang entry as a CSV record in `HANG_COLUMNS` order, figures exactly as stored in the venue's units.
 * A library entry names its item type (`itemTypeNames`), so an import in the same venue finds it again.
 *
 * @example
 * hangEntryCells({ label: 'Wash', category: 'lighting', weight: 19.5, at: 4 }, new Map())
 * // ['Wash', 'Lighting', null, 19.5, null, 1, 4, null, null, null, null, null, null, null]
 */
export function hangEntryCells(entry: HangEntry, itemTypeNames: ReadonlyMap<string, string>): CsvCell[] {
  const cells: Record<HangColumn, CsvCell> = {
    label: entry.label,
    category: ITEM_CATEGORY_LABELS[entry.category],
    item: 'itemTypeId' in entry ? (itemTypeNames.get(entry.itemTypeId) ?? entry.itemTypeId) : null,
    weight: 'weight' in entry ? entry.weight : null,
    weightPerLength: 'weightPerLength' in entry ? entry.weightPerLength : null,
    quantity: 'quantity' in entry ? (entry.quantity ?? 1) : 'at' in entry && 'weight' in entry ? 1 : null,
    at: 'at' in entry ? entry.at : null,
    from: 'from' in entry ? entry.from : null,
    to: 'to' in entry ? entry.to : null,
    points: 'points' in entry ? entry.points.join(POINTS_SEPARATOR) : null,
    fabricGrade: 'fabric' in entry ? entry.fabric.gradeOzPerLinearYard : null,
    fabricWeightPerArea: 'fabric' in entry ? entry.fabric.weightPerArea : null,
    fabricHeight: 'fabric' in entry ? entry.fabric.height : null,
    fabricFullness: 'fabric' in entry ? entry.fabric.fullnessPercent : null,
  }
  return HANG_COLUMNS.map((column) => cells[column])
}
