import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { Dec } from '../../../shared/units/index.js'
import { buildBattenModel } from '../../../shared/engine/batten-model.js'
import { solveContinuousBeam } from '../../../shared/engine/continuous-beam.js'
import { solveTensionOnly } from '../../../shared/engine/tension-only.js'
import { slackBattens } from './slack-arbitraries.js'
import { floatBeam, type FloatLoads } from './float-beam.js'

// Seeded: the same 200 battens on every run. Each property solves hundreds of battens in decimal, hence the
// longer time allowed (not a speed target: those live in `npm run bench`).
const SEED = 130013
const rigidOf = (loads: FloatLoads) => solveContinuousBeam(buildBattenModel(loads)).reactions
const tensionOf = (loads: FloatLoads) => solveTensionOnly(loads, rigidOf(loads))
const totalOf = (loads: FloatLoads) =>
  loads.points.reduce((s, p) => s + p.weight, 0) +
  loads.spreads.reduce((s, d) => s + d.weightPerLength * (d.to - d.from), 0)

/** The beam on the holding lines only, solved by mathjs (a general-purpose linear-algebra library). */
function heldByMathjs(loads: FloatLoads, held: number[]) {
  return floatBeam({ ...loads, pickPoints: held.map((k) => loads.pickPoints[k]!) })
}

function expectAgreesWithMathjs(loads: FloatLoads) {
  const tension = tensionOf(loads)
  if (!tension.stable) return
  const held = loads.pickPoints.flatMap((_, k) => (tension.slack.includes(k) ? [] : [k]))
  const check = heldByMathjs(loads, held).reactions
  const scale = Math.max(1, totalOf(loads))
  held.forEach((line, k) => expect(Math.abs(tension.loads[line]!.toNumber() - check[k]!) / scale).toBeLessThan(1e-9))
  tension.slack.forEach((line) => expect(tension.loads[line]!.isZero()).toBe(true))
}

// Issue 13 (filed with the project): the 49 ft batten and the two-span case.
const ISSUE_CASES: FloatLoads[] = [
  {
    length: 49,
    pickPoints: [2, 11, 20, 29, 38, 47],
    points: [{ at: 12, weight: 450 }],
    spreads: [{ from: 0, to: 49, weightPerLength: 2.72 }],
  },
  {
    length: 40,
    pickPoints: [0, 20, 40],
    points: [{ at: 10, weight: 500 }],
    spreads: [{ from: 0, to: 40, weightPerLength: 2.72 }],
  },
]

describe('tension-only loads against mathjs solving the beam with the released lines removed', () => {
  it('when the issue 13 cases are solved, then the loads agree to 1e-9', () => {
    ISSUE_CASES.forEach(expectAgreesWithMathjs)
    expect(tensionOf(ISSUE_CASES[0]!).slack).toEqual([0])
    expect(tensionOf(ISSUE_CASES[1]!).slack).toEqual([2])
  })

  it('when 200 random battens with slack lines are solved, then the loads agree to 1e-9', () => {
    fc.assert(fc.property(slackBattens, expectAgreesWithMathjs), { seed: SEED, numRuns: 200 })
  }, 60_000)
})

describe('tension-only loads (property tests)', () => {
  it('when any batten with a slack line hangs level, then no load is negative and the loads sum to the total', () => {
    fc.assert(
      fc.property(slackBattens, (loads) => {
        const tension = tensionOf(loads)
        tension.loads.forEach((load) => expect(load.gte(0)).toBe(true))
        const sum = tension.loads.reduce((s, l) => s.plus(l), Dec(0)).toNumber()
        expect(Math.abs(sum - totalOf(loads))).toBeLessThan(1e-9 * Math.max(1, totalOf(loads)))
      }),
      { seed: SEED, numRuns: 200 },
    )
  }, 60_000)

  it('when it hangs level, then the active set is consistent: every released line would push, every held line pulls, none sinks below its line', () => {
    fc.assert(
      fc.property(slackBattens, (loads) => {
        const tension = tensionOf(loads)
        fc.pre(tension.stable)
        const held = loads.pickPoints.flatMap((_, k) => (tension.slack.includes(k) ? [] : [k]))
        const beam = heldByMathjs(loads, held)
        const size = totalOf(loads) * loads.length ** 3
        beam.reactions.forEach((load) => expect(load).toBeGreaterThanOrEqual(-1e-9 * Math.max(1, totalOf(loads))))
        for (const line of tension.slack) {
          // The batten at a released line is at or above it ...
          expect(-beam.shape(loads.pickPoints[line]!)).toBeLessThanOrEqual(1e-9 * size)
          // ... and held there again alone, that line would have to push (or carry nothing).
          const again = heldByMathjs(
            loads,
            [...held, line].sort((a, b) => a - b),
          )
          const index = [...held, line].sort((a, b) => a - b).indexOf(line)
          expect(again.reactions[index]!).toBeLessThanOrEqual(1e-9 * Math.max(1, totalOf(loads)))
        }
      }),
      { seed: SEED, numRuns: 200 },
    )
  }, 60_000)

  it('when no line is slack, then the tension-only solve gives the rigid loads unchanged', () => {
    const uniform = {
      length: 40,
      pickPoints: [0, 10, 20, 30, 40],
      points: [],
      spreads: [{ from: 0, to: 40, weightPerLength: 3 }],
    }
    const rigid = rigidOf(uniform)
    const tension = solveTensionOnly(uniform, rigid)
    expect(tension.loads.map(String)).toEqual(rigid.map(String))
    expect(tension.slack).toEqual([])
    expect(tension.stable).toBe(true)
  })

  it('when a batten is mirrored end for end, then its tension-only loads are mirrored', () => {
    fc.assert(
      fc.property(slackBattens, (loads) => {
        const L = loads.length
        const mirrored: FloatLoads = {
          length: L,
          pickPoints: loads.pickPoints.map((x) => Math.round((L - x) * 100) / 100).reverse(),
          points: loads.points.map((p) => ({ at: Math.round((L - p.at) * 100) / 100, weight: p.weight })),
          spreads: loads.spreads.map((s) => ({
            ...s,
            from: Math.round((L - s.to) * 100) / 100,
            to: Math.round((L - s.from) * 100) / 100,
          })),
        }
        const there = tensionOf(loads)
        const back = tensionOf(mirrored)
        expect(back.stable).toBe(there.stable)
        const scale = Math.max(1, totalOf(loads))
        there.loads.forEach((load, k) =>
          expect(
            Math.abs(load.toNumber() - back.loads[loads.pickPoints.length - 1 - k]!.toNumber()) / scale,
          ).toBeLessThan(1e-9),
        )
      }),
      { seed: SEED, numRuns: 200 },
    )
  }, 60_000)
})
