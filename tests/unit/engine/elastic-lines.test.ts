import { describe, expect, it } from 'vitest'
import { Dec } from '../../../shared/units/index.js'
import { runCalculation } from '../../../shared/engine/calculate.js'
import { solveElasticSupports } from '../../../shared/engine/elastic-supports.js'
import { ROPE_STIFFNESS_BASIS } from '../../../shared/engine/ropes.js'
import { SAMPLE_INPUT } from './lineset-input.js'

const decimals = (values: number[]) => values.map((v) => Dec(v))
const run = (raw: unknown) => {
  const outcome = runCalculation(raw)
  if (!outcome.ok) throw new Error(JSON.stringify(outcome.error))
  return outcome.result
}
const sum = (values: Array<{ toNumber(): number }>) => values.reduce((total, v) => total + v.toNumber(), 0)

describe('the batten on lift lines that stretch (solver)', () => {
  it('when two equal spans hang on three equal springs under a uniform load, then the loads match the hand derivation', () => {
    // Derived by hand: two spans L under w per length on springs k. By symmetry the ends sink R_e/k and the middle
    // R_m/k, so the middle sinks (R_m - R_e)/k relative to the ends. The beam over 2L is simply supported at the ends
    // with w down and R_m up at its centre; its centre deflection is 5w(2L)^4/(384EI) - R_m(2L)^3/(48EI). With
    // R_e = wL - R_m/2 this gives R_m = (5wL^4/(24EI) + wL/k) / (L^3/(6EI) + 1.5/k).
    // w = 1, L = 10, EI = 1000, k = 1: R_m = (2.0833... + 10) / (0.1666... + 1.5) = 7.25 and R_e = 10 - 3.625 = 6.375.
    const loads = solveElasticSupports(
      decimals([0, 10, 20]),
      decimals([3.75, 12.5, 3.75]),
      decimals([1, 1, 1]),
      Dec(1000),
    )
    expect(loads.map((l) => l.toDecimalPlaces(12).toNumber())).toEqual([6.375, 7.25, 6.375])
  })

  it('when the springs grow a million times stiffer, then the loads tend to the rigid ones', () => {
    const rigid = decimals([3.75, 12.5, 3.75])
    const gaps = [1e3, 1e6, 1e9].map((k) => {
      const loads = solveElasticSupports(decimals([0, 10, 20]), rigid, decimals([k, k, k]), Dec(1000))
      return Math.max(...loads.map((load, i) => load.minus(rigid[i]!).abs().toNumber()))
    })
    expect(gaps[1]!).toBeLessThan(gaps[0]! / 100)
    expect(gaps[2]!).toBeLessThan(1e-5)
  })

  it('when a whole batten is solved with very stiff lines, then its elastic loads agree with the rigid loads', () => {
    const result = run({
      ...SAMPLE_INPUT,
      batten: { ...SAMPLE_INPUT.batten, pipeSize: 'nps-1-1/2-sch40' },
      liftLine: { lengths: [50, 55, 60, 65, 70], axialStiffness: 2e8 },
    })
    const rigid = result.lineLoads.map((l) => l.load)
    result.elasticLines!.lineLoads.forEach((line, k) => expect(Math.abs(line.load - rigid[k]!)).toBeLessThan(0.05))
  })
})

const EVEN = {
  ...SAMPLE_INPUT,
  batten: { length: 40, weightPerLength: 2.72, pickPoints: [0, 10, 20, 30, 40], pipeSize: 'nps-1-1/2-sch40' },
  items: [{ label: 'a drape', weightPerLength: 25, from: 0, to: 40 }],
}

