import type { CalculationResult } from '../schemas/calculation-result.js'
import type { UnitSystem } from '../units/index.js'
import { entryFields, type EntryField } from './hang-entry-fields.js'
import type { HangEntry, ItemCategory } from './hang-items.js'
import { compareResults, type LoadComparison } from './result-comparison.js'

export { entryFields, entryShape, ENTRY_SHAPE_WORDS, type EntryField, type EntryShape } from './hang-entry-fields.js'
export type {
  BrickCountChange,
  CounterweightChange,
  FigureChange,
  LineLoadChange,
  LoadComparison,
} from './result-comparison.js'

/** A saved revision as a comparison needs it: its items in `unitSystem` and the engine's result (in `result.units`). */
export interface RevisionToCompare {
  revision: number
  unitSystem: UnitSystem
  items: readonly HangEntry[]
  result: CalculationResult
}

/** An item only one revision has, with its fields as they read. */
export interface ItemOnOneSide {
  label: string
  category: ItemCategory
  fields: EntryField[]
}

/** One field of an item that differs: how it read before and after (`null` where that side lacks the field). */
export interface FieldChange {
  field: string
  words: string
  from: string | null
  to: string | null
}

/** An item both revisions have (same label and category) whose fields differ. */
export interface ItemChange {
  label: string
  category: ItemCategory
  changes: FieldChange[]
}

/** What differs from one revision to another, every figure in `units`. */
export interface HangComparison {
  units: UnitSystem
  from: number
  to: number
  /** Unit systems a side's result was computed in when they differ from `units` (its figures were converted). */
  convertedFrom: { from: UnitSystem | null; to: UnitSystem | null }
  added: ItemOnOneSide[]
  removed: ItemOnOneSide[]
  changed: ItemChange[]
  /** How many items both revisions have alike. */
  unchanged: number
  loads: LoadComparison
}

const keyOf = (entry: { label: string; category: ItemCategory }) => `${entry.category}\u0000${entry.label}`

/** Items grouped by label and category, in order, so the second "Leg" of one side meets the second of the other. */
function byKey(entries: ItemOnOneSide[]) {
  const groups = new Map<string, ItemOnOneSide[]>()
  for (const entry of entries) {
    const key = keyOf(entry)
    groups.set(key, [...(groups.get(key) ?? []), entry])
  }
  return groups
}

function fieldChanges(before: EntryField[], after: EntryField[]): FieldChange[] {
  const fields = [...new Set([...before.map((f) => f.field), ...after.map((f) => f.field)])]
  return fields.flatMap((field) => {
    const a = before.find((f) => f.field === field)
    const b = after.find((f) => f.field === field)
    if (a?.value === b?.value) return []
    return [{ field, words: (a ?? b)!.words, from: a?.shown ?? null, to: b?.shown ?? null }]
  })
}

/**
 * Compares two saved revisions of a lineset's hang: items added, removed and changed (matched by label and
 * category; changed when any field differs, saying which), and the difference in total load, each line's load
 * and the counterweight. Every figure is converted into `units`, whatever units either side was kept in;
 * `convertedFrom` says when a side's result was computed in other units. Differences are `to - from`.
 *
 * @example
 * const diff = compareRevisions(revision2, revision3, 'imperial')
 * diff.changed[0] // { label: 'Boom', category: 'lighting', changes: [{ field: 'weight', words: 'weight', from: '12 lb', to: '14 lb' }] }
 * diff.loads.totalLoad // { from: 412.5, to: 416.5, change: 4 }
 */
export function compareRevisions(
  from: RevisionToCompare,
  to: RevisionToCompare,
  units: UnitSystem,
  itemTypeNames?: ReadonlyMap<string, string>,
): HangComparison {
  const read = (side: RevisionToCompare) =>
    side.items.map((entry) => ({
      label: entry.label,
      category: entry.category,
      fields: entryFields(entry, { enteredIn: side.unitSystem, shownIn: units, itemTypeNames }),
    }))
  const after = byKey(read(to))
  const removed: ItemOnOneSide[] = []
  const changed: ItemChange[] = []
  let unchanged = 0
  for (const [key, olderOnes] of byKey(read(from))) {
    const newerOnes = after.get(key) ?? []
    olderOnes.forEach((older, index) => {
      const newer = newerOnes[index]
      if (!newer) return removed.push(older)
      const changes = fieldChanges(older.fields, newer.fields)
      if (changes.length) changed.push({ label: older.label, category: older.category, changes })
      else unchanged += 1
    })
    after.set(key, newerOnes.slice(olderOnes.length))
  }
  const converted = (result: CalculationResult) => (result.units === units ? null : result.units)
  return {
    units,
    from: from.revision,
    to: to.revision,
    convertedFrom: { from: converted(from.result), to: converted(to.result) },
    added: [...after.values()].flat(),
    removed,
    changed,
    unchanged,
    loads: compareResults(from.result, to.result, units),
  }
}
