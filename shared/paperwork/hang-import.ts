import type { HangEntry, ItemCategory } from '../hang/hang-items.js'
import { hangEntrySchemaFor } from '../schemas/hang-entry.js'
import { ITEM_CATEGORIES, ITEM_CATEGORY_LABELS } from '../schemas/item-type.js'
import type { UnitSystem } from '../units/systems.js'
import { HANG_COLUMNS, HANG_COLUMN_LOOK, hangColumnHeader, type HangColumn } from './hang-columns.js'

/** Which file column (by index) feeds each hang column; a column left out is not read. */
export type ColumnMapping = Partial<Record<HangColumn, number>>

/** An item of the venue's library an import may match by name. */
export interface LibraryChoice {
  id: string
  name: string
  category: ItemCategory
}

/** What an import needs besides the file: the venue's units and library, and what the person chose. */
export interface ImportChoices {
  units: UnitSystem
  library: readonly LibraryChoice[]
  /** The category of rows that name none (a lighting list rarely does). */
  defaultCategory: ItemCategory
  /** Weights typed for unmatched items, by row number. */
  weights?: ReadonlyMap<number, number>
}

/** One row of the file as the preview shows it. */
export interface ImportRow {
  /** The row's number as a spreadsheet shows it (the header is row 1). */
  row: number
  entry: HangEntry | null
  /** Each problem in words, naming the column. */
  errors: string[]
  /** The library item the row names when it is not in the library (the preview offers a weight). */
  unmatchedItem: string | null
}

// Other headers lists from the lighting and scenic departments often use (common practice), lower case.
const ALSO_CALLED: Partial<Record<HangColumn, string[]>> = {
  label: ['name', 'unit', 'unit number', 'description'],
  item: ['fixture', 'item', 'instrument', 'type'],
  quantity: ['qty', 'count'],
  at: ['at', 'location'],
  from: ['from', 'start'],
  to: ['to', 'end'],
}

/**
 * Guesses which column is which from the header, by each column's words (an export's own headers, units
 * and all, read back exactly).
 *
 * @example
 * guessMapping(['Fixture', 'Label', 'Position (ft)'], 'imperial') // { label: 1, item: 0, at: 2 }
 */
export function guessMapping(header: readonly string[], units: UnitSystem): ColumnMapping {
  const mapping: ColumnMapping = {}
  const simple = (text: string) =>
    text
      .toLowerCase()
      .replace(/\s*\(.*\)\s*$/, '')
      .trim()
  for (const column of HANG_COLUMNS) {
    const exact = header.findIndex((cell) => cell.trim() === hangColumnHeader(column, units))
    const names = [simple(HANG_COLUMN_LOOK[column].words), ...(ALSO_CALLED[column] ?? [])]
    const loose = header.findIndex((cell) => names.includes(simple(cell)))
    const index = exact >= 0 ? exact : loose
    if (index >= 0) mapping[column] = index
  }
  return mapping
}

const categoryByWords = new Map<string, ItemCategory>(
  ITEM_CATEGORIES.flatMap((category) => [
    [category, category],
    [ITEM_CATEGORY_LABELS[category].toLowerCase(), category],
  ]),
)
const findItem = (library: readonly LibraryChoice[], name: string) =>
  library.find((item) => item.name.trim().toLowerCase() === name.trim().toLowerCase())

/**
 * Reads every row of a file into hang entries by the mapping: blank rows are skipped, a library item is
 * matched by name (case and outer spaces aside), an unmatched one becomes a weight at a point once a weight is
 * given (in its column or typed in the preview), and each entry is checked by the shared hang entry schema.
 * Every problem names the column as the file's header does.
 */
