import { convert, displayNumber, displayQuantity, unitLabel, type Quantity, type UnitSystem } from '../units/index.js'
import type { HangEntry } from './hang-items.js'

/**
 * One field of an entry as a comparison reads it: the field's name, its words, the value in the units shown
 * (for matching) and how it reads (for people).
 */
export interface EntryField {
  field: string
  words: string
  value: string
  shown: string
}

/** How an entry hangs, in our own plain words. */
export const ENTRY_SHAPE_WORDS = {
  point: 'at a point',
  stretch: 'along a stretch',
  fabric: 'from its fabric',
  library: 'from the library',
  shared: 'on its own pick points',
} as const
export type EntryShape = keyof typeof ENTRY_SHAPE_WORDS

/**
 * Which shape an entry has, told by the field only that shape has (as the entry schemas tell them).
 *
 * @example
 * entryShape({ label: 'Drop', category: 'soft-goods', weightPerLength: 1.1, from: 2, to: 46 }) // 'stretch'
 */
export function entryShape(entry: HangEntry): EntryShape {
  if ('fabric' in entry) return 'fabric'
  if ('itemTypeId' in entry) return 'library'
  if ('points' in entry) return 'shared'
  if ('weightPerLength' in entry) return 'stretch'
  return 'point'
}

/** How to read one entry: the units its figures are in, the units to show, and names for library item types. */
export interface EntryReading {
  enteredIn: UnitSystem
  shownIn: UnitSystem
  itemTypeNames?: ReadonlyMap<string, string>
}

/**
 * The fields of an entry worth comparing, each in the units shown, in the order a person reads them. Absent
 * fields are left out; a field one revision has and the other lacks is a change like any other.
 *
 * @example
 * entryFields({ label: 'Boom', category: 'lighting', weight: 40, at: 1, quantity: 2 },
 *   { enteredIn: 'imperial', shownIn: 'imperial' }).map((f) => f.shown)
 * // ['at a point', '40 lb', '2', '1 ft']
 */
export function entryFields(entry: HangEntry, reading: EntryReading): EntryField[] {
  const fields: EntryField[] = []
  const figure = (field: string, words: string, value: number | undefined, quantity: Quantity) => {
    if (value === undefined) return
    const shown = convert(value, quantity, reading.enteredIn, reading.shownIn)
    fields.push({ field, words, value: shown.toString(), shown: displayQuantity(shown, quantity, reading.shownIn) })
  }
  const plain = (field: string, words: string, value: number | string | undefined, shown: string) => {
    if (value !== undefined) fields.push({ field, words, value: String(value), shown })
  }
  const shape = entryShape(entry)
  plain('shape', 'how it hangs', shape, ENTRY_SHAPE_WORDS[shape])
  if ('itemTypeId' in entry) {
    const name = reading.itemTypeNames?.get(entry.itemTypeId)
    plain('itemTypeId', 'library item', entry.itemTypeId, name ?? 'an item no longer in the library')
  }
  if ('weight' in entry) figure('weight', 'weight', entry.weight, 'weight')
  if ('weightPerLength' in entry)
    figure('weightPerLength', 'weight per length', entry.weightPerLength, 'weightPerLength')
  if ('fabric' in entry) {
    const { gradeOzPerLinearYard: grade, weightPerArea, height, fullnessPercent } = entry.fabric
    if (grade !== undefined)
      plain('fabric.grade', 'fabric grade', grade, `${displayNumber(grade, 2)} oz per running yard`)
    figure('fabric.weightPerArea', 'fabric weight per area', weightPerArea, 'weightPerArea')
    figure('fabric.height', 'finished height', height, 'length')
    plain('fabric.fullness', 'fullness', fullnessPercent, `${displayNumber(fullnessPercent, 2)} %`)
  }
  // A point entry without a quantity hangs one unit, so 1 and absent compare alike.
  if ('quantity' in entry || shape === 'point') {
    const quantity = ('quantity' in entry ? entry.quantity : undefined) ?? 1
    plain('quantity', 'quantity', quantity, displayNumber(quantity, 0))
  }
  if ('at' in entry) figure('at', 'position', entry.at, 'length')
  if ('from' in entry) figure('from', 'start of the stretch', entry.from, 'length')
  if ('to' in entry) figure('to', 'end of the stretch', entry.to, 'length')
  if ('points' in entry) {
    const points = entry.points.map((at) => convert(at, 'length', reading.enteredIn, reading.shownIn))
    const numbers = points.map((at) => displayNumber(at, 2)).join(', ')
    plain('points', 'pick points', points.join(' '), `${numbers} ${unitLabel('length', reading.shownIn)}`)
  }
  return fields
}
