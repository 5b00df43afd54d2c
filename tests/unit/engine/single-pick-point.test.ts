import { describe, expect, it } from 'vitest'
import { runCalculation } from '../../../shared/engine/calculate.js'

const result = (raw: unknown) => {
  const outcome = runCalculation(raw)
  if (!outcome.ok) throw new Error(JSON.stringify(outcome.error))
  return outcome.result
}

describe('a batten on one pick point', () => {
  it('when all of it hangs on one side of the line, then the peak moment is that whole cantilever (simple statics)', () => {
    // 10 ft of 1-1/4 in Sch 40 (2.27 lb/ft, ASME B36.10M) picked at its far end, 200 lb at the near end:
    // moment at the line = 200 x 10 + 2.27 x 10 x 5 = 2,113.5 lb.ft (simple statics), hogging.
    const r = result({
      units: 'imperial',
      kind: 'spot-line',
      batten: { length: 10, pipeSize: 'nps-1-1/4-sch40', pickPoints: [10] },
      items: [{ weight: 200, at: 0 }],
    })
    expect(r.moment).toEqual({ max: -2113.5, at: 10 })
    expect(r.checks.map((c) => c.code)).toEqual(
      expect.arrayContaining(['single-pick-eccentric', 'batten-overstressed']),
    )
  })

  it('when the batten is mirrored, then the peak moment is the same (simple statics)', () => {
    const near = result({
      units: 'imperial',
      kind: 'spot-line',
      batten: { length: 10, weightPerLength: 2, pickPoints: [3] },
      items: [],
    })
    const far = result({
      units: 'imperial',
      kind: 'spot-line',
      batten: { length: 10, weightPerLength: 2, pickPoints: [7] },
      items: [],
    })
    // The longer side, 7 ft of 2 lb/ft: 2 x 7 x 3.5 = 49 lb.ft at the line.
    expect(near.moment.max).toBe(-49)
    expect(far.moment.max).toBe(-49)
  })
})
