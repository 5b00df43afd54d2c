import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import type { LocalPoint, LocalSpread } from './batten-model.js'
import type { IntensityStep } from './region-loads.js'
import { floatOf } from './decimal-float.js'
import { exactOffset, numberDigits, type NumberDigits } from './exact-offset.js'

/** A region while loads are placed in it: its loads so far and where its u = 0 is. */
export interface RegionDraft {
  length: Decimal
  lengthFloat: number
  points: LocalPoint[]
  spreads: LocalSpread[]
  steps: IntensityStep[]
  origin: Decimal
  /** The origin's digits as a safe integer, for exact offsets without decimals (undefined: use decimals). */
  originDigits: NumberDigits | undefined
  /** True for the start overhang, where u runs from its line toward x = 0. */
  outward: boolean
}

/** The lines, the regions between and beyond them, and the spread edges that fall on a line. */
export interface BattenFrame {
  xs: readonly number[]
  length: Decimal
  lengthNumber: number
  supports: Decimal[]
  start: RegionDraft
  spans: RegionDraft[]
  end: RegionDraft
  /** Spread edges on each line (x-sense: `up` where a spread starts). */
  lineEdges: Array<Array<{ w: Decimal; up: boolean }>>
}

/** Where a position falls: on a line, or in a region at u (and u as a number). */
export type Place = { line: number } | { region: RegionDraft; u: Decimal; float: number }

const draft = (length: Decimal, origin: Decimal, originNumber: number, outward: boolean): RegionDraft => ({
  length,
  lengthFloat: floatOf(length),
  points: [],
  spreads: [],
  steps: [],
  origin,
  originDigits: numberDigits(originNumber),
  outward,
})

/**
 * The empty regions of a batten hung from its pick points.
 *
 * @example
 * battenFrame(20, [0, 10, 20]).spans.map((s) => s.length.toString()) // ['10', '10']
 */
export function battenFrame(length: number, pickPoints: readonly number[]): BattenFrame {
  const supports = pickPoints.map((x) => Dec(x))
  const last = supports.length - 1
  const total = Dec(length)
  return {
    xs: pickPoints,
    length: total,
    lengthNumber: length,
    supports,
    start: draft(supports[0]!, supports[0]!, pickPoints[0]!, true),
    spans: supports.slice(1).map((x, k) => draft(x.minus(supports[k]!), supports[k]!, pickPoints[k]!, false)),
    end: draft(total.minus(supports[last]!), supports[last]!, pickPoints[last]!, false),
    lineEdges: supports.map(() => []),
  }
}

/**
 * Locates x, as u within its region. A batten end is an overhang's own length (the same
 * object, so equal edges there are found without a decimal comparison).
 *
 * @example
 * const frame = battenFrame(20, [0, 10, 20])
 * place(frame, 15) // { region: frame.spans[1], u: 5, ... }
 */
export function place(frame: BattenFrame, x: number): Place {
  const { xs, start, spans, end } = frame
  const index = findRegion(xs, x)
  if (index.line !== undefined) return { line: index.line }
  const region = index.span === -1 ? start : index.span === xs.length - 1 ? end : spans[index.span]!
  if (region === start && x === 0) return { region, u: region.length, float: region.lengthFloat }
  if (region === end && x === frame.lengthNumber) return { region, u: region.length, float: region.lengthFloat }
  // Most positions are short figures: u straight from integers, one decimal made, none subtracted.
  const u =
    (region.originDigits && exactOffset(x, region.originDigits, region.outward)) ??
    (region.outward ? region.origin.minus(Dec(x)) : Dec(x).minus(region.origin))
  return { region, u, float: floatOf(u) }
}

/** Which line a position sits on, or which span (-1 before the first line, last index after the last). */
function findRegion(xs: readonly number[], at: number): { line?: number; span: number } {
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
