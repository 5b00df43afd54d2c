import { describe, expect, it } from 'vitest'
import { analyseBatten } from '../../../shared/engine/batten-analysis.js'
import { BRICK_PLAN_WORK_LIMIT, planBricks } from '../../../shared/engine/brick-plan.js'
import { balanceCounterweight, purchaseRatio } from '../../../shared/engine/counterweight.js'
import { calculationInputSchema, type CalculationInput } from '../../../shared/schemas/calculation.js'
import { COUNT_RANGES } from '../../../shared/schemas/ranges.js'
import { figureRange } from '../../../shared/schemas/quantity.js'
import { awkwardBricks, heaviestCalculation, worstCalculation } from '../../../scripts/lib/worst-calculations.js'
import { PROBE_REQUEST } from '../../support/bad-calculation-inputs.js'

// Work is counted, never timed: the brick plan reports the partial plans it tried, and every other loop in the
// engine runs over lists whose lengths the schema caps. `npm run bench` times the same inputs.

/** The counterweight step of a parsed input, as the engine runs it, with the work its searches spent. */
function counterweightWork(input: CalculationInput) {
  const analysis = analyseBatten(input)
  return balanceCounterweight({
    units: input.units,
    ratio: purchaseRatio(input.kind),
    battenSide: analysis.totalLoad,
    arbor: input.arbor!,
    pipeWeightAboard: input.pipeWeightAboard,
    bricks: input.bricks ?? [],
    tolerance: input.tolerance ?? 0,
    ropeLockHolding: input.ropeLockHolding,
  })
}

const heaviestProbe = () => {
  const weight = figureRange('itemWeight', 'imperial').max
  return { ...PROBE_REQUEST, items: [{ weight, at: 20 }] }
}

describe('the engine work budget', () => {
  it.each([
    ['the worst case known, imperial', () => worstCalculation('imperial')],
    ['the worst case known, metric', () => worstCalculation('metric')],
    ['the heaviest hang, imperial', () => heaviestCalculation('imperial')],
    ['the heaviest hang, metric', () => heaviestCalculation('metric')],
    ["the probe's request at the heaviest item accepted", heaviestProbe],
  ])('when %s is accepted, then its brick searches stay within two plans of work', (_, make) => {
    const input = calculationInputSchema.parse(make())
    expect(input.items.length).toBeLessThanOrEqual(COUNT_RANGES.items.max)
    expect(input.batten.pickPoints.length).toBeLessThanOrEqual(COUNT_RANGES.pickPoints.max)
    expect((input.bricks ?? []).length).toBeLessThanOrEqual(COUNT_RANGES.brickTypes.max)
    const figures = counterweightWork(input)
    expect(figures.work).toBeLessThanOrEqual(2 * BRICK_PLAN_WORK_LIMIT)
    expect(figures.plan.work).toBeLessThanOrEqual(BRICK_PLAN_WORK_LIMIT)
  })

  it('when the worst case is worked out, then both searches spend their whole budget and stop there', () => {
    const figures = counterweightWork(calculationInputSchema.parse(worstCalculation('imperial')))
    expect(figures.plan.complete).toBe(false)
    expect(figures.work).toBe(2 * BRICK_PLAN_WORK_LIMIT)
    expect(figures.checks.map((c) => c.code)).toEqual(expect.arrayContaining(['brick-plan-unproven']))
  })

  it('when the stock is huge and the bricks tiny, then the search still stops at its limit', () => {
    const tiny = awkwardBricks('imperial').map((brick) => ({ ...brick, weight: 0.0221, thickness: 0.0394 }))
    const plan = planBricks(tiny, 10999.999999, 393)
    expect(plan.work).toBeLessThanOrEqual(BRICK_PLAN_WORK_LIMIT)
    expect(plan.loaded.lte(10999.999999)).toBe(true)
  })

  it("when the arbor cannot take what the probe's hang needs, then no second search is made", () => {
    const figures = counterweightWork(calculationInputSchema.parse(heaviestProbe()))
    expect(figures.checks.map((c) => c.code)).toEqual(
      expect.arrayContaining(['arbor-over-capacity', 'counterweight-short']),
    )
    expect(figures.work).toBe(figures.plan.work)
  })
})
