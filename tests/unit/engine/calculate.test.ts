import { describe, expect, it } from 'vitest'
import { calculate, runCalculation } from '../../../shared/engine/calculate.js'
import { BALANCE_CAUTIONS, FIGURES_DISCLAIMER } from '../../../shared/engine/cautions.js'
import { calculationInputSchema } from '../../../shared/schemas/calculation.js'
import { travelShift } from '../../../shared/engine/travel-shift.js'
import { workingLoadLimit } from '../../../shared/engine/capacity-checks.js'
import { SAMPLE_INPUT } from './lineset-input.js'

const run = (raw: unknown) => {
  const outcome = runCalculation(raw)
  if (!outcome.ok) throw new Error(JSON.stringify(outcome.error))
  return outcome.result
}
const codes = (raw: unknown) => run(raw).checks.map((c) => `${c.level}:${c.code}`)

describe('calculate', () => {
  it('when the sample lineset is balanced, then the totals, line loads and counterweight come out in pounds', () => {
    const result = run(SAMPLE_INPUT)
    expect(result).toMatchObject({
      units: 'imperial',
      battenWeight: 108.8,
      itemsWeight: 1100,
      totalLoad: 1208.8,
      notice: FIGURES_DISCLAIMER,
    })
    expect(result.lineLoads.map((l) => l.at)).toEqual([0, 10, 20, 30, 40])
    expect(result.lineLoads.reduce((s, l) => s + l.load, 0)).toBeCloseTo(1208.8, 1)
    expect(result.counterweight).toMatchObject({
      ratio: 1,
      required: 1118.8,
      loaded: 600,
      stackUsed: 60,
      outOfBalance: 518.8,
    })
    expect(codes(SAMPLE_INPUT)).toContain('danger:counterweight-short')
  })

  it('when a line carries more than breaking strength ÷ design factor, then a danger names the line, its load and the limit', () => {
    // MIL-DTL-83420 7x19 galvanized: 1/4 in 7,000 lb minimum breaking strength; 8:1 design factor (common practice)
    expect(workingLoadLimit(7000, 8).toString()).toBe('875')
    const heavy = { ...SAMPLE_INPUT, items: [{ weight: 1000, at: 20 }] }
    const message = run(heavy).checks.find((c) => c.code === 'line-over-limit')!.message
    expect(message).toMatch(
      /^Lift line at 20 ft carries 1,0\d\d(\.\d+)? lb, above its working load limit of 875 lb \(7,000 lb ÷ 8\)$/,
    )
  })

  it('when a load sits mid-span beside a far line, then that line goes slack and is flagged as a danger', () => {
    const input = {
      ...SAMPLE_INPUT,
      batten: { length: 20, weightPerLength: 0, pickPoints: [0, 10, 20] },
      items: [{ weight: 320, at: 5 }],
    }
    const result = run(input)
    expect(result.lineLoads.map((l) => l.load)).toEqual([130, 220, -30])
    expect(codes(input)).toContain('danger:line-slack')
  })

  it('when the set is double purchase, then the arbor needs twice the batten side and travels half as far', () => {
    const input = {
      ...SAMPLE_INPUT,
      kind: 'counterweight-double',
      arbor: { emptyWeight: 90, capacity: 5000, stackLength: 300 },
      bricks: [{ name: 'full', weight: 20, thickness: 2, available: 300 }],
      trims: { in: 4, out: 52 },
    }
    const result = run(input)
    expect(result.counterweight).toMatchObject({ ratio: 2, required: 2 * 1208.8 - 90, loaded: 2320, outOfBalance: 3.8 })
    // 1.5 · 5 lines · 0.11 lb/ft · 48 ft = 39.6 lb
    expect(result.travel).toMatchObject({ batten: 48, arbor: 24, shift: 39.6 })
  })

  it('when lift lines travel, then the shift is 2·n·w·d single and 1.5·n·w·d double purchase (derived, TRADE.md)', () => {
    expect(travelShift({ ratio: 1, lines: 5, lineWeightPerLength: 0.11, travel: 50 }).toString()).toBe('55')
    expect(travelShift({ ratio: 2, lines: 5, lineWeightPerLength: 0.11, travel: 50 }).toString()).toBe('41.25')
  })

  it('when a hemp set has a sandbag heavier than its load, then it is a danger and the haul force is negative', () => {
    const input = {
      units: 'imperial',
      kind: 'hemp-single',
      batten: { length: 2, weightPerLength: 1, pickPoints: [1] },
      sandbag: { weight: 10 },
    }
    expect(run(input).haul).toEqual({ load: 2, sandbag: 10, force: -8 })
    expect(codes(input)).toContain('danger:sandbag-heavier-than-load')
  })

  it('when one pick point carries an eccentric load, then it is a danger', () => {
    const input = {
      units: 'imperial',
      kind: 'spot-line',
      batten: { length: 4, weightPerLength: 0, pickPoints: [2] },
      items: [{ weight: 50, at: 3 }],
      spotLine: { blockRating: 40 },
    }
    expect(codes(input)).toEqual(expect.arrayContaining(['danger:single-pick-eccentric', 'danger:block-over-rating']))
  })

  it('when a motorized set is over the hoist capacity after counterweight assist, then it is a danger', () => {
    const input = {
      units: 'imperial',
      kind: 'motorized',
      batten: { length: 10, weightPerLength: 100, pickPoints: [0, 10] },
      hoist: { ratedCapacity: 200, counterweightAssist: 700 },
    }
    expect(run(input).motor).toEqual({ ratedCapacity: 200, load: 300, counterweightAssist: 700 })
    expect(codes(input)).toContain('danger:hoist-over-capacity')
  })

  it('when the input is metric, then kilograms and metres come back with MPa stress against 0.66 Fy', () => {
    const input = {
      units: 'metric',
      kind: 'hemp-multi',
      batten: { length: 12, pickPoints: [0, 6, 12], pipeSize: 'nps-1-1/2-sch40' },
      items: [{ weight: 50, at: 3 }],
    }
    const result = run(input)
    expect(result.unitLabels).toMatchObject({ weight: 'kg', length: 'm', shortLength: 'mm', stress: 'MPa' })
    // 2.72 lb/ft (ASME B36.10M) = 4.0477 kg/m (NIST SP 811 exact factors)
    expect(result.battenWeight).toBeCloseTo((12 * 2.72 * 0.45359237) / 0.3048, 2)
    // 0.66 × 35 ksi = 23.1 ksi = 159.27 MPa
    expect(result.bending!.allowable).toBeCloseTo(159.27, 2)
  })

  it('when a result is produced, then the cautions and disclaimer name the standards', () => {
    expect(BALANCE_CAUTIONS.length).toBeGreaterThan(5)
    expect(FIGURES_DISCLAIMER).toMatch(/ANSI E1\.4-1.*ANSI E1\.47.*ANSI E1\.6-1/)
    expect(calculate(calculationInputSchema.parse(SAMPLE_INPUT)).checks.length).toBeGreaterThan(0)
  })
})
