import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { Dec } from '../../../shared/units/index.js'
import { floatOf } from '../../../shared/engine/decimal-float.js'

const same = (value: ReturnType<typeof Dec>): void => {
  expect(Object.is(floatOf(value), value.toNumber())).toBe(true)
}

describe('floatOf (the float twin of a decimal, for the location searches)', () => {
  it('when a decimal is short, zero, negative, tiny or huge, then it gives exactly what toNumber gives', () => {
    for (const text of [
      '0',
      '-0',
      '12.34',
      '-12.34',
      '0.1',
      '0.3',
      '1e-20',
      '5e21',
      '123456.789',
      '9999999.9999999',
      '0.0000001',
      '1e22',
      '1e23',
      '-3.5e-7',
    ])
      same(Dec(text))
  })

  it('when a decimal comes from any input double, or from a difference of two, then it gives exactly what toNumber gives', () => {
    const double = fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e6, max: 1e6 })
    fc.assert(
      fc.property(double, double, (a, b) => {
        same(Dec(a))
        same(Dec(a).minus(b))
      }),
      { numRuns: 3000 },
    )
  })

  it('when positions have two decimal places, as a crew types them, then every difference converts exactly like toNumber', () => {
    const position = fc.integer({ min: 0, max: 100000 }).map((n) => n / 100)
    fc.assert(
      fc.property(position, position, (x, origin) => same(Dec(x).minus(origin))),
      { numRuns: 3000 },
    )
  })

  it('when a decimal has more digits than two words hold, then it still matches (through toNumber)', () => {
    same(Dec(2).div(3))
    same(Dec('2.72').times('0.45359237').div('0.3048'))
  })
})
