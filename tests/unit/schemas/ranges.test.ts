import { describe, expect, it } from 'vitest'
import { runCalculation } from '../../../shared/engine/calculate.js'
import { linesetInputSchemaFor } from '../../../shared/schemas/lineset.js'
import { count, figure, figureRange, formatBound, versionField } from '../../../shared/schemas/quantity.js'
import { FIGURE_RANGES, SMALLEST_STEP, type FigureName } from '../../../shared/schemas/ranges.js'
import { toSI } from '../../../shared/units/index.js'
import { heaviestCalculation } from '../../../scripts/lib/worst-calculations.js'

const NAMES = Object.keys(FIGURE_RANGES) as FigureName[]
const UNITS = ['imperial', 'metric'] as const
const messageOf = (schema: { safeParse(v: unknown): { error?: { issues: Array<{ message: string }> } } }, v: unknown) =>
  schema.safeParse(v).error?.issues[0]?.message

describe('figure ranges', () => {
  it('when a range is stated in either unit system, then it lies within the SI range and reads without exponents', () => {
    for (const name of NAMES)
      for (const units of UNITS) {
        const { min, max } = figureRange(name, units)
        const { quantity, min: siMin, max: siMax } = FIGURE_RANGES[name]
        expect(min, `${name} ${units}`).toBeLessThan(max)
        expect(toSI(max, quantity, units).lte(siMax), `${name} ${units}`).toBe(true)
        expect(toSI(min, quantity, units).gte(siMin), `${name} ${units}`).toBe(true)
        expect(`${formatBound(min)} ${formatBound(max)}`).not.toMatch(/e/i)
      }
  })

  it('when a figure sits on a bound it is accepted, and just past it is refused', () => {
    for (const name of NAMES)
      for (const units of UNITS) {
        const { min, max } = figureRange(name, units)
        const schema = figure(name, units, 'Figure')
        expect(schema.safeParse(min).success, `${name} ${units} min`).toBe(true)
        expect(schema.safeParse(max).success, `${name} ${units} max`).toBe(true)
        expect(schema.safeParse(max * 1.001).success, `${name} ${units} above`).toBe(false)
        expect(schema.safeParse(min === 0 ? -SMALLEST_STEP : min * 0.999).success, `${name} ${units} below`).toBe(false)
      }
  })

  it('when a figure is refused, then the message gives the range in the units it was typed in', () => {
    expect(messageOf(figure('battenLength', 'metric', 'Batten length'), 50)).toBe(
      'Batten length must be between 0.01 and 40 m',
    )
    // 40 m = 131.23 ft and 0.01 m = 0.0328 ft (NIST SP 811: 1 ft = 0.3048 m), rounded inward.
    expect(messageOf(figure('battenLength', 'imperial', 'Batten length'), 1e-7)).toBe(
      'Batten length must be between 0.0329 and 131 ft',
    )
    expect(messageOf(figure('itemWeight', 'imperial', 'Item weight'), 1e11)).toBe(
      'Item weight must be between 0 and 44,000 lb',
    )
  })

  it('when a non-zero figure would read back as 0 at six decimals, then it is refused; the smallest step is kept', () => {
    const weight = figure('itemWeight', 'imperial', 'Item weight')
    expect(messageOf(weight, 1e-7)).toBe(
      'Item weight must be 0 or at least 0.000001 lb; a smaller figure reads back as 0',
    )
    expect(weight.safeParse(0).success).toBe(true)
    expect(weight.safeParse(0.000001).success).toBe(true)
  })

  it('when a version is past what one more save could store, then it is refused (PostgreSQL integer: 2³¹ − 1)', () => {
    expect(versionField().safeParse(2147483646).success).toBe(true)
    expect(versionField().safeParse(2147483647).success).toBe(false)
    expect(versionField().safeParse(-1).success).toBe(false)
  })

  it('when a count is fractional or past its range, then the message says so', () => {
    expect(messageOf(count('bricks', 'Bricks owned'), 2.5)).toBe(
      'Bricks owned must be a whole number between 0 and 100,000',
    )
    expect(count('bricks', 'Bricks owned').safeParse(100000).success).toBe(true)
  })

  it('when a lineset is saved with a pipe of 2.5e9 lb/ft, then it is refused on that field', () => {
    const parsed = linesetInputSchemaFor('imperial').safeParse({
      number: 1,
      name: 'Border 1',
      kind: 'hemp-multi',
      status: 'in-service',
      battenLength: 40,
      pipeSize: 'custom',
      pipeWeightPerLength: 2.5e9,
      pickPoints: [0, 20, 40],
      unitSystem: 'imperial',
    })
    expect(parsed.error?.issues.map((issue) => issue.path.join('.'))).toEqual(['pipeWeightPerLength'])
  })

  it('when the heaviest accepted hang is worked out, then every figure and message reads in plain digits', () => {
    const outcome = runCalculation(heaviestCalculation('imperial'))
    if (!outcome.ok) throw new Error(JSON.stringify(outcome.error))
    const text = JSON.stringify(outcome.result)
    expect(text).not.toMatch(/\d[eE][+-]?\d/)
    expect(outcome.result.checks.map((c) => c.code)).toContain('arbor-over-capacity')
  })
})
