/** A brick type scaled to whole numbers, heaviest first, as the plan searches take them. */
export interface ScaledBrick {
  weight: number
  thickness: number
  available: number
  index: number
}

export interface FewestSearch {
  /** Counts per scaled type, or null when no plan reaches the band within the stock and the stack. */
  counts: number[] | null
  complete: boolean
  work: number
}

/**
 * The plan with the fewest bricks whose weight lies in [floor, limit], the heaviest among equal counts, by
 * branch and bound, heaviest type first and most of it first (so the first plan found is the greedy one and
 * prunes well). A plan is complete the moment it reaches the floor: another brick only adds to the count.
 * Bounded by `budget` partial plans, as the heaviest-plan search is.
 */
export function searchFewestInBand(
  types: readonly ScaledBrick[],
  floor: number,
  limit: number,
  stackRoom: number,
  budget: number,
): FewestSearch {
  const n = types.length
  const restWeight: number[] = new Array(n + 1).fill(0)
  for (let i = n - 1; i >= 0; i--) restWeight[i] = restWeight[i + 1]! + types[i]!.weight * types[i]!.available
  let best: number[] | null = null
  let bestCount = Infinity
  let bestWeight = -1
  const counts: number[] = new Array(n).fill(0)
  let work = 0
  let stopped = false
  const visit = (i: number, weight: number, stackLeft: number, count: number): void => {
    work++
    if (weight >= floor) {
      if (count < bestCount || (count === bestCount && weight > bestWeight)) {
        best = counts.slice()
        bestCount = count
        bestWeight = weight
      }
      return
    }
    if (i === n || weight + restWeight[i]! < floor) return
    const t = types[i]!
    // The types left weigh at most t.weight each: fewer bricks than this cannot close the gap.
    if (count + Math.ceil((floor - weight) / t.weight) > bestCount) return
    const most = Math.min(t.available, Math.floor((limit - weight) / t.weight), Math.floor(stackLeft / t.thickness))
    for (let c = most; c >= 0; c--) {
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
  return { counts: best, complete: !stopped, work }
}
