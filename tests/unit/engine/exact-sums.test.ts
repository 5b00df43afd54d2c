import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { Dec } from '../../../shared/units/index.js'
import { exactRunningSums, scaledInteger } from '../../../shared/engine/exact-sums.js'
import { sumRegionLoads, sumsBefore, totalSums } from '../../../shared/engine/region-loads.js'

type D = ReturnType<typeof Dec>

/** The running sums of c·xᵏ in 40-digit decimals, operation for operation as the engine summed them before. */
function decimalRows(at: D[], coefficient: D[], columns: number): D[][] {
  const rows = [Array.from({ length: columns }, () => Dec(0))]
  at.forEach((x, i) => {
    let term = coefficient[i]!
    rows.push(
      rows[rows.length - 1]!.map((total, k) => {
        if (k > 0) term = term.times(x)
        return total.plus(term)
      }),
    )
  })
  return rows
}

/** Exactly the same decimals: equal values, and the same digits and sign when written out. */
const same = (a: D[], b: D[]) => {
  expect(a.map(String)).toEqual(b.map(String))
  a.forEach((x, k) => expect(x.eq(b[k]!) && x.s === b[k]!.s).toBe(true))
}

/** A figure with up to six decimal places, as a crew or a JSON file could give it. */
const sixPlaces = (min: number, max: number) =>
  fc
    .integer({ min: min * 1e6, max: max * 1e6 })
    .chain((n) =>
      fc.integer({ min: 0, max: 6 }).map((places) => Dec(String(Math.round(n / 10 ** (6 - places)) / 10 ** places))),
    )

const loads = (maxCoefficient: number, minCoefficient = 0) =>
  fc.array(fc.tuple(sixPlaces(0, 60), sixPlaces(minCoefficient, maxCoefficient)), { maxLength: 30 })

describe('exact running sums in scaled integers', () => {
  it('when point loads have up to six decimals, then every row equals the decimal sums exactly', () => {
    fc.assert(
      fc.property(loads(500), (pairs) => {
        const at = pairs.map(([x]) => x)
        const weight = pairs.map(([, w]) => w)
        const exact = exactRunningSums(at, weight, 4)
        // 500 × 60³ with 24 places stays far inside 40 digits: the integers always take these.
        expect(exact).toBeDefined()
        decimalRows(at, weight, 4).forEach((row, i) => same(exact!.row(i), row))
      }),
      { numRuns: 300 },
    )
  })

  it('when intensity steps rise and fall with up to six decimals, then the sums equal the decimal sums exactly, or fall back', () => {
    fc.assert(
      fc.property(loads(50, -50), (pairs) => {
        const at = pairs.map(([x]) => x)
        const rise = pairs.map(([, w]) => w)
        const exact = exactRunningSums(at, rise, 5)
        if (exact) decimalRows(at, rise, 5).forEach((row, i) => same(exact.row(i), row))
      }),
      { numRuns: 300 },
    )
  })

  it('when a figure has more than 30 places or a sum passes 40 digits, then the integers decline it', () => {
    const third = Dec(1).div(3)
    expect(scaledInteger(third)).toBeUndefined()
    expect(exactRunningSums([Dec(2)], [third], 4)).toBeUndefined()
    // 499.123457 × 59.1234567⁴ needs 44 digits: the decimal path rounds it, so the integers must not answer.
    const [x, c] = [Dec('59.1234567'), Dec('499.123457')]
    expect(exactRunningSums([x], [c], 5)).toBeUndefined()
    expect(decimalRows([x], [c], 5)[1]![4]!.eq(Dec(`${499123457n * 591234567n ** 4n}e-34`))).toBe(false)
    expect(scaledInteger(Dec('-12.500'))).toEqual({ units: -125n, scale: 1 })
    expect(scaledInteger(Dec('1e5'))).toEqual({ units: 100000n, scale: 0 })
  })

  it("when the integers decline a region's figures, then its sums are the decimal sums all the same", () => {
    const awkward = fc.oneof(
      sixPlaces(0, 500),
      fc.integer({ min: 1, max: 99 }).map((n) => Dec(n).div(7)),
    )
    fc.assert(
      fc.property(fc.array(fc.tuple(sixPlaces(0, 60), awkward), { minLength: 1, maxLength: 20 }), (pairs) => {
        const points = pairs.map(([u, weight]) => ({
          u,
          weight,
          float: { u: u.toNumber(), weight: weight.toNumber() },
        }))
        // Distinct, ascending step positions, some with seven places: fourth powers of those pass 40 digits.
        const stepAt = pairs.map((_, k) => (k % 2 ? Dec(k + 1).plus('0.0000001') : Dec(k + 1)))
        const steps = stepAt.map((at, k) => ({ at, float: at.toNumber(), w: pairs[k]![1], up: k % 3 !== 0 }))
        // A zero step changes nothing and is left out.
        const kept = steps.filter((step) => !step.w.isZero())
        const rises = kept.map((step) => (step.up ? step.w : step.w.neg()))
        const { sums, leaving } = sumRegionLoads(points, steps, Dec(0), Dec(61))
        const ordered = [...points].sort((a, b) => a.u.comparedTo(b.u))
        const rows = decimalRows(
          ordered.map((p) => p.u),
          ordered.map((p) => p.weight),
          4,
        )
        same(totalSums(sums).points, rows[rows.length - 1]!)
        same(sumsBefore(sums, Dec(30)).points, rows[ordered.filter((p) => p.u.lt(30)).length]!)
        const closing = rises.reduce((sum, r) => sum.plus(r), Dec(0))
        same([leaving], [closing])
        const allAt = kept.map((step) => step.at).concat(closing.isZero() ? [] : [Dec(61)])
        const allRises = closing.isZero() ? rises : [...rises, closing.neg()]
        expect(sums.stepAt.map(String)).toEqual(allAt.map(String))
        const stepRows = decimalRows(allAt, allRises, 5)
        stepRows.forEach((row, i) => same(sums.stepSums.row(i), row))
        if (pairs.some(([, w]) => !scaledInteger(w)))
          expect(
            exactRunningSums(
              ordered.map((p) => p.u),
              ordered.map((p) => p.weight),
              4,
            ),
          ).toBeUndefined()
      }),
      { numRuns: 200 },
    )
  })
})
