import { describe, expect, it } from 'vitest'
import { travelBalance } from '../../../shared/engine/travel-balance.js'
import { calculate } from '../../../shared/engine/calculate.js'
import { calculationInputSchema } from '../../../shared/schemas/calculation.js'
import { SAMPLE_INPUT } from './lineset-input.js'

const counterweight = { outOfBalance: 4 } as never

describe('balance across travel', () => {
  it('when the shift is 12 lb over 48 ft, then the out of balance falls in a straight line from the in trim to the out trim', () => {
    const points = travelBalance({}, { counterweight, travel: { batten: 48, shift: 12 } }, 2)!
    expect(points.map((p) => p.travelled)).toEqual([0, 24, 48])
    expect(points.map((p) => p.outOfBalance)).toEqual([4, -2, -8])
    expect(points[0]!.height).toBeUndefined()
  })

  it('when trims are given, then each point carries the batten height between them', () => {
    const points = travelBalance(
      { trims: { in: 4, out: 52 } },
      { counterweight, travel: { batten: 48, shift: 12 } },
      4,
    )!
    expect(points.map((p) => p.height)).toEqual([4, 16, 28, 40, 52])
  })

  it('when the lift lines weigh nothing known or there is no counterweight, then there is nothing to draw', () => {
    expect(travelBalance({}, { counterweight, travel: { batten: 48 } })).toBeUndefined()
    expect(travelBalance({}, { travel: { batten: 48, shift: 3 } })).toBeUndefined()
  })

  it('when the sample lineset travels 48 ft, then the out trim differs from the in trim by the engine own shift', () => {
    const result = calculate(calculationInputSchema.parse({ ...SAMPLE_INPUT, travel: 48 }))
    const points = travelBalance({}, result)!
    expect(points[0]!.outOfBalance).toBe(result.counterweight!.outOfBalance)
    // 2 n w d single purchase: 2 · 5 · 0.11 · 48 = 52.8 (the engine's travel-shift rule)
    expect(points[0]!.outOfBalance - points[points.length - 1]!.outOfBalance).toBeCloseTo(52.8, 9)
  })
})
