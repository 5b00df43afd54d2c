import { describe, expect, it } from 'vitest'
import { formatQuantity } from '../../../shared/engine/format.js'
import { DISPLAY_PLACES, displayNumber, displayQuantity } from '../../../shared/units/index.js'
import { formatFigure } from '../../../src/composables/figures.js'

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
})