describe('the loads with stretching lines in a calculation', () => {
  it('when the lines are equally long, then symmetric input gives symmetric loads that sum to the total', () => {
    const result = run({ ...EVEN, liftLine: { lengths: [60, 60, 60, 60, 60], rope: '7x19-galvanized-1/8' } })
    const loads = result.elasticLines!.lineLoads.map((l) => l.load)
    expect(loads[0]).toBeCloseTo(loads[4]!, 6)
    expect(loads[1]).toBeCloseTo(loads[3]!, 6)
    expect(loads.reduce((a, b) => a + b, 0)).toBeCloseTo(result.totalLoad, 1)
    expect(result.elasticLines!.basis).toBe(ROPE_STIFFNESS_BASIS)
  })

  it('when the lines run longer toward one end, then the short half takes more than the long half, and the sum and centre hold', () => {
    const result = run({ ...EVEN, liftLine: { lengths: [40, 50, 60, 70, 80], rope: '7x19-galvanized-1/8' } })
    const loads = result.elasticLines!.lineLoads.map((l) => l.load)
    const rigid = result.lineLoads.map((l) => l.load)
    expect(rigid[0]! + rigid[1]!).toBeCloseTo(rigid[3]! + rigid[4]!, 6)
    expect(loads[0]! + loads[1]!).toBeGreaterThan(loads[3]! + loads[4]! + 1)
    const total = loads.reduce((a, b) => a + b, 0)
    expect(total).toBeCloseTo(result.totalLoad, 1)
    // The springs move load between lines, never the load's centre (20 ft on this even batten).
    expect(loads.reduce((moment, load, k) => moment + load * 10 * k, 0) / total).toBeCloseTo(20, 2)
  })

  it('when the solver sums its loads exactly, then they equal the rigid total to the decimal', () => {
    const loads = solveElasticSupports(
      decimals([0, 7, 15, 30]),
      decimals([10, 40, -5, 20]),
      decimals([3, 5, 2, 9]),
      Dec(800),
    )
    expect(sum(loads)).toBeCloseTo(65, 9)
  })

  it('when a line differs from its rigid figure by more than 10 %, then a caution names it and the stiffness basis', () => {
    // Soft springs (a rope of EA 1,000 lb on long lines) against the pipe: the loads even out.
    const result = run({ ...EVEN, liftLine: { lengths: [100, 100, 100, 100, 100], axialStiffness: 1000 } })
    const caution = result.checks.find((c) => c.code === 'line-stretch-shifts-load')
    expect(caution?.level).toBe('caution')
    expect(caution?.message).toContain('the line at 10 ft carries')
    expect(caution?.message).toContain('rope stiffness (EA) as entered')
    expect(result.elasticLines!.largestDifference).toBeGreaterThan(10)
  })

  it("when only the stretching figure passes a line's limit, then a danger names that line and that figure", () => {
    // Limit 1,200 / 8 = 150 lb: the end line at 0 ft carries 108.9 lb as a rigid line, about 207 lb with soft lines.
    const liftLine = {
      lengths: [100, 100, 100, 100, 100],
      axialStiffness: 1000,
      breakingStrength: 1200,
      designFactor: 8,
    }
    const result = run({ ...EVEN, liftLine })
    const over = result.checks.filter((c) => c.code === 'line-over-limit').map((c) => c.message)
    expect(over).toContain(
      `Lift line at 0 ft carries ${result.elasticLines!.lineLoads[0]!.load} lb with the lines stretching, above its working load limit of 150 lb`,
    )
    expect(over.filter((m) => m.startsWith('Lift line at 10 ft'))).toHaveLength(1)
  })

  it('when a line is slack, then the stretching lines are solved on the lines that hold and the slack one stays at 0', () => {
    const result = run({
      ...SAMPLE_INPUT,
      batten: { length: 40, weightPerLength: 2.72, pickPoints: [0, 20, 40], pipeSize: 'nps-1-1/2-sch40' },
      items: [{ label: 'a heavy unit', weight: 500, at: 10 }],
      liftLine: { lengths: [60, 70, 80], rope: '7x19-galvanized-1/4' },
    })
    expect(result.tensionOnly?.slackLines).toEqual([2])
    const loads = result.elasticLines!.lineLoads.map((l) => l.load)
    expect(loads[2]).toBe(0)
    expect(loads[0]! + loads[1]!).toBeCloseTo(result.totalLoad, 1)
  })

  it('when lengths are given but the pipe is unknown, then no elastic loads and a note says why', () => {
    const result = run({ ...SAMPLE_INPUT, liftLine: { lengths: [50, 55, 60, 65, 70], rope: '7x19-galvanized-1/4' } })
    expect(result.elasticLines).toBeUndefined()
    expect(result.checks.find((c) => c.code === 'line-stretch-not-worked-out')?.message).toContain("batten's stiffness")
  })

  it('when the lengths do not match the pick points, then the input is refused on that field', () => {
    const outcome = runCalculation({ ...EVEN, liftLine: { lengths: [60, 60], rope: '7x19-galvanized-1/4' } })
    expect(outcome.ok).toBe(false)
    if (!outcome.ok) expect(JSON.stringify(outcome.error)).toContain('liftLine.lengths')
  })
})
