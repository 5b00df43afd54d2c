import type { HangEntry } from '../../shared/hang/hang-items.js'
import { emptyRow, type HangRow } from './hangRows'

// Text that is not a number goes on as NaN so the schema's own message ("must be a number") shows.
const figure = (text: string) => (text.trim() === '' ? undefined : Number(text))
const pointsFrom = (text: string) =>
  text
    .split(/[\s,;]+/)
    .filter((part) => part !== '')
    .map(Number)

/**
 * The entry a row stands for, as the save body carries it, before the shared schema reads it. Missing figures
 * stay missing so the schema names the field; the field that tells an entry's shape is always present.
 *
 * @example
 * entryDraftFrom({ ...emptyRow('scenery'), label: 'Wagon', weight: '380', points: '12, 24' })
 * // { label: 'Wagon', category: 'scenery', weight: 380, points: [12, 24] }   (kind 'pickPoints')
 */
export function entryDraftFrom(row: HangRow): Record<string, unknown> {
  const base = { label: row.label.trim(), category: row.category }
  switch (row.kind) {
    case 'library':
      return {
        ...base,
        itemTypeId: row.itemTypeId || undefined,
        quantity: figure(row.quantity),
        ...(row.placement === 'point' ? { at: figure(row.at) } : { from: figure(row.from), to: figure(row.to) }),
      }
    case 'fabric':
      return {
        ...base,
        from: figure(row.from),
        to: figure(row.to),
        fabric: {
          ...(row.fabricBasis === 'grade'
            ? { gradeOzPerLinearYard: figure(row.grade) }
            : { weightPerArea: figure(row.weightPerArea) }),
          height: figure(row.height),
          fullnessPercent: figure(row.fullness),
        },
      }
    case 'pickPoints':
      return { ...base, weight: figure(row.weight), points: pointsFrom(row.points) }
    case 'stretch':
      return { ...base, weightPerLength: figure(row.weightPerLength), from: figure(row.from), to: figure(row.to) }
    case 'point':
      return { ...base, weight: figure(row.weight), at: figure(row.at), quantity: figure(row.quantity) }
  }
}

const text = (value: number | undefined) => (value === undefined ? '' : String(value))

/** A saved entry back as a row to edit (figures in the venue's units, as the API gives them). */
export function rowFromEntry(entry: HangEntry): HangRow {
  const labelled = { label: entry.label }
  if ('fabric' in entry) {
    const { fabric } = entry
    return {
      ...emptyRow(entry.category, 'fabric'),
      ...labelled,
      fabricBasis: fabric.weightPerArea !== undefined ? 'area' : 'grade',
      grade: text(fabric.gradeOzPerLinearYard),
      weightPerArea: text(fabric.weightPerArea),
      height: text(fabric.height),
      fullness: text(fabric.fullnessPercent),
      from: text(entry.from),
      to: text(entry.to),
    }
  }
  if ('itemTypeId' in entry)
    return {
      ...emptyRow(entry.category, 'library'),
      ...labelled,
      itemTypeId: entry.itemTypeId,
      quantity: text(entry.quantity),
      placement: entry.at !== undefined ? 'point' : 'stretch',
      at: text(entry.at),
      from: text(entry.from),
      to: text(entry.to),
    }
  if ('points' in entry)
    return {
      ...emptyRow(entry.category, 'pickPoints'),
      ...labelled,
      weight: text(entry.weight),
      points: entry.points.join(', '),
    }
  if ('weightPerLength' in entry)
    return {
      ...emptyRow(entry.category, 'stretch'),
      ...labelled,
      weightPerLength: text(entry.weightPerLength),
      from: text(entry.from),
      to: text(entry.to),
    }
  return {
    ...emptyRow(entry.category, 'point'),
    ...labelled,
    weight: text(entry.weight),
    at: text(entry.at),
    quantity: entry.quantity === undefined || entry.quantity === 1 ? '' : text(entry.quantity),
  }
}
