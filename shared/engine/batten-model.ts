import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import { battenFrame, place, type BattenFrame, type RegionDraft } from './batten-frame.js'
import { sumRegionLoads, totalSums, type LoadSums } from './region-loads.js'
import { placeSpread } from './spread-placement.js'
import { floatOf } from './decimal-float.js'
import { exactOffset, numberDigits } from './exact-offset.js'

/**
 * A weight at a point, located within its region (see {@link Region}). `float` holds the same
 * figures as numbers for the floating-point searches (location only), converted once.
 */
export interface LocalPoint {
  u: Decimal
  weight: Decimal
  float: { u: number; weight: number }
}
/** A uniform weight per length from u1 to u2 within its region, with its float twin. */
export interface LocalSpread {
  u1: Decimal
  u2: Decimal
  weightPerLength: Decimal
  float: { u1: number; u2: number; weightPerLength: number }
}

/**
 * A stretch of batten: a span between two lift lines (u measured from its left line)
 * or an overhang beyond an end line (u measured outward from that line). Loads keep the
 * input order (the float searches depend on it); `sums` holds them in order of position.
 */
export interface Region {
  length: Decimal
  points: LocalPoint[]
  spreads: LocalSpread[]
  sums: LoadSums
}

/** What the beam analysis needs: lines, loads sorted into regions, totals. */
export interface BattenModel {
  length: Decimal
  supports: Decimal[]
  /** Loads hanging exactly at each line, which go straight into it. */
  direct: Decimal[]
  spans: Region[]
  startOverhang: Region
  endOverhang: Region
  /** The total of `points` and `spreads` as given (not the batten's own weight or the hardware). */
  itemsWeight: Decimal
}

/** Loads as the engine receives them, in the input's units. */
export interface BattenLoads {
  length: number
  pickPoints: number[]
  points: Array<{ at: number; weight: Decimal.Value }>
  spreads: Array<{ from: number; to: number; weightPerLength: Decimal.Value }>
  /** The batten's own weight per length, along its whole length. */
  selfWeightPerLength?: Decimal.Value
  /** Hardware hanging at every pick point, the same at each. */
  atEachLine?: Decimal.Value
}

const ZERO = Dec(0)
/** A number's decimal parses back to the same number, so its float twin is the number itself. */
const toFloat = (value: Decimal.Value, exact: Decimal) => (typeof value === 'number' ? value : floatOf(exact))

/** to − from exactly: in integers where the figures are short, in decimals otherwise (the same value). */
function spreadLength(from: number, to: number): Decimal {
  const start = numberDigits(from)
  return (start && exactOffset(to, start, false)) ?? Dec(to).minus(Dec(from))
}

/** One decimal per distinct figure in a calculation: a batten often carries many identical fixtures. */
function decimals(): (value: Decimal.Value) => Decimal {
  const made = new Map<number, Decimal>()
  return (value) => {
    if (typeof value !== 'number') return Dec(value)
    let exact = made.get(value)
    if (!exact) made.set(value, (exact = Dec(value)))
    return exact
  }
}

/**
 * Sorts every load into the region of the batten it acts on, splitting spread loads at the lines,
 * converting each figure to a decimal once and totalling the items on the way.
 *
 * @example
 * buildBattenModel({ length: 20, pickPoints: [0, 10, 20], points: [{ at: 5, weight: 100 }], spreads: [] })
 *   .spans[0]!.points[0]!.u.toString() // '5'
 */
export function buildBattenModel(loads: BattenLoads): BattenModel {
  const frame = battenFrame(loads.length, loads.pickPoints)
  const decimal = decimals()
  const direct = frame.supports.map(() => ZERO)
  for (const point of loads.points) {
    const weight = decimal(point.weight)
    const where = place(frame, point.at)
    if ('line' in where) direct[where.line] = direct[where.line]!.plus(weight)
    else
      where.region.points.push({ u: where.u, weight, float: { u: where.float, weight: toFloat(point.weight, weight) } })
  }
  // The batten's own weight goes first, as the float searches have always seen it.
  if (loads.selfWeightPerLength !== undefined) {
    const w = Dec(loads.selfWeightPerLength)
    placeSpread(frame, 0, loads.length, w, toFloat(loads.selfWeightPerLength, w))
  }
  // The items' total, in exact sums: the points at lines now, those in regions from the region sums.
  let itemsWeight = direct.reduce((sum, d) => sum.plus(d), ZERO)
  for (const spread of loads.spreads) {
    const w = decimal(spread.weightPerLength)
    placeSpread(frame, spread.from, spread.to, w, toFloat(spread.weightPerLength, w))
    itemsWeight = itemsWeight.plus(w.times(spreadLength(spread.from, spread.to)))
  }
  if (loads.atEachLine !== undefined) {
    const share = Dec(loads.atEachLine)
    direct.forEach((d, k) => (direct[k] = d.plus(share)))
  }
  const regions = sumRegions(frame)
  for (const region of [regions.startOverhang, ...regions.spans, regions.endOverhang])
    itemsWeight = itemsWeight.plus(totalSums(region.sums).points[0]!)
  return { length: frame.length, supports: frame.supports, direct, ...regions, itemsWeight }
}

/**
 * Running sums for every region, sweeping from x = 0: the intensity leaving one region, plus the
 * edges on the line after it, is the intensity entering the next.
 */
function sumRegions(frame: BattenFrame): Pick<BattenModel, 'spans' | 'startOverhang' | 'endOverhang'> {
  const finish = (region: RegionDraft, entering: Decimal, close: boolean) => {
    const { sums, leaving } = sumRegionLoads(region.points, region.steps, entering, close ? region.length : undefined)
    return { region: { length: region.length, points: region.points, spreads: region.spreads, sums }, leaving }
  }
  const across = (intensity: Decimal, line: number) =>
    frame.lineEdges[line]!.reduce((sum, edge) => (edge.up ? sum.plus(edge.w) : sum.minus(edge.w)), intensity)
  // Reaching line 0 from x = 0, the start overhang's steps (reversed, u runs outward) have built the intensity.
  const before = frame.start.steps.reduce((sum, step) => (step.up ? sum.minus(step.w) : sum.plus(step.w)), ZERO)
  const startOverhang = finish(frame.start, before, false).region
  let intensity = across(before, 0)
  const spans = frame.spans.map((span, k) => {
    const done = finish(span, intensity, true)
    intensity = across(done.leaving, k + 1)
    return done.region
  })
  return { startOverhang, spans, endOverhang: finish(frame.end, intensity, false).region }
}
