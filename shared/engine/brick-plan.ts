import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import { searchFewestInBand, type ScaledBrick } from './brick-plan-fewest.js'

/** A venue's brick type and how many are free to load. */
export interface BrickStock {
  name: string
  weight: number
  thickness: number
  available: number
}

/**
 * Counts per brick type (in stock order) and what they add up to. `complete` is false when the search
 * hit its work limit: the plan still fits stock, capacity and stack, but a closer one may exist.
 */
export interface BrickPlan {
  counts: number[]
  loaded: Decimal
  stackUsed: Decimal
  bricks: number
  complete: boolean
  /** Partial plans tried: never more than {@link BRICK_PLAN_WORK_LIMIT}. */
  work: number
}

/**
 * How many partial plans the search may try. Ordinary stocks finish in a few thousand; this bound keeps an
 * unusual stock (many types with many-decimal weights) from holding a request or a keystroke for seconds.
 * Every step of the search is a partial plan tried, counting loops included, so the bound holds whatever
 * the figures (a count of a million bricks costs no more than a count of ten).
 */
export const BRICK_PLAN_WORK_LIMIT = 100_000

type Scaled = ScaledBrick

/**
 * The heaviest load of bricks not above `limit` (so the set stays balanced or batten heavy), with the
 * fewest bricks among equal weights, within the stock and the stack length. Exact: weights and
 * thicknesses are scaled to whole numbers at their common decimal precision and searched by
 * branch and bound, heaviest type first.
 *
 * With `within` (a weight band below the limit, e.g. the venue's tolerance times the purchase ratio), the
 * plan is instead the one with the fewest bricks that lands inside the band, the heaviest among equal counts:
 * a crew handles every brick twice, and twenty trim bricks to close the last few pounds of a band the venue
 * already accepts cost time at the rail and stock in storage. When no plan reaches the band, the heaviest
 * plan is given as without it.
 *
 * @example
 * planBricks([{ name: 'full', weight: 20, thickness: 2, available: 80 }, { name: 'half', weight: 10, thickness: 1, available: 10 }], 250, 60)
 *   .counts // [12, 1]
 */
export function planBricks(
  stock: readonly BrickStock[],
  limit: Decimal.Value,
  stackRoom: Decimal.Value,
  within?: Decimal.Value,
): BrickPlan {
  const weightScale = Dec(10).pow(Math.max(0, ...stock.map((b) => Dec(b.weight).decimalPlaces())))
  const thicknessScale = Dec(10).pow(Math.max(0, ...stock.map((b) => Dec(b.thickness).decimalPlaces())))
  const types: Scaled[] = stock
    .map((b, index) => ({
      weight: Dec(b.weight).times(weightScale).toNumber(),
      thickness: Dec(b.thickness).times(thicknessScale).toNumber(),
      available: b.available,
      index,
    }))
    .filter((t) => t.available > 0)
    .sort((a, b) => b.weight - a.weight || a.thickness - b.thickness)
  const divisor = types.reduce((g, t) => greatestCommonDivisor(g, t.weight), 0) || 1
  const rawLimit = Dec.max(0, Dec(limit).times(weightScale).floor()).toNumber()
  const scaledLimit = rawLimit - (rawLimit % divisor)
  const scaledStack = Dec.max(0, Dec(stackRoom).times(thicknessScale).floor()).toNumber()
  const best = bandOrHeaviest(types, scaledLimit, scaledStack, limit, within, weightScale)
  const counts = stock.map(() => 0)
  best.counts.forEach((count, k) => (counts[types[k]!.index] = count))
  const loaded = stock.reduce((sum, b, i) => sum.plus(Dec(b.weight).times(counts[i]!)), Dec(0))
  const stackUsed = stock.reduce((sum, b, i) => sum.plus(Dec(b.thickness).times(counts[i]!)), Dec(0))
  const bricks = counts.reduce((a, b) => a + b, 0)
  return { counts, loaded, stackUsed, bricks, complete: best.complete, work: best.work }
}

/** The fewest bricks inside the band when one is asked for and reachable, else the heaviest plan. */
function bandOrHeaviest(
  types: Scaled[],
  scaledLimit: number,
  scaledStack: number,
  limit: Decimal.Value,
  within: Decimal.Value | undefined,
  weightScale: Decimal,
) {
  if (within === undefined) return search(types, scaledLimit, scaledStack)
  const floor = Dec.max(0, Dec(limit).minus(within).times(weightScale).ceil()).toNumber()
  // Half the budget for the band, so that a band out of reach still leaves the heaviest search room to work.
  const fewest = searchFewestInBand(types, floor, scaledLimit, scaledStack, BRICK_PLAN_WORK_LIMIT / 2)
  if (fewest.counts) return { counts: fewest.counts, complete: fewest.complete, work: fewest.work }
  const heaviest = search(types, scaledLimit, scaledStack, BRICK_PLAN_WORK_LIMIT - fewest.work)
  return { ...heaviest, work: heaviest.work + fewest.work }
}

/**
 * Euclid's algorithm as a loop, on safe integers only (the schema's ranges and six decimals keep every scaled
 * figure one); anything else answers 1, which only makes the search a little less quick.
 */
function greatestCommonDivisor(a: number, b: number): number {
  if (!Number.isSafeInteger(a) || !Number.isSafeInteger(b)) return 1
  while (b !== 0) [a, b] = [b, a % b]
  return a
}

function search(types: Scaled[], limit: number, stackRoom: number, budget = BRICK_PLAN_WORK_LIMIT) {
  const n = types.length
  const restWeight: number[] = new Array(n + 1).fill(0)
  const restDensity: number[] = new Array(n + 1).fill(0)
  for (let i = n - 1; i >= 0; i--) {
    const t = types[i]!
    restWeight[i] = restWeight[i + 1]! + t.weight * t.available
    restDensity[i] = Math.max(restDensity[i + 1]!, t.weight / t.thickness)
  }
  let bestWeight = -1
  let bestCount = Infinity
  let bestCounts: number[] = []
  const counts: number[] = new Array(n).fill(0)
  let work = 0
  let stopped = false
  const visit = (i: number, weight: number, stackLeft: number, count: number): void => {
    work++
    if (weight > bestWeight || (weight === bestWeight && count < bestCount)) {
      bestWeight = weight
      bestCount = count
      bestCounts = counts.slice()
    }
    if (i === n || weight === limit) return
    // The +1 keeps the floating-point stack bound safely above the true bound.
    const reach = Math.min(limit - weight, restWeight[i]!, Math.floor(stackLeft * restDensity[i]!) + 1)
    const t = types[i]!
    if (weight + reach < bestWeight) return
    if (weight + reach === bestWeight && count + Math.ceil((bestWeight - weight) / t.weight) >= bestCount) return
    const most = Math.min(t.available, Math.floor((limit - weight) / t.weight), Math.floor(stackLeft / t.thickness))
    const least = i === n - 1 ? most : 0
    for (let c = most; c >= least; c--) {
      // Each count tried is one partial plan: stop the moment the budget is spent, not at the loop's end.
      if (work >= budget) {
        stopped = true
        break
      }
      counts[i] = c
      visit(i + 1, weight + c * t.weight, stackLeft - c * t.thickness, count + c)
    }
    counts[i] = 0
  }
  visit(0, 0, stackRoom, 0)
  return { counts: bestCounts, complete: !stopped, work }
}
