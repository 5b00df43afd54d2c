import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { Dec } from '../../../shared/units/index.js'
import { planBricks, type BrickStock } from '../../../shared/engine/brick-plan.js'
import { balanceCounterweight } from '../../../shared/engine/counterweight.js'

// Invented stocks: a 20 lb full brick and a 1.25 lb lead trim brick.
const fullAndTrim = (full = 80, trim = 40): BrickStock[] => [
  { name: 'full', weight: 20, thickness: 2, available: full },
  { name: 'trim', weight: 1.25, thickness: 0.25, available: trim },
]

/** Every combination of counts inside [limit - within, limit] and the stack: the fewest bricks, then the heaviest. */
function bruteForceInBand(stock: BrickStock[], limit: number, within: number, stackRoom: number) {
  let best: { weight: number; count: number } | null = null
  const walk = (i: number, weight: number, stack: number, count: number) => {
    if (weight > limit + 1e-9 || stack > stackRoom + 1e-9) return
    if (i === stock.length) {
      if (weight < limit - within - 1e-9) return
      if (!best || count < best.count || (count === best.count && weight > best.weight + 1e-9)) best = { weight, count }
      return
    }
    const b = stock[i]!
    for (let c = 0; c <= b.available; c++) walk(i + 1, weight + c * b.weight, stack + c * b.thickness, count + c)
  }
  walk(0, 0, 0, 0)
  return best as { weight: number; count: number } | null
}

describe('the brick plan within a tolerance band', () => {
  it('when 449 lb is needed with 10 lb to spare, then 22 full bricks (440 lb) beat 22 full and 7 trim (448.75 lb)', () => {
    expect(planBricks(fullAndTrim(), 449, 200).counts).toEqual([22, 7])
    const plan = planBricks(fullAndTrim(), 449, 200, 10)
    expect(plan.counts).toEqual([22, 0])
    expect(plan.loaded.toString()).toBe('440')
    expect(plan.complete).toBe(true)
  })

  it('when the stock cannot reach the band, then the heaviest plan is given as without one', () => {
    const plan = planBricks(fullAndTrim(10, 5), 449, 200, 10)
    expect(plan.counts).toEqual([10, 5])
    expect(plan.loaded.toString()).toBe('206.25')
  })

  it('when the set is double purchase, then the band at the arbor is twice the tolerance at the batten', () => {
    // 300 lb at the batten × 2 − 90 lb empty arbor = 510 lb of bricks; the band is 490 to 510 lb.
    const figures = balanceCounterweight({
      units: 'imperial',
      ratio: 2,
      battenSide: Dec(300),
      arbor: { emptyWeight: 90, capacity: 2000, stackLength: 120 },
      bricks: fullAndTrim(),
      tolerance: 10,
    })
    expect(figures.plan.counts).toEqual([25, 0])
    expect(figures.outOfBalance.toString()).toBe('5')
    expect(figures.checks.map((c) => c.code)).not.toContain('counterweight-short')
  })

  it('when any small stock is planned with a band, then it matches brute force and never takes more bricks than the heaviest plan', () => {
    const stock = fc.array(
      fc.record({
        name: fc.constantFrom('full', 'half', 'lead'),
        weight: fc.integer({ min: 2, max: 80 }).map((n) => n / 2),
        thickness: fc.integer({ min: 1, max: 8 }).map((n) => n / 2),
        available: fc.integer({ min: 0, max: 6 }),
      }),
      { minLength: 1, maxLength: 3 },
    )
    fc.assert(
      fc.property(
        stock,
        fc.integer({ min: 0, max: 600 }).map((n) => n / 2),
        fc.integer({ min: 0, max: 40 }).map((n) => n / 2),
        fc.integer({ min: 0, max: 40 }),
        (bricks, limit, within, stackRoom) => {
          const plan = planBricks(bricks, limit, stackRoom, within)
          const heaviest = planBricks(bricks, limit, stackRoom)
          const best = bruteForceInBand(bricks, limit, within, stackRoom)
          plan.counts.forEach((count, k) => expect(count).toBeLessThanOrEqual(bricks[k]!.available))
          expect(plan.loaded.lte(limit)).toBe(true)
          expect(plan.stackUsed.lte(stackRoom)).toBe(true)
          if (best) {
            expect(plan.bricks).toBe(best.count)
            expect(plan.loaded.toNumber()).toBeCloseTo(best.weight, 9)
            expect(plan.bricks).toBeLessThanOrEqual(heaviest.bricks)
          } else {
            expect(plan.counts).toEqual(heaviest.counts)
          }
        },
      ),
      { numRuns: 300 },
    )
  })
})
