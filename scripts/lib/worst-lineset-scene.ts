/**
 * The worst accepted case as the browser's live panel meets it: a stored lineset, the venue's policies, its brick
 * types and the item rows someone typed, all at the limits of their ranges (see worst-calculations.ts).
 */
import type { BrickType, Lineset, Venue } from '../../shared/schemas/index.js'
import type { UnitSystem } from '../../shared/units/index.js'
import { worstCalculation } from './worst-calculations.js'

/** One typed row, as the hang editor keeps it (src/composables/hangRows.ts): text, so a half-typed figure stays on screen. */
export interface TypedRow {
  id: number
  category: 'other'
  kind: 'point' | 'stretch'
  label: string
  itemTypeId: string
  placement: 'point'
  quantity: string
  weight: string
  at: string
  weightPerLength: string
  from: string
  to: string
  fabricBasis: 'grade'
  grade: string
  weightPerArea: string
  height: string
  fullness: string
  points: string
}

/**
 * The lineset, venue, brick types and rows whose calculation is {@link worstCalculation}.
 *
 * @example
 * worstLinesetScene('imperial').rows.length // 250
 */
export function worstLinesetScene(units: UnitSystem) {
  const worst = worstCalculation(units)
  const lineset: Lineset = {
    id: '00000000-0000-4000-8000-000000000001',
    version: 0,
    updatedAt: '2026-01-01T00:00:00.000Z',
    number: 1,
    name: 'Worst case',
    kind: 'counterweight-single',
    status: 'in-service',
    battenLength: worst.batten.length,
    pipeSize: worst.batten.pipeSize,
    pipeWeightPerLength: units === 'imperial' ? 3.63 : 5.402,
    pickPoints: worst.batten.pickPoints,
    liftLineWeightPerLength: worst.liftLine.weightPerLength,
    liftLineBreakingStrength: worst.liftLine.breakingStrength,
    arborEmptyWeight: worst.arbor.emptyWeight,
    arborCapacity: worst.arbor.capacity,
    arborStackLength: worst.arbor.stackLength,
    ratedLoad: worst.ratedLoad,
    travel: worst.trims.out,
    unitSystem: units,
  }
  const venue: Venue = {
    id: '00000000-0000-4000-8000-000000000002',
    name: 'Worst case venue',
    unitSystem: units,
    balanceTolerance: 0,
    ropeLockHolding: 0,
    wireRopeDesignFactor: 8,
    version: 0,
  }
  const brickTypes: BrickType[] = worst.bricks.map((brick, k) => ({
    id: `00000000-0000-4000-8000-${String(k).padStart(12, '0')}`,
    version: 0,
    unitSystem: units,
    name: brick.name,
    material: 'Steel',
    unitWeight: brick.weight,
    thickness: brick.thickness,
    quantityOwned: brick.available,
  }))
  const rows: TypedRow[] = worst.items.map((item, k) => {
    const row: TypedRow = {
      id: k + 1,
      category: 'other',
      kind: 'point',
      label: item.label,
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
    }
    if ('weight' in item) return { ...row, weight: String(item.weight), at: String(item.at) }
    return {
      ...row,
      kind: 'stretch',
      weightPerLength: String(item.weightPerLength),
      from: String(item.from),
      to: String(item.to),
    }
  })
  return { lineset, venue, brickTypes, rows }
}
