import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { buildBattenModel } from '../../../shared/engine/batten-model.js'
import { solveContinuousBeam } from '../../../shared/engine/continuous-beam.js'
import { floatReactions, type FloatLoads } from './float-beam.js'

const decimalReactions = (loads: FloatLoads) => solveContinuousBeam(buildBattenModel(loads)).reactions.map((r) => r.toNumber())

function expectAgree(loads: FloatLoads) {
  const exact = decimalReactions(loads)
  const float = floatReactions(loads)
  const scale = Math.max(1, ...float.map(Math.abs))
  exact.forEach((r, k) => expect(Math.abs(r - float[k]!) / scale).toBeLessThan(1e-9))
}

const twoPlaces = (min: number, max: number) => fc.integer({ min: Math.round(min * 100), max: Math.round(max * 100) }).map((n) => n / 100)

/** A batten with 2 to 8 lines, overhangs, point loads and spread loads, on two-decimal positions. */
export const battenLoads: fc.Arbitrary<FloatLoads> = fc
  .tuple(twoPlaces(8, 60), fc.integer({ min: 2, max: 8 }), fc.double({ min: 0, max: 0.2, noNaN: true }), fc.double({ min: 0, max: 0.2, noNaN: true }))
  .chain(([length, lines, startFraction, endFraction]) => {
    const first = Math.round(length * startFraction * 100) / 100
    const last = Math.round(length * (1 - endFraction) * 100) / 100
    const pickPoints = Array.from({ length: lines }, (_, k) => Math.round((first + ((last - first) * k) / (lines - 1)) * 100) / 100)
    const position = twoPlaces(0, length).map((x) => Math.min(x, length))
    return fc.record({
      length: fc.constant(length),
      pickPoints: fc.constant([...new Set(pickPoints)]),
      points: fc.array(fc.record({ at: position, weight: twoPlaces(0, 500) }), { maxLength: 12 }),
      spreads: fc.array(
        fc.tuple(position, position, twoPlaces(0, 30)).filter(([a, b]) => a !== b).map(([a, b, w]) => ({ from: Math.min(a, b), to: Math.max(a, b), weightPerLength: w })),
        { maxLength: 4 },
      ),
    })
  })
  .filter((loads) => loads.pickPoints.length >= 2)

describe('cross-check against an independent floating-point solve (mathjs lusolve)', () => {
  it('when the AISC cases are solved both ways, then the line loads agree to 1e-9', () => {
    const uniform = (spans: number) => ({ length: spans * 10, pickPoints: Array.from({ length: spans + 1 }, (_, k) => k * 10), points: [], spreads: [{ from: 0, to: spans * 10, weightPerLength: 1 }] })
    ;[2, 3, 4].forEach((spans) => expectAgree(uniform(spans)))
    expectAgree({ length: 20, pickPoints: [0, 10, 20], points: [{ at: 5, weight: 320 }], spreads: [] })
    expectAgree({ length: 10, pickPoints: [0, 8], points: [], spreads: [{ from: 0, to: 10, weightPerLength: 3 }] })
  })

  it('when any batten with overhangs, point and spread loads is solved both ways, then the line loads agree to 1e-9', () => {
    fc.assert(fc.property(battenLoads, expectAgree), { numRuns: 200 })
  })
})
