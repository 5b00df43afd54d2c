import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { Dec } from '../../../shared/units/index.js'
import { buildBattenModel, type Region } from '../../../shared/engine/batten-model.js'
import { sumsBefore, totalSums } from '../../../shared/engine/region-loads.js'
import { battenLoads, twoPlaces } from './arbitraries.js'

type D = ReturnType<typeof Dec>
const regions = (loads: Parameters<typeof buildBattenModel>[0]) => {
  const model = buildBattenModel(loads)
  return [model.startOverhang, ...model.spans, model.endOverhang]
}

/** Σ W·aᵏ and Σ w·(u2ᵏ − u1ᵏ), one load at a time, as the engine summed them before running sums. */
function directSums(region: Region, below?: D) {
  const points = [0, 1, 2, 3].map(() => Dec(0))
  for (const { u, weight } of region.points) {
    if (below && !u.lt(below)) continue
    for (let k = 0; k < 4; k++) points[k] = points[k]!.plus(weight.times(u.pow(k)))
  }
  // Below u, a spread contributes Σ Δw·tᵏ over its edges before u: +w at u1, −w at u2.
  const steps = [0, 1, 2, 3, 4].map(() => Dec(0))
  for (const { u1, u2, weightPerLength: w } of region.spreads) {
    for (const [t, rise] of [
      [u1, w],
      [u2, w.neg()],
    ] as const) {
      if (below ? !t.lt(below) : false) continue
      for (let k = 0; k < 5; k++) steps[k] = steps[k]!.plus(rise.times(t.pow(k)))
    }
  }
  return { points, steps }
}

const same = (a: D[], b: D[]) => expect(a.map(String)).toEqual(b.map(String))

describe('running sums of a region (each load placed once)', () => {
  it("when any batten is modelled, then each region's totals equal the sums taken load by load, exactly", () => {
    fc.assert(
      fc.property(battenLoads, (loads) => {
        for (const region of regions(loads)) {
          const direct = directSums(region)
          const { points, steps } = totalSums(region.sums)
          same(points, direct.points)
          // The intensity steps balance, so only the powers k ≥ 1 carry the spreads' integrals.
          same(steps.slice(1), direct.steps.slice(1))
        }
      }),
      { numRuns: 150 },
    )
  })

  it('when the sums before any position in a span are read, then they equal the loads before it summed one by one', () => {
    fc.assert(
      fc.property(battenLoads, fc.double({ min: 0, max: 1, noNaN: true }), (loads, fraction) => {
        const model = buildBattenModel(loads)
        for (const span of model.spans) {
          const u = Dec((span.length.toNumber() * fraction).toFixed(6))
          const direct = directSums(span, u)
          const { points, steps } = sumsBefore(span.sums, u)
          same(points, direct.points)
          same(steps.slice(1), direct.steps.slice(1))
        }
      }),
      { numRuns: 150 },
    )
  })

  it('when spreads cross lines, then the intensity entering each span is the spreads running through its left line', () => {
    const loads = {
      length: 30,
      pickPoints: [0, 10, 20, 30],
      points: [],
      spreads: [
        { from: 5, to: 25, weightPerLength: 2 },
        { from: 0, to: 30, weightPerLength: 1 },
      ],
    }
    const [first, middle, last] = buildBattenModel(loads).spans.map((span) =>
      sumsBefore(span.sums, Dec('0.000001')).steps[0]!.toString(),
    )
    expect([first, middle, last]).toEqual(['1', '3', '3'])
  })

  it('when the batten has a self weight and hardware, then the items total leaves both out', () => {
    fc.assert(
      fc.property(battenLoads, twoPlaces(0, 5), twoPlaces(0, 50), (loads, self, hardware) => {
        const plain = buildBattenModel(loads).itemsWeight
        const dressed = buildBattenModel({ ...loads, selfWeightPerLength: self, atEachLine: hardware }).itemsWeight
        expect(dressed.toString()).toBe(plain.toString())
      }),
      { numRuns: 50 },
    )
  })
})
