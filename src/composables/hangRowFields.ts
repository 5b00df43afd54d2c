import { unitLabel, type Quantity, type UnitSystem } from '../../shared/units/index.js'
import type { HangRow, HangRowKind, HangRowText } from './hangRows'

/** One figure field of a row: the row text it edits, the entry field it becomes, and how it reads on screen. */
export interface HangRowField {
  key: HangRowText
  /** The entry's field, as schema and server messages name it. */
  path: string
  label: string
  quantity?: Quantity
  suffix?: string
  hint?: string
  placeholder?: string
  inputmode: 'decimal' | 'numeric' | 'text'
}

const at: HangRowField = { key: 'at', path: 'at', label: 'At', quantity: 'length', inputmode: 'decimal' }
const from: HangRowField = { key: 'from', path: 'from', label: 'From', quantity: 'length', inputmode: 'decimal' }
const to: HangRowField = { key: 'to', path: 'to', label: 'To', quantity: 'length', inputmode: 'decimal' }
const quantity = (placeholder?: string): HangRowField => ({
  key: 'quantity',
  path: 'quantity',
  label: 'How many',
  inputmode: 'numeric',
  placeholder,
})
const weightPerLength: HangRowField = {
  key: 'weightPerLength',
  path: 'weightPerLength',
  label: 'Weight per length',
  quantity: 'weightPerLength',
  inputmode: 'decimal',
}
const fabricFields: readonly HangRowField[] = [
  {
    key: 'height',
    path: 'fabric.height',
    label: 'Finished height',
    quantity: 'length',
    inputmode: 'decimal',
  },
  { key: 'fullness', path: 'fabric.fullnessPercent', label: 'Fullness', suffix: '%', inputmode: 'decimal' },
  from,
  to,
]
const grade: HangRowField = {
  key: 'grade',
  path: 'fabric.gradeOzPerLinearYard',
  label: 'Grade',
  suffix: 'oz/yd',
  hint: 'per running yard of 54 in goods',
  inputmode: 'decimal',
}
const weightPerArea: HangRowField = {
  key: 'weightPerArea',
  path: 'fabric.weightPerArea',
  label: 'Weight per area',
  quantity: 'weightPerArea',
  inputmode: 'decimal',
}

/**
 * The figure fields a row asks for, by how it hangs (and, for library units and fabric, by the choice made in
 * the row). Fields of other kinds keep what was typed but stay out of the entry.
 */
export function fieldsOf(row: Pick<HangRow, 'kind' | 'placement' | 'fabricBasis'>): readonly HangRowField[] {
  const kinds: Record<HangRowKind, () => readonly HangRowField[]> = {
    library: () => [quantity(), ...(row.placement === 'point' ? [at] : [from, to])],
    point: () => [
      { key: 'weight', path: 'weight', label: 'Weight of one', quantity: 'weight', inputmode: 'decimal' },
      quantity('1'),
      at,
    ],
    stretch: () => [weightPerLength, from, to],
    fabric: () => [row.fabricBasis === 'grade' ? grade : weightPerArea, ...fabricFields],
    pickPoints: () => [
      { key: 'weight', path: 'weight', label: 'Scale weight', quantity: 'weight', inputmode: 'decimal' },
      {
        key: 'points',
        path: 'points',
        label: 'Its pick points at',
        quantity: 'length',
        placeholder: 'e.g. 12, 24, 36',
        inputmode: 'text',
      },
    ],
  }
  return kinds[row.kind]()
}

/** The unit a field's figure is typed in. */
export const suffixOf = (field: HangRowField, units: UnitSystem) =>
  field.quantity ? unitLabel(field.quantity, units) : (field.suffix ?? '')

/** A message for `points.2` belongs to the pick points field. */
export const fieldOfPath = (path: string) => (path.startsWith('points.') ? 'points' : path)
