import type { CalculationInput } from '../../shared/schemas/calculation.js'

/** Where an item's weight lands: all at one point, or spread along a stretch of the batten. */
export type BalanceRowKind = 'point' | 'stretch'

/** One item row as typed: text, so a half-typed figure stays on screen until it reads as a number. */
export interface BalanceRow {
  id: number
  label: string
  kind: BalanceRowKind
  weight: string
  at: string
  weightPerLength: string
  from: string
  to: string
}

export type BalanceFigureKey = 'weight' | 'at' | 'weightPerLength' | 'from' | 'to'

let nextId = 1

export const emptyRow = (kind: BalanceRowKind = 'point'): BalanceRow => ({
  id: nextId++,
  label: '',
  kind,
  weight: '',
  at: '',
  weightPerLength: '',
  from: '',
  to: '',
})

/** The figures each kind of row asks for; the other kind's figures are kept but left out of the sum. */
export const ROW_FIGURES: Readonly<Record<BalanceRowKind, readonly BalanceFigureKey[]>> = {
  point: ['weight', 'at'],
  stretch: ['weightPerLength', 'from', 'to'],
}

/** A row nobody has typed into yet weighs nothing and is not yet wrong, so it stays out of the sum. */
export const isBlankRow = (row: BalanceRow) =>
  row.label.trim() === '' && ROW_FIGURES[row.kind].every((key) => row[key].trim() === '')

// Text that is not a number goes on as NaN so the engine's own message ("must be a number") shows.
const figure = (text: string) => (text.trim() === '' ? undefined : Number(text))

/**
 * The engine item for a row. Missing figures stay missing, so the engine names the field that needs one.
 *
 * @example
 * itemFrom({ ...emptyRow(), label: 'Drop', weight: '120', at: '20' }) // { label: 'Drop', weight: 120, at: 20 }
 */
export function itemFrom(row: BalanceRow): CalculationInput['items'][number] {
  const label = row.label.trim() || undefined
  const figures = Object.fromEntries(
    ROW_FIGURES[row.kind].map((key) => [key, figure(row[key])]).filter(([, value]) => value !== undefined),
  )
  return { ...(label ? { label } : {}), ...figures }
}
