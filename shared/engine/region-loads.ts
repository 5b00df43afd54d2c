import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import type { LocalPoint } from './batten-model.js'
import { exactRunningSums, type SumColumns } from './exact-sums.js'

/**
 * A step in spread intensity at u within a region (u-sense): `up` where a spread starts, down
 * where it ends. `float` is u as a number, for ordering only.
 */
export interface IntensityStep {
  at: Decimal
  float: number
  w: Decimal
  up: boolean
}

/**
 * A region's loads in order of position with running sums, so that every total, and any quantity
 * at one place, comes from a few decimal operations instead of a pass over every load.
 * Point loads W at a give sums of W·aᵏ (k = 0..3). Spread loads are steps in intensity Δw at t,
 * giving sums of Δw·tᵏ (k = 0..4): a spread's integrals ∫ w·uᵏ⁻¹ du are −Σ Δw·tᵏ / k over its steps.
 */
export interface LoadSums {
  /** Point positions, ascending. */
  pointAt: Decimal[]
  /** pointSums.row(i)[k]: Σ W·aᵏ over the first i points, k = 0..3 (one column per power; row 0 is zero). */
  pointSums: SumColumns
  /** Distinct positions where the spread intensity steps, ascending. */
  stepAt: Decimal[]
  /** stepSums.row(i)[k]: Σ Δw·tᵏ over the first i steps, k = 0..4; row(i)[0] is the intensity after them. */
  stepSums: SumColumns
}

const ZERO = Dec(0)

/**
 * Ascending by the float position, the exact one breaking float ties, so the order is exact.
 * Ties are mostly one shared object (a region's length), which needs no decimal comparison.
 */
const byPosition = <T extends { at: Decimal; float: number }>(a: T, b: T) =>
  a.float - b.float || (a.at === b.at ? 0 : a.at.comparedTo(b.at))

/**
 * Orders a region's loads by position and sums their powers of position, each load handled once.
 * `entering` is the intensity of the spreads crossing the region's origin line; with `closeAt` (a
 * span's length) the spreads still running there end at it. Returns the sums and the intensity
 * just before `closeAt`, or after the last step.
 *
 * @example
 * const { sums } = sumRegionLoads([{ u: Dec(4), weight: Dec(5), float: { u: 4, weight: 5 } }], [], Dec(0))
 * sums.pointSums.row(1)[1]!.toString() // '20' (Σ W·a after the first point: 5 × 4)
 */
export function sumRegionLoads(
  points: readonly LocalPoint[],
  steps: readonly IntensityStep[],
  entering: Decimal,
  closeAt?: Decimal,
): { sums: LoadSums; leaving: Decimal } {
  const ordered = points.map((p) => ({ at: p.u, float: p.float.u, weight: p.weight })).sort(byPosition)
  const pointAt = ordered.map((p) => p.at)
  const weights = ordered.map((p) => p.weight)
  const sorted = [{ at: ZERO, float: 0, w: entering, up: true }, ...steps].sort(byPosition)
  const stepAt: Decimal[] = []
  const rises: Decimal[] = []
  let leaving = ZERO
  for (let i = 0; i < sorted.length;) {
    const { at } = sorted[i]!
    // Spreads often share an edge: one step there, one set of powers.
    let rise = ZERO
    for (; i < sorted.length && (sorted[i]!.at === at || sorted[i]!.at.eq(at)); i++)
      rise = sorted[i]!.up ? rise.plus(sorted[i]!.w) : rise.minus(sorted[i]!.w)
    if (rise.isZero()) continue
    stepAt.push(at)
    rises.push(rise)
    leaving = leaving.plus(rise)
  }
  if (closeAt && !leaving.isZero()) {
    stepAt.push(closeAt)
    rises.push(leaving.neg())
  }
  // Exact integers where the figures allow (the usual case), the decimal sums otherwise: the same values.
  const pointSums = exactRunningSums(pointAt, weights, 4) ?? decimalSums(pointAt, weights, 4, pointPowers)
  const stepSums = exactRunningSums(stepAt, rises, 5) ?? decimalSums(stepAt, rises, 5, powers)
  return { sums: { pointAt, pointSums, stepAt, stepSums }, leaving }
}

/**
 * The running sums over the loads strictly before u: what a quantity at u needs (a load at u
 * itself contributes nothing to the moment or the deflection there).
 *
 * @example
 * sumsBefore(sums, Dec(3)).points[0]!.toString() // total point weight before u = 3
 */
export function sumsBefore(sums: LoadSums, u: Decimal): { points: Decimal[]; steps: Decimal[] } {
  const i = countBelow(sums.pointAt, u)
  const j = countBelow(sums.stepAt, u)
  return { points: [...sums.pointSums.row(i)], steps: [...sums.stepSums.row(j)] }
}

/**
 * The running sums over all of the region's loads.
 *
 * @example
 * totalSums(sums).points[0]!.toString() // total point weight in the region
 */
export function totalSums(sums: LoadSums): { points: Decimal[]; steps: Decimal[] } {
  return {
    points: [...sums.pointSums.row(sums.pointSums.rows - 1)],
    steps: [...sums.stepSums.row(sums.stepSums.rows - 1)],
  }
}

/**
 * The running sums in decimals, for figures the exact integers cannot hold: columns rather than a
 * row per load, so the terms are all a load allocates.
 */
function decimalSums(
  at: readonly Decimal[],
  coefficient: readonly Decimal[],
  count: number,
  terms: (c: Decimal, x: Decimal) => Decimal[],
): SumColumns {
  const columns: Decimal[][] = Array.from({ length: count }, () => [ZERO])
  at.forEach((x, i) => extend(columns, x.isZero() ? [coefficient[i]!] : terms(coefficient[i]!, x)))
  return { rows: at.length + 1, row: (i) => columns.map((column) => column[i]!) }
}

const last = (column: readonly Decimal[]) => column[column.length - 1]!

function pointPowers(weight: Decimal, at: Decimal): Decimal[] {
  const first = weight.times(at)
  const second = first.times(at)
  return [weight, first, second, second.times(at)]
}

function powers(rise: Decimal, at: Decimal): Decimal[] {
  const first = rise.times(at)
  const second = first.times(at)
  const third = second.times(at)
  return [rise, first, second, third, third.times(at)]
}

/** Appends each column's running total plus its new term (a missing term is zero: the total carries over). */
function extend(columns: readonly Decimal[][], terms: readonly Decimal[]): void {
  columns.forEach((column, k) => {
    const total = last(column)
    const term = terms[k]
    column.push(term === undefined || term === ZERO ? total : total.plus(term))
  })
}

function countBelow(ascending: readonly Decimal[], u: Decimal): number {
  let low = 0
  let high = ascending.length
  while (low < high) {
    const mid = (low + high) >> 1
    if (ascending[mid]!.lt(u)) low = mid + 1
    else high = mid
  }
  return low
}
