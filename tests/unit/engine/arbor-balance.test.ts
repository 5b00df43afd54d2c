import { describe, expect, it } from 'vitest'
import { arborWeight, outOfBalanceAtBatten, outOfBalanceAsRecorded } from '../../../shared/engine/arbor-balance.js'

// Invented arbors: frame 90 lb, 110 lb of pipe weight aboard, 20 lb full and 10 lb half bricks.
describe('outOfBalanceAsRecorded', () => {
  it('when the counts are the plan, then the figure is the plan figure', () => {
    const bricks = [{ unitWeight: 20, planned: 9, recorded: 9 }]
    expect(outOfBalanceAsRecorded(1, '7.31', bricks).toString()).toBe('7.31')
  })

  it('when counts differ, then it equals the out of balance worked out from the whole arbor, single and double purchase', () => {
    const battenSide = 487.31
    for (const ratio of [1, 2] as const) {
      const frame = { emptyWeight: 90, pipeWeightAboard: 110 }
      const plannedArbor = arborWeight({
        ...frame,
        bricks: [
          { unitWeight: 20, count: 9 },
          { unitWeight: 10, count: 1 },
        ],
      })
      const planned = outOfBalanceAtBatten(ratio, battenSide, plannedArbor)
      const loadedArbor = arborWeight({
        ...frame,
        bricks: [
          { unitWeight: 20, count: 9 },
          { unitWeight: 10, count: 12 },
        ],
      })
      const direct = outOfBalanceAtBatten(ratio, battenSide, loadedArbor)
      const fromPlan = outOfBalanceAsRecorded(ratio, planned, [
        { unitWeight: 20, planned: 9, recorded: 9 },
        { unitWeight: 10, planned: 1, recorded: 12 },
      ])
      expect(fromPlan.toString()).toBe(direct.toString())
    }
    // Single purchase: 110 lb more on the arbor than planned leaves 7.31 - 110 = 102.69 lb arbor heavy.
    expect(outOfBalanceAsRecorded(1, '7.31', [{ unitWeight: 10, planned: 1, recorded: 12 }]).toString()).toBe('-102.69')
  })
})
