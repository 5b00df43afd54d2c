import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'

/** A weight at a point, located within its region (see {@link Region}). */
export interface LocalPoint { u: Decimal; weight: Decimal }
/** A uniform weight per length from u1 to u2 within its region. */
export interface LocalSpread { u1: Decimal; u2: Decimal; weightPerLength: Decimal }

/**
 * A stretch of batten: a span between two lift lines (u measured from its left line)
 * or an overhang beyond an end line (u measured outward from that line).
 */
export interface Region { length: Decimal; points: LocalPoint[]; spreads: LocalSpread[] }

/** What the beam analysis needs: lines, loads sorted into regions, totals. */
export interface BattenModel {
  length: Decimal
  supports: Decimal[]
  /** Loads hanging exactly at each line, which go straight into it. */
  direct: Decimal[]
  spans: Region[]
  startOverhang: Region
  endOverhang: Region
}

/** Loads as the engine receives them, in the input's units. */
export interface BattenLoads {
  length: number
  pickPoints: number[]
  points: Array<{ at: number; weight: Decimal.Value }>
  spreads: Array<{ from: number; to: number; weightPerLength: Decimal.Value }>
}

const emptyRegion = (length: Decimal): Region => ({ length, points: [], spreads: [] })

/**
 * Sorts every load into the region of the batten it acts on, splitting spread loads at the lines.
 *
 * @example
 * buildBattenModel({ length: 20, pickPoints: [0, 10, 20], points: [{ at: 5, weight: 100 }], spreads: [] })
 *   .spans[0]!.points[0]!.u.toString() // '5'
 */
export function buildBattenModel(loads: BattenLoads): BattenModel {
  const xs = loads.pickPoints
  const supports = xs.map((x) => Dec(x))
  const last = xs.length - 1
  const spans = supports.slice(1).map((x, k) => emptyRegion(x.minus(supports[k]!)))
  const start = emptyRegion(supports[0]!)
  const end = emptyRegion(Dec(loads.length).minus(supports[last]!))
  const direct = supports.map(() => Dec(0))
  for (const point of loads.points) {
    const weight = Dec(point.weight)
    const index = findRegion(xs, point.at)
    if (index.line !== undefined) direct[index.line] = direct[index.line]!.plus(weight)
    else if (index.span === -1) start.points.push({ u: supports[0]!.minus(point.at), weight })
    else if (index.span === last) end.points.push({ u: Dec(point.at).minus(supports[last]!), weight })
    else spans[index.span]!.points.push({ u: Dec(point.at).minus(supports[index.span]!), weight })
  }
  for (const spread of loads.spreads) {
    const w = Dec(spread.weightPerLength)
    const { from, to } = spread
    if (from < xs[0]!) start.spreads.push({ u1: supports[0]!.minus(Math.min(to, xs[0]!)), u2: supports[0]!.minus(from), weightPerLength: w })
    if (to > xs[last]!) end.spreads.push({ u1: Dec(Math.max(from, xs[last]!)).minus(supports[last]!), u2: Dec(to).minus(supports[last]!), weightPerLength: w })
    for (let k = 0; k < last; k++) {
      const left = Math.max(from, xs[k]!)
      const right = Math.min(to, xs[k + 1]!)
      if (right > left)
        spans[k]!.spreads.push({ u1: Dec(left).minus(supports[k]!), u2: Dec(right).minus(supports[k]!), weightPerLength: w })
    }
  }
  return { length: Dec(loads.length), supports, direct, spans, startOverhang: start, endOverhang: end }
}

/** Which line a position sits on, or which span (-1 before the first line, last index after the last). */
function findRegion(xs: number[], at: number): { line?: number; span: number } {
  let low = 0
  let high = xs.length - 1
  while (low <= high) {
    const mid = (low + high) >> 1
    if (xs[mid] === at) return { line: mid, span: mid }
    if (xs[mid]! < at) low = mid + 1
    else high = mid - 1
  }
  return { span: high }
}
