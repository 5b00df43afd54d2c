import type { HangEntry } from '../../../shared/hang/hang-items.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import { apiFromStored, storedFromApi } from '../../db/quantities.js'
import type { HangEntryKind, HangItemModel } from './hang-item.model.js'

/** The columns one entry fills, figures in SI. */
export type StoredEntry = Pick<
  HangItemModel,
  | 'entryKind'
  | 'label'
  | 'category'
  | 'itemTypeId'
  | 'quantity'
  | 'weight'
  | 'at'
  | 'fromPosition'
  | 'toPosition'
  | 'weightPerLength'
  | 'points'
  | 'fabricGrade'
  | 'fabricWeightPerArea'
  | 'fabricHeight'
  | 'fabricFullnessPercent'
>

const EMPTY = {
  itemTypeId: null,
  quantity: null,
  weight: null,
  at: null,
  fromPosition: null,
  toPosition: null,
  weightPerLength: null,
  points: null,
  fabricGrade: null,
  fabricWeightPerArea: null,
  fabricHeight: null,
  fabricFullnessPercent: null,
}

const kindOf = (entry: HangEntry): HangEntryKind =>
  'fabric' in entry
    ? 'fabric'
    : 'itemTypeId' in entry
      ? 'library'
      : 'points' in entry
        ? 'shared'
        : 'weightPerLength' in entry
          ? 'stretch'
          : 'point'

/** An entry typed in the venue's units, as the row that keeps it. */
export function storedFromEntry(entry: HangEntry, system: UnitSystem): StoredEntry {
  const length = (value: number | undefined) => storedFromApi(value, 'length', system)
  const at = 'at' in entry ? length(entry.at) : null
  const stretch = 'from' in entry ? { fromPosition: length(entry.from), toPosition: length(entry.to) } : {}
  const base = { ...EMPTY, entryKind: kindOf(entry), label: entry.label, category: entry.category, at, ...stretch }
  if ('fabric' in entry) {
    const { fabric } = entry
    return {
      ...base,
      fabricGrade: fabric.gradeOzPerLinearYard === undefined ? null : String(fabric.gradeOzPerLinearYard),
      fabricWeightPerArea: storedFromApi(fabric.weightPerArea, 'weightPerArea', system),
      fabricHeight: length(fabric.height),
      fabricFullnessPercent: String(fabric.fullnessPercent),
    }
  }
  if ('itemTypeId' in entry) return { ...base, itemTypeId: entry.itemTypeId, quantity: entry.quantity }
  if ('points' in entry)
    return {
      ...base,
      weight: storedFromApi(entry.weight, 'weight', system),
      points: entry.points.map((p) => length(p)!),
    }
  if ('weightPerLength' in entry)
    return { ...base, weightPerLength: storedFromApi(entry.weightPerLength, 'weightPerLength', system) }
  return { ...base, weight: storedFromApi(entry.weight, 'weight', system), quantity: entry.quantity ?? 1 }
}

/** A stored row as the entry it was typed as, in `system`. */
export function entryFromStored(row: StoredEntry, system: UnitSystem): HangEntry {
  const length = (value: string | null) => apiFromStored(value, 'length', system)!
  const { label, category } = row
  const stretch = () => ({ from: length(row.fromPosition), to: length(row.toPosition) })
  switch (row.entryKind) {
    case 'fabric':
      return {
        label,
        category,
        ...stretch(),
        fabric: {
          ...(row.fabricGrade !== null
            ? { gradeOzPerLinearYard: Number(row.fabricGrade) }
            : { weightPerArea: apiFromStored(row.fabricWeightPerArea, 'weightPerArea', system)! }),
          height: length(row.fabricHeight),
          fullnessPercent: Number(row.fabricFullnessPercent),
        },
      }
    case 'library':
      return {
        label,
        category,
        itemTypeId: row.itemTypeId!,
        quantity: row.quantity!,
        ...(row.at !== null ? { at: length(row.at) } : stretch()),
      }
    case 'shared':
      return { label, category, weight: apiFromStored(row.weight, 'weight', system)!, points: row.points!.map(length) }
    case 'stretch':
      return {
        label,
        category,
        weightPerLength: apiFromStored(row.weightPerLength, 'weightPerLength', system)!,
        ...stretch(),
      }
    default:
      return {
        label,
        category,
        weight: apiFromStored(row.weight, 'weight', system)!,
        at: length(row.at),
        quantity: row.quantity ?? 1,
      }
  }
}
