import { describe, expect, it } from 'vitest'
import { formatQuantity } from '../../../shared/engine/format.js'
import { DISPLAY_PLACES, displayNumber, displayQuantity } from '../../../shared/units/index.js'
import { formatFigure } from '../../../src/composables/figures.js'
import { Dec } from '../../../shared/units/decimal.js'

/** The rule as decimal.js (the library every figure is computed with) writes it: the reference for the text rounding. */
function byDecimalLibrary(value: number | string, places: number): string {
  const rounded = Dec(value).toDecimalPlaces(places, Dec.ROUND_HALF_UP)
  const [whole, fraction = ''] = rounded.abs().toFixed(places).split('.') as [string, string?]
  const tail = fraction.replace(/0+$/, '')
  return `${rounded.isNegative() && !rounded.isZero() ? '-' : ''}${whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',')}${tail ? `.${tail}` : ''}`
}

/** A small seeded generator, so a failure names a case that can be run again. */
function seeded(seed: number) {
  let state = seed >>> 0
  return () => {
    state = (Math.imul(state ^ (state >>> 15), 0x2c1b3c6d) + 0x6d2b79f5) >>> 0
    return state / 2 ** 32
  }
}

describe('one display-rounding rule', () => {
  it('when a weight is shown in a list, a result or an engine message, then it reads the same everywhere', () => {
    for (const value of [19.5, 1016.564, 0.005, 12000]) {
      const shown = displayQuantity(value, 'weight', 'imperial')
      expect(formatFigure(value, 'weight', 'imperial')).toBe(shown)
      expect(formatQuantity(value, 'weight', 'imperial')).toBe(shown)
    }
    expect(displayQuantity(19.5, 'weight', 'imperial')).toBe('19.5 lb')
    expect(displayQuantity(1016.564, 'weight', 'imperial')).toBe('1,016.56 lb')
  })

  it('when a figure is rounded for display, then it rounds half away from zero, groups thousands and drops trailing zeros', () => {
    expect(displayNumber(2.005, 2)).toBe('2.01')
    expect(displayNumber(-2.005, 2)).toBe('-2.01')
    expect(displayNumber(1234567.1, 2)).toBe('1,234,567.1')
    expect(displayNumber(40, 2)).toBe('40')
    expect(displayNumber(-0.001, 2)).toBe('0')
    expect(displayNumber(1e21, 2)).toBe('1,000,000,000,000,000,000,000')
  })

  it('when each quantity is shown, then its places come from the one table', () => {
    expect(displayQuantity(2.7183, 'weightPerLength', 'imperial')).toBe(
      `${displayNumber(2.7183, DISPLAY_PLACES.weightPerLength)} lb/ft`,
    )
    expect(formatFigure(null, 'length', 'metric')).toBe('—')
  })

  it('when figures of every size are shown, then the text rounding agrees with decimal.js on every one', () => {
    const random = seeded(20261204)
    const cases: Array<[number | string, number]> = []
    for (let k = 0; k < 20_000; k++) {
      const magnitude = 10 ** Math.floor(random() * 16 - 8)
      const sign = random() < 0.3 ? -1 : 1
      // Half the figures sit exactly on a tie at some place (x.xx5), the other half anywhere.
      const value =
        random() < 0.5
          ? sign * magnitude * random()
          : (sign * (Math.round(random() * 1e5) + 0.5)) / 10 ** Math.floor(random() * 5)
      cases.push([value, Math.floor(random() * 5)])
    }
    cases.push([0, 2], [-0, 2], [9.995, 2], [-9.995, 2], [999.9999, 3], [0.0049, 2], [0.005, 2], [0.5, 0], [-0.5, 0])
    cases.push(
      ['1.2345e+3', 2],
      ['-4.5e-3', 2],
      ['0.000', 2],
      ['12000', 0],
      ['99999.995', 2],
      ['1e25', 1],
      ['5e-324', 3],
    )
    for (const [value, places] of cases)
      expect(displayNumber(value, places), `${value} to ${places}`).toBe(byDecimalLibrary(value, places))
  })

  it('when a figure is a Decimal or beyond any venue, then it still reads, and text that is no figure is refused', () => {
    expect(displayNumber(Dec('1016.565'), 2)).toBe('1,016.57')
    expect(displayNumber(Dec('1e-9'), 2)).toBe('0')
    expect(displayNumber(Number.POSITIVE_INFINITY, 2)).toBe('Infinity')
    expect(() => displayNumber('twelve', 2)).toThrow(TypeError)
  })
})
