import type { FigureChange, HangComparison } from '../../shared/hang/hang-comparison.js'
import type { UnitSystem } from '../../shared/units/index.js'
import { balanceInWords } from './balanceFigures'
import { formatFigure } from './figures'
import { signedCount, signedFigure } from './historyWords'

/** One row of the load comparison, every cell already in words. */
export interface ComparisonRow {
  key: string
  label: string
  from: string
  to: string
  change: string
  /** A heading row that starts a group (its cells are empty). */
  heading?: boolean
}

const weight = (value: number | null, units: UnitSystem) => formatFigure(value, 'weight', units)
const position = (value: number | null, units: UnitSystem) => formatFigure(value, 'length', units)

function figureRow(key: string, label: string, figure: FigureChange, units: UnitSystem): ComparisonRow {
  return {
    key,
    label,
    from: weight(figure.from, units),
    to: weight(figure.to, units),
    change: signedFigure(figure.change, 'weight', units),
  }
}

/** Where a line is, once when both revisions agree, else before and after. */
function lineLabel(line: number, fromAt: number | null, toAt: number | null, units: UnitSystem) {
  if (fromAt === toAt || fromAt === null || toAt === null) return `Line ${line} at ${position(fromAt ?? toAt, units)}`
  return `Line ${line} at ${position(fromAt, units)} → ${position(toAt, units)}`
}

/**
 * The rows of the load comparison: total load, each line's load, then the counterweight (bricks needed and
 * loaded, the arbor side, the balance in words, each brick type either plan uses, by count), the haul force and the motor's load.
 *
 * @example
 * comparisonRows(comparison)[0] // { key: 'total', label: 'Total load', from: '388.8 lb', to: '416.8 lb', change: '+28 lb' }
 */
export function comparisonRows(comparison: HangComparison): ComparisonRow[] {
  const { loads, units } = comparison
  const rows = [figureRow('total', 'Total load', loads.totalLoad, units)]
  rows.push({ key: 'lines', label: 'Load on each lift line', from: '', to: '', change: '', heading: true })
  for (const line of loads.lineLoads)
    rows.push(figureRow(`line-${line.line}`, lineLabel(line.line, line.fromAt, line.toAt, units), line, units))
  const counterweight = loads.counterweight
  if (counterweight) {
    rows.push({ key: 'counterweight', label: 'Counterweight', from: '', to: '', change: '', heading: true })
    rows.push(figureRow('required', 'Bricks needed', counterweight.required, units))
    rows.push(figureRow('loaded', 'Bricks planned', counterweight.loaded, units))
    rows.push(figureRow('arbor', 'Arbor side in all', counterweight.arborSide, units))
    const balance = (value: number | null) => (value === null ? '—' : balanceInWords(value, units).words)
    rows.push({
      ...figureRow('balance', 'Out of balance', counterweight.outOfBalance, units),
      from: balance(counterweight.outOfBalance.from),
      to: balance(counterweight.outOfBalance.to),
    })
    // A brick type neither plan uses says nothing.
    for (const brick of counterweight.bricks.filter((type) => type.from || type.to))
      rows.push({
        key: `brick-${brick.name}`,
        label: `${brick.name}, count`,
        from: String(brick.from),
        to: String(brick.to),
        change: signedCount(brick.change),
      })
  }
  if (loads.haulForce) rows.push(figureRow('haul', 'Haul force', loads.haulForce, units))
  if (loads.motorLoad) rows.push(figureRow('motor', 'Load on the motor', loads.motorLoad, units))
  return rows
}
