import type { CalculationInput } from '../../shared/schemas/calculation.js'
import type { CalculationResult } from '../../shared/schemas/calculation-result.js'
import type { BrickStockLine } from '../../shared/schemas/index.js'
import { travelBalance } from '../../shared/engine/travel-balance.js'
import type { UnitSystem } from '../../shared/units/index.js'
import { balanceInWords, showFigure } from './balanceFigures'

/** One row of the balance-across-travel table and one point of its chart. */
export interface TravelRow {
  where: string
  travelled: number
  outOfBalance: number
  words: string
  within: boolean
}

/**
 * The out of balance from the in trim to the out trim, as rows the chart and its table share: every quarter of the
 * travel in the table, finer steps for the line. Undefined when the lineset has no such figures.
 */
export function travelRows(
  input: Pick<CalculationInput, 'trims'> | null | undefined,
  result: CalculationResult,
  tolerance: number,
  steps = 4,
): TravelRow[] | undefined {
  const points = travelBalance(input ?? {}, result, steps)
  if (!points) return undefined
  const units = result.units
  return points.map((point, k) => {
    const place = k === 0 ? 'In trim' : k === steps ? 'Out trim' : `${Math.round((100 * k) / steps)}% of the way out`
    const where =
      point.height === undefined
        ? `${place} (${showFigure(point.travelled, 'length', units)} out)`
        : `${place} (${showFigure(point.height, 'length', units)})`
    return {
      where,
      travelled: point.travelled,
      outOfBalance: point.outOfBalance,
      words: balanceInWords(point.outOfBalance, units).words,
      within: Math.abs(point.outOfBalance) <= tolerance,
    }
  })
}

/** One line's load beside its working load limit, in words for the table. */
export interface LineLoadRow {
  line: string
  load: number
  loadText: string
  state: string
  danger: boolean
}

export function lineLoadRows(result: CalculationResult): LineLoadRow[] {
  const limit = result.lineWorkingLoadLimit
  return result.lineLoads.map((line, k) => {
    const slack = line.load <= 0
    const over = limit !== undefined && line.load > limit
    const share = limit ? ` (${Math.round((100 * line.load) / limit)}% of its limit)` : ''
    return {
      line: `Line ${k + 1}`,
      load: line.load,
      loadText: showFigure(line.load, 'weight', result.units),
      state: slack ? 'Slack' : over ? `Over its limit${share}` : `Within its limit${share}`,
      danger: slack || over,
    }
  })
}

/** Brick stock in counts by type, and the same as a weight in the venue's units when the type's weight is known. */
export interface StockRow {
  name: string
  onArbors: number
  reserved: number
  inStorage: number
  weightText?: string
}

export function stockRows(
  lines: readonly BrickStockLine[],
  unitWeights: ReadonlyMap<string, number>,
  units: UnitSystem,
): StockRow[] {
  return lines.map((line) => {
    const unitWeight = unitWeights.get(line.brickTypeId)
    const row: StockRow = {
      name: line.name,
      onArbors: line.onArbors,
      reserved: line.reserved,
      inStorage: line.inStorage,
    }
    if (unitWeight !== undefined) row.weightText = showFigure(unitWeight * line.owned, 'weight', units)
    return row
  })
}