export function readImportRows(
  header: readonly string[],
  rows: ReadonlyArray<readonly string[]>,
  mapping: ColumnMapping,
  choices: ImportChoices,
): ImportRow[] {
  const schema = hangEntrySchemaFor(choices.units)
  const columnName = (column: HangColumn) => {
    const index = mapping[column]
    return index === undefined
      ? hangColumnHeader(column, choices.units)
      : (header[index] ?? '').trim() || `column ${index + 1}`
  }
  return rows.flatMap((cells, index): ImportRow[] => {
    if (cells.every((cell) => cell.trim() === '')) return []
    const row = index + 2
    const errors: string[] = []
    const text = (column: HangColumn) => {
      const at = mapping[column]
      return at === undefined ? '' : withoutNeutraliser((cells[at] ?? '').trim())
    }
    const figure = (column: HangColumn): number | undefined => {
      const raw = text(column).replace(/,/g, '')
      if (raw === '') return undefined
      const value = Number(raw)
      if (!Number.isFinite(value)) errors.push(`${columnName(column)}: “${text(column)}” is not a number`)
      return Number.isFinite(value) ? value : undefined
    }
    const draft = draftEntry(text, figure, choices, row, errors, columnName)
    // A cell that is not a number already said so; the schema would only repeat it less clearly.
    if (!draft.entry || errors.length) return [{ row, entry: null, errors, unmatchedItem: draft.unmatchedItem }]
    const parsed = schema.safeParse(draft.entry)
    if (parsed.success && !errors.length)
      return [{ row, entry: parsed.data, errors, unmatchedItem: draft.unmatchedItem }]
    for (const issue of parsed.error?.issues ?? [])
      errors.push(`${columnName(COLUMN_OF_FIELD[String(issue.path[0])] ?? 'label')}: ${issue.message}`)
    return [{ row, entry: null, errors, unmatchedItem: draft.unmatchedItem }]
  })
}

// An export puts an apostrophe before text that would start a formula; reading it back takes it away again.
const withoutNeutraliser = (text: string) => (/^'[=+\-@\t\r]/.test(text) ? text.slice(1) : text)

// Where a schema's field comes from, so its message names the file's column.
const COLUMN_OF_FIELD: Record<string, HangColumn> = {
  label: 'label',
  category: 'category',
  itemTypeId: 'item',
  weight: 'weight',
  weightPerLength: 'weightPerLength',
  quantity: 'quantity',
  at: 'at',
  from: 'from',
  to: 'to',
  points: 'points',
  fabric: 'fabricHeight',
}

function draftEntry(
  text: (column: HangColumn) => string,
  figure: (column: HangColumn) => number | undefined,
  choices: ImportChoices,
  row: number,
  errors: string[],
  columnName: (column: HangColumn) => string,
): { entry: Record<string, unknown> | null; unmatchedItem: string | null } {
  const itemName = text('item')
  const item = itemName ? findItem(choices.library, itemName) : undefined
  const categoryText = text('category').toLowerCase()
  const category = categoryText ? categoryByWords.get(categoryText) : (item?.category ?? choices.defaultCategory)
  if (categoryText && !category)
    errors.push(
      `${columnName('category')}: “${text('category')}” is not a category (${ITEM_CATEGORIES.map((c) => ITEM_CATEGORY_LABELS[c]).join(', ')})`,
    )
  const base = { label: text('label') || itemName, category: category ?? choices.defaultCategory }
  const at = figure('at')
  const from = figure('from')
  const to = figure('to')
  const quantity = figure('quantity')
  const place = {
    ...(at !== undefined ? { at } : {}),
    ...(from !== undefined ? { from } : {}),
    ...(to !== undefined ? { to } : {}),
  }
  const unmatchedItem = itemName && !item ? itemName : null
  if (item) return { entry: { ...base, itemTypeId: item.id, quantity: quantity ?? 1, ...place }, unmatchedItem }
  const points = text('points')
  const grade = figure('fabricGrade')
  const weightPerArea = figure('fabricWeightPerArea')
  if (grade !== undefined || weightPerArea !== undefined) {
    const fabric = {
      ...(grade !== undefined ? { gradeOzPerLinearYard: grade } : {}),
      ...(weightPerArea !== undefined ? { weightPerArea } : {}),
      height: figure('fabricHeight'),
      fullnessPercent: figure('fabricFullness') ?? 0,
    }
    return { entry: { ...base, fabric, from, to }, unmatchedItem }
  }
  const weightPerLength = figure('weightPerLength')
  if (weightPerLength !== undefined) return { entry: { ...base, weightPerLength, from, to }, unmatchedItem }
  const weight = figure('weight') ?? choices.weights?.get(row)
  if (weight === undefined && unmatchedItem) {
    errors.push(`${columnName('item')}: “${itemName}” is not in the item library; give its weight`)
    return { entry: null, unmatchedItem }
  }
  if (points) {
    const list = points
      .split(/[;\s]+/)
      .filter(Boolean)
      .map(Number)
    if (list.some((value) => !Number.isFinite(value))) {
      errors.push(`${columnName('points')}: “${points}” is not a list of positions separated by semicolons`)
      return { entry: null, unmatchedItem }
    }
    return { entry: { ...base, weight, points: list }, unmatchedItem }
  }
  return { entry: { ...base, weight, ...place, quantity: quantity ?? 1 }, unmatchedItem }
}
