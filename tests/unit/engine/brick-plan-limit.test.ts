import { describe, expect, it } from 'vitest'
import { BRICK_PLAN_WORK_LIMIT, planBricks } from '../../../shared/engine/brick-plan.js'
import { runCalculation } from '../../../shared/engine/calculate.js'

// Eight brick types with awkward, six-decimal weights: a stock no house has, but one a request can send.
const sixPlaces = (value: number) => Math.round(value * 1e6) / 1e6
const awkward = Array.from({ length: 8 }, (_, k) => ({
  name: `b${k}`,
  weight: sixPlaces(7 + k * 1.37 + 0.000137 * k),
  thickness: sixPlaces(1 + k * 0.13),
  available: 50,
}))

describe('the brick plan on an unusual stock', () => {
  it('when the search reaches its work limit, then it answers at once with a plan that still fits and says it is unproven', () => {
    const plan = planBricks(awkward, 1999.99, 1000)
    // Work is counted, not timed (speed lives in npm run bench).
    expect(plan.work).toBe(BRICK_PLAN_WORK_LIMIT)
    expect(plan.complete).toBe(false)
    expect(plan.loaded.lte(1999.99)).toBe(true)
    plan.counts.forEach((count, k) => expect(count).toBeLessThanOrEqual(awkward[k]!.available))
  })

  it('when the calculation uses such a plan, then a caution tells the crew to check the arbor by hand', () => {
    // No tolerance: only an exact sum of these weights would be in the band, and the search cannot prove one.
    const outcome = runCalculation({
      units: 'imperial',
      kind: 'counterweight-single',
      batten: { length: 40, weightPerLength: 2.25, pickPoints: [0, 20, 40] },
      items: [{ weight: 2000, at: 20 }],
      arbor: { emptyWeight: 90, capacity: 3000, stackLength: 390 },
      bricks: awkward,
      tolerance: 0,
    })
    if (!outcome.ok) throw new Error(JSON.stringify(outcome.error))
    expect(outcome.result.checks.find((c) => c.code === 'brick-plan-unproven')?.level).toBe('caution')
  })

  it('when the stock is ordinary, then the search finishes and proves its plan', () => {
    const plan = planBricks(
      [
        { name: 'full', weight: 19.5, thickness: 2, available: 900 },
        { name: 'half', weight: 9.75, thickness: 1, available: 300 },
        { name: 'trim', weight: 5, thickness: 0.5, available: 60 },
      ],
      3000,
      400,
    )
    expect(plan.complete).toBe(true)
  })
})
