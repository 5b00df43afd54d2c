import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { battenLoads } from './arbitraries.js'
import { buildBattenModel } from '../../../shared/engine/batten-model.js'
import { solveContinuousBeam } from '../../../shared/engine/continuous-beam.js'
import { floatReactions, type FloatLoads } from './float-beam.js'

const decimalReactions = (loads: FloatLoads) =>
  solveContinuousBeam(buildBattenModel(loads)).reactions.map((r) => r.toNumber())

function expectAgree(loads: FloatLoads) {
  const exact = decimalReactions(loads)
  const float = floatReactions(loads)
  const scale = Math.max(1, ...float.map(Math.abs))
  exact.forEach((r, k) => expect(Math.abs(r - float[k]!) / scale).toBeLessThan(1e-9))
}

describe('cross-check against an independent floating-point solve (mathjs lusolve)', () => {
  it('when the AISC cases are solved both ways, then the line loads agree to 1e-9', () => {
    const uniform = (spans: number) => ({
      length: spans * 10,
      pickPoints: Array.from({ length: spans + 1 }, (_, k) => k * 10),
      points: [],
      spreads: [{ from: 0, to: spans * 10, weightPerLength: 1 }],
    })
    ;[2, 3, 4].forEach((spans) => expectAgree(uniform(spans)))
    expectAgree({ length: 20, pickPoints: [0, 10, 20], points: [{ at: 5, weight: 320 }], spreads: [] })
    expectAgree({ length: 10, pickPoints: [0, 8], points: [], spreads: [{ from: 0, to: 10, weightPerLength: 3 }] })
  })

  it('when any batten with overhangs, point and spread loads is solved both ways, then the line loads agree to 1e-9', () => {
    fc.assert(fc.property(battenLoads, expectAgree), { numRuns: 200 })
  })
})
