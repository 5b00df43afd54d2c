import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { Dec } from '../../../shared/units/index.js'
import { planBricks, type BrickStock } from '../../../shared/engine/brick-plan.js'

/** Every combination of counts: the heaviest not above the limit within the stack, then the fewest bricks. */
function bruteForce(stock: BrickStock[], limit: number, stackRoom: number) {
  let best = { weight: -1, count: Infinity }
  const walk = (i: number, weight: number, stack: number, count: number) => {
    if (weight > limit + 1e-9 || stack > stackRoom + 1e-9) return
    if (i === stock.length) {
      if (weight > best.weight + 1e-9 || (Math.abs(weight - best.weight) < 1e-9 && count < best.count))
        best = { weight, count }
      return
    }
    const b = stock[i]!
    for (let c = 0; c <= b.available; c++) walk(i + 1, weight + c * b.weight, stack + c * b.thickness, count + c)
  }
  walk(0, 0, 0, 0)
  return best
}

const stockArbitrary = fc.array(
  fc.record({
    name: fc.constantFrom('full', 'half', 'quarter', 'lead'),
    weight: fc.integer({ min: 5, max: 100 }).map((n) => n / 2),
    thickness: fc.integer({ min: 1, max: 8 }).map((n) => n / 2),
    available: fc.integer({ min: 0, max: 6 }),
  }),
  { minLength: 1, maxLength: 3 },
)

describe('brick plan', () => {
  it('when 20 lb and 10 lb bricks are free and 250 lb is needed, then 12 full and 1 half load exactly 250 lb', () => {
    const plan = planBricks(
      [
        { name: 'full', weight: 20, thickness: 2, available: 80 },
        { name: 'half', weight: 10, thickness: 1, available: 10 },
      ],
      250,
      60,
    )
    expect(plan.counts).toEqual([12, 1])
    expect(plan.loaded.toString()).toBe('250')
    expect(plan.stackUsed.toString()).toBe('25')
  })

  it('when the requirement falls between brick sizes, then the plan stays below it (batten heavy), never above', () => {
    const plan = planBricks([{ name: 'full', weight: 20, thickness: 2, available: 80 }], 255, 200)
    expect(plan.loaded.toString()).toBe('240')
  })

  it('when decimal brick weights are used, then the search is exact at their precision', () => {
    const plan = planBricks(
      [
        { name: 'a', weight: 12.5, thickness: 1, available: 9 },
        { name: 'b', weight: 0.25, thickness: 0.1, available: 9 },
      ],
      26.25,
      100,
    )
    expect(plan.loaded.toString()).toBe('26.25')
    expect(plan.counts).toEqual([2, 5])
  })

  it('when any small stock is planned, then it matches brute force, never uses more than is free and never goes over the limit', () => {
    fc.assert(
      fc.property(
        stockArbitrary,
        fc.integer({ min: 0, max: 800 }).map((n) => n / 2),
        fc.integer({ min: 0, max: 40 }),
        (stock, limit, stackRoom) => {
          const plan = planBricks(stock, limit, stackRoom)
          const best = bruteForce(stock, limit, stackRoom)
          plan.counts.forEach((count, k) => expect(count).toBeLessThanOrEqual(stock[k]!.available))
          expect(plan.loaded.lte(limit)).toBe(true)
          expect(plan.stackUsed.lte(stackRoom)).toBe(true)
          expect(plan.loaded.toNumber()).toBeCloseTo(best.weight, 9)
          expect(plan.bricks).toBe(best.count)
          const recomputed = stock.reduce((s, b, k) => s.plus(Dec(b.weight).times(plan.counts[k]!)), Dec(0))
          expect(recomputed.toString()).toBe(plan.loaded.toString())
        },
      ),
      { numRuns: 300 },
    )
  })
})
