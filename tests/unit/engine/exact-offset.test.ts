import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { Dec } from '../../../shared/units/index.js'
import { exactOffset, numberDigits } from '../../../shared/engine/exact-offset.js'
import { scaledDecimal } from '../../../shared/engine/scaled-decimal.js'
import { scaledInteger } from '../../../shared/engine/exact-sums.js'

type D = ReturnType<typeof Dec>

/** Exactly the same decimal: equal value, and the same digits and sign when written out. */
const same = (a: D, b: D) => {
  expect(a.toString()).toBe(b.toString())
  expect(a.eq(b) && a.s === b.s).toBe(true)
}

/** A position as a crew or a JSON file could give it: up to six places, or any double at all. */
const position = fc.oneof(
  fc.integer({ min: -1e8, max: 1e8 }).chain((n) => fc.integer({ min: 0, max: 6 }).map((places) => n / 10 ** places)),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
)

describe('numberDigits', () => {
  it('when a number is found as an integer and places, then they make the very decimal Dec reads from it', () => {
    fc.assert(
      fc.property(position, (x) => {
        const digits = numberDigits(x)
        if (digits) same(Dec(`${digits.units}e-${digits.scale}`), Dec(x))
      }),
      { numRuns: 5000 },
    )
  })

  it('when a figure is typed with a few places, then it is found (the fast path is the usual one)', () => {
    expect(numberDigits(12.35)).toEqual({ units: 1235, scale: 2 })
    expect(numberDigits(0.1)).toEqual({ units: 1, scale: 1 })
    expect(numberDigits(-0)).toBeUndefined()
    expect(numberDigits(1e-20)).toBeUndefined()
  })
})

describe('exactOffset', () => {
  it('when a position is offset from a line, then it equals the decimal subtraction exactly, either way', () => {
    fc.assert(
      fc.property(position, position, fc.boolean(), (x, origin, outward) => {
        const digits = numberDigits(origin)
        const offset = digits && exactOffset(x, digits, outward)
        if (offset) same(offset, outward ? Dec(origin).minus(Dec(x)) : Dec(x).minus(Dec(origin)))
      }),
      { numRuns: 5000 },
    )
  })
})

describe('scaledDecimal', () => {
  it('when an integer and a scale are read back, then the decimal is the one the string would parse to', () => {
    const units = fc.oneof(fc.integer(), fc.bigInt({ min: -(10n ** 40n) + 1n, max: 10n ** 40n - 1n }))
    fc.assert(
      fc.property(units, fc.integer({ min: 0, max: 150 }), (n, scale) => {
        same(scaledDecimal(n, scale), Dec(`${n}e-${scale}`))
      }),
      { numRuns: 5000 },
    )
  })

  it('when a nonzero decimal is split into integer and places and joined again, then it is unchanged', () => {
    // (The running sums never read a zero back this way: zero rows are one shared decimal.)
    fc.assert(
      fc.property(
        position.filter((x) => x !== 0),
        (x) => {
          const split = scaledInteger(Dec(x))
          if (split) same(scaledDecimal(split.units, split.scale), Dec(x))
        },
      ),
      { numRuns: 5000 },
    )
  })
})
