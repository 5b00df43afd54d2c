import { describe, expect, it } from 'vitest'
import { pipeOptions, CUSTOM_PIPE } from '../../src/composables/pipeOptions'

describe('pipeOptions', () => {
  it('when the venue is imperial, then 1-1/2 in Schedule 40 offers its table figures', () => {
    const pipe = pipeOptions('imperial').find((option) => option.value === 'nps-1-1/2-sch40')
    // ASME B36.10M: 2.72 lb/ft; I 0.310 in^4 and S 0.326 in^3 on the nominal wall.
    expect(pipe?.figures).toEqual({
      pipeWeightPerLength: 2.72,
      pipeMomentOfInertia: expect.closeTo(0.31, 3),
      pipeSectionModulus: expect.closeTo(0.326, 3),
    })
  })

  it('when the venue is metric, then the same pipe is offered in kg/m', () => {
    const pipe = pipeOptions('metric').find((option) => option.value === 'nps-1-1/2-sch40')
    // 2.72 lb/ft x 0.45359237 kg/lb / 0.3048 m/ft (NIST SP 811 factors).
    expect(pipe?.figures?.pipeWeightPerLength).toBeCloseTo(4.0478, 4)
  })

  it('when the list is built, then the last choice lets figures be typed by hand', () => {
    const last = pipeOptions('imperial').at(-1)
    expect(last).toEqual({ value: CUSTOM_PIPE, title: expect.any(String), figures: null })
  })
})
