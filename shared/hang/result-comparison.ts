import type { CalculationResult } from '../schemas/calculation-result.js'
import { convert, Dec, type Quantity, type UnitSystem } from '../units/index.js'

/** One figure in two revisions, in the units shown; `change` is `to - from`, null when either side lacks it. */
export interface FigureChange {
  from: number | null
  to: number | null
  change: number | null
}

/** One lift line's load in two revisions, lines matched by their order along the batten (first = 1). */
export interface LineLoadChange extends FigureChange {
  line: number
  fromAt: number | null
  toAt: number | null
}

/** How many bricks of one type the arbor holds in each revision. */
export interface BrickCountChange {
  name: string
  from: number
  to: number
  change: number
}

/** The counterweight in two revisions; absent when neither result has one (hemp, spot line, motor alone). */
export interface CounterweightChange {
  required: FigureChange
  loaded: FigureChange
  arborSide: FigureChange
  outOfBalance: FigureChange
  bricks: BrickCountChange[]
}

/** What moved between two results: total load, each line, the counterweight, the haul and the motor. */
export interface LoadComparison {
  totalLoad: FigureChange
  lineLoads: LineLoadChange[]
  /** True when the two results hang from a different number of lines: the lines cannot be matched one to one. */
  lineCountDiffers: boolean
  counterweight?: CounterweightChange
  haulForce?: FigureChange
  motorLoad?: FigureChange
}

const number = (value: ReturnType<typeof Dec>) => value.toNumber()

/**
 * Two figures of one quantity, each converted from its result's units into `shown`, and their difference
 * worked out exactly.
 */
function figureChange(
  from: { value: number | undefined; units: UnitSystem },
  to: { value: number | undefined; units: UnitSystem },
  quantity: Quantity,
  shown: UnitSystem,
): FigureChange {
  const inShown = (side: typeof from) =>
    side.value === undefined ? null : convert(side.value, quantity, side.units, shown)
  const a = inShown(from)
  const b = inShown(to)
  return {
    from: a && number(a),
    to: b && number(b),
    change: a && b ? number(b.minus(a)) : null,
  }
}

function brickCounts(before: CalculationResult | undefined, after: CalculationResult | undefined): BrickCountChange[] {
  const names = new Map<string, { from: number; to: number }>()
  for (const brick of before?.counterweight?.bricks ?? [])
    names.set(brick.name, { from: brick.count, to: names.get(brick.name)?.to ?? 0 })
  for (const brick of after?.counterweight?.bricks ?? [])
    names.set(brick.name, { from: names.get(brick.name)?.from ?? 0, to: brick.count })
  return [...names].map(([name, { from, to }]) => ({ name, from, to, change: to - from }))
}

/**
 * Compares two engine results figure by figure, converting each from the units it was computed in
 * (`result.units`) into `shown`, so revisions saved before a venue switched units still compare.
 *
 * @example
 * compareResults(older, newer, 'imperial').totalLoad // { from: 412.5, to: 440.5, change: 28 }
 */
export function compareResults(from: CalculationResult, to: CalculationResult, shown: UnitSystem): LoadComparison {
  const pair = (pick: (result: CalculationResult) => number | undefined, quantity: Quantity = 'weight') =>
    figureChange({ value: pick(from), units: from.units }, { value: pick(to), units: to.units }, quantity, shown)
  const lines = Math.max(from.lineLoads.length, to.lineLoads.length)
  const lineLoads = Array.from({ length: lines }, (_, index): LineLoadChange => {
    const load = pair((result) => result.lineLoads[index]?.load)
    const at = pair((result) => result.lineLoads[index]?.at, 'length')
    return { line: index + 1, ...load, fromAt: at.from, toAt: at.to }
  })
  const comparison: LoadComparison = {
    totalLoad: pair((result) => result.totalLoad),
    lineLoads,
    lineCountDiffers: from.lineLoads.length !== to.lineLoads.length,
  }
  if (from.counterweight || to.counterweight)
    comparison.counterweight = {
      required: pair((result) => result.counterweight?.required),
      loaded: pair((result) => result.counterweight?.loaded),
      arborSide: pair((result) => result.counterweight?.arborSide),
      outOfBalance: pair((result) => result.counterweight?.outOfBalance),
      bricks: brickCounts(from, to),
    }
  if (from.haul || to.haul) comparison.haulForce = pair((result) => result.haul?.force)
  if (from.motor || to.motor) comparison.motorLoad = pair((result) => result.motor?.load)
  return comparison
}
