import type { ItemCategory } from '../../shared/schemas/index.js'

/**
 * How a row's weight reaches the batten: units from the library (at a point or spread evenly), a weight at a
 * point, a weight per length along a stretch, soft goods from their fabric, or a piece on its own pick points.
 */
export type HangRowKind = 'library' | 'point' | 'stretch' | 'fabric' | 'pickPoints'

/** One item row as typed: text, so a half-typed figure stays on screen until it reads as a number. */
export interface HangRow {
  id: number
  category: ItemCategory
  kind: HangRowKind
  label: string
  itemTypeId: string
  /** Library units: all at one point, or spread evenly from `from` to `to`. */
  placement: 'point' | 'stretch'
  quantity: string
  weight: string
  at: string
  weightPerLength: string
  from: string
  to: string
  /** Fabric by its grade (oz per running yard of 54 in goods) or by its weight per area. */
  fabricBasis: 'grade' | 'area'
  grade: string
  weightPerArea: string
  height: string
  fullness: string
  /** Pick points as typed, e.g. `12, 24, 36`. */
  points: string
}

/** The row fields that hold typed text (figures and the label). */
export type HangRowText = Exclude<
  keyof HangRow,
  'id' | 'category' | 'kind' | 'itemTypeId' | 'placement' | 'fabricBasis'
>

/** The ways each category may hang; the first is what a new row of it starts as. */
export const CATEGORY_KINDS: Readonly<Record<ItemCategory, readonly HangRowKind[]>> = {
  lighting: ['library', 'point', 'stretch'],
  'audio-video': ['library', 'point', 'stretch'],
  'soft-goods': ['fabric', 'stretch', 'library', 'point'],
  scenery: ['point', 'pickPoints', 'library'],
  hardware: ['point', 'stretch', 'library'],
  other: ['point', 'stretch', 'library'],
}

export const KIND_LABELS: Readonly<Record<HangRowKind, string>> = {
  library: 'From the library',
  point: 'Weight at a point',
  stretch: 'Weight along a stretch',
  fabric: 'From its fabric',
  pickPoints: 'On its own pick points',
}

let nextId = 1

export const emptyRow = (category: ItemCategory, kind: HangRowKind = CATEGORY_KINDS[category][0]!): HangRow => ({
  id: nextId++,
  category,
  kind,
  label: '',
  itemTypeId: '',
  placement: 'point',
  quantity: '',
  weight: '',
  at: '',
  weightPerLength: '',
  from: '',
  to: '',
  fabricBasis: 'grade',
  grade: '',
  weightPerArea: '',
  height: '',
  fullness: '',
  points: '',
})

const TEXTS: readonly HangRowText[] = [
  'label',
  'quantity',
  'weight',
  'at',
  'weightPerLength',
  'from',
  'to',
  'grade',
  'weightPerArea',
  'height',
  'fullness',
  'points',
]

/** A row nobody has typed into yet weighs nothing and is not yet wrong, so it stays out of the sum and the save. */
export const isBlankRow = (row: HangRow) => row.itemTypeId === '' && TEXTS.every((key) => row[key].trim() === '')
