import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { Dec } from '../../../shared/units/index.js'
import { buildBattenModel } from '../../../shared/engine/batten-model.js'
import { solveContinuousBeam } from '../../../shared/engine/continuous-beam.js'
import { balanceCounterweight } from '../../../shared/engine/counterweight.js'
import { battenLoads } from './arbitraries.js'
import type { FloatLoads } from './float-beam.js'

const solve = (loads: FloatLoads) => solveContinuousBeam(buildBattenModel(loads)).reactions

function totals(loads: FloatLoads) {
  let weight = Dec(0)
  let moment = Dec(0)
  for (const p of loads.points) {
    weight = weight.plus(p.weight)
    moment = moment.plus(Dec(p.weight).times(p.at))
  }
  for (const s of loads.spreads) {
    const w = Dec(s.weightPerLength).times(Dec(s.to).minus(s.from))
    weight = weight.plus(w)
    moment = moment.plus(w.times(Dec(s.from).plus(s.to)).div(2))
  }
  return { weight, moment }
}

const closeTo = (a: ReturnType<typeof Dec>, b: ReturnType<typeof Dec>) =>
  a.minus(b).abs().lte(Dec.max(1, b.abs()).times('1e-30'))

describe('batten line loads (property tests)', () => {
  it('when any batten is solved, then the line loads sum to the total load and balance its moment about any point', () => {
    fc.assert(
      fc.property(battenLoads, fc.integer({ min: -100, max: 100 }), (loads, pivot) => {
        const reactions = solve(loads)
        const { weight, moment } = totals(loads)
        const sum = reactions.reduce((s, r) => s.plus(r), Dec(0))
        const momentOfLines = reactions.reduce(
          (s, r, k) => s.plus(r.times(Dec(loads.pickPoints[k]!).minus(pivot))),
          Dec(0),
        )
        expect(closeTo(sum, weight)).toBe(true)
        expect(closeTo(momentOfLines, moment.minus(weight.times(pivot)))).toBe(true)
      }),
      { numRuns: 150 },
    )
  })

  it('when every load is scaled by k, then every line load scales by k', () => {
    fc.assert(
      fc.property(battenLoads, fc.integer({ min: 1, max: 9 }), (loads, k) => {
        const scaled = {
          ...loads,
          points: loads.points.map((p) => ({ ...p, weight: Dec(p.weight).times(k).toNumber() })),
          spreads: loads.spreads.map((s) => ({ ...s, weightPerLength: Dec(s.weightPerLength).times(k).toNumber() })),
        }
        const base = solve(loads)
        solve(scaled).forEach((r, i) => expect(closeTo(r, base[i]!.times(k))).toBe(true))
      }),
      { numRuns: 100 },
    )
  })

  it('when the batten is mirrored end for end, then the line loads come out mirrored', () => {
    fc.assert(
      fc.property(battenLoads, (loads) => {
        const L = loads.length
        const flip = (x: number) => Math.round((L - x) * 100) / 100
        const mirrored: FloatLoads = {
          length: L,
          pickPoints: loads.pickPoints.map(flip).reverse(),
          points: loads.points.map((p) => ({ ...p, at: flip(p.at) })),
          spreads: loads.spreads.map((s) => ({ ...s, from: flip(s.to), to: flip(s.from) })),
        }
        const base = solve(loads)
        solve(mirrored)
          .reverse()
          .forEach((r, i) => expect(closeTo(r, base[i]!)).toBe(true))
      }),
      { numRuns: 100 },
    )
  })
})

describe('counterweight (property tests)', () => {
  it('when the same batten side is double purchase, then the arbor needs twice the counterweight of single purchase (common practice)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 300000 }).map((n) => Dec(n).div(100)),
        fc.integer({ min: 0, max: 300 }),
        (battenSide, empty) => {
          const request = {
            units: 'imperial' as const,
            battenSide,
            arbor: { emptyWeight: 0, capacity: 1e6, stackLength: 1e6 },
            bricks: [],
            tolerance: 0,
          }
          const single = balanceCounterweight({ ...request, ratio: 1 })
          const double = balanceCounterweight({ ...request, ratio: 2 })
          expect(double.required.toString()).toBe(single.required.times(2).toString())
          const withEmpty = (ratio: 1 | 2) =>
            balanceCounterweight({ ...request, ratio, arbor: { ...request.arbor, emptyWeight: empty } }).required
          expect(withEmpty(2).plus(empty).toString()).toBe(withEmpty(1).plus(empty).times(2).toString())
        },
      ),
    )
  })
})
