import { describe, expect, it } from 'vitest'
import { runCalculation } from '../../../shared/engine/calculate.js'
import { SAMPLE_INPUT } from './lineset-input.js'

const run = (raw: unknown) => {
  const outcome = runCalculation(raw)
  if (!outcome.ok) throw new Error(JSON.stringify(outcome.error))
  return outcome.result
}
const loadsOf = (lines: Array<{ load: number }>) => lines.map((l) => l.load)

// Issue 13 (filed with the project): a 49 ft batten of 2.72 lb/ft on lines at 2, 11, 20, 29, 38 and 47 ft with
// 450 lb at 12 ft; rigid -3.08, 456.49, 73.55, 10.98, 30.01, 15.32 lb; line 1 slack: 449.50, 78.51, 9.66, 30.34, 15.27 lb.
const LONG_BATTEN = {
  ...SAMPLE_INPUT,
  batten: { length: 49, weightPerLength: 2.72, pickPoints: [2, 11, 20, 29, 38, 47] },
  items: [{ label: 'a heavy unit', weight: 450, at: 12 }],
}
// Issue 13: lines at 0, 20 and 40 ft, 500 lb at 10 ft on the same pipe; the middle line falls from 411.75 to
// 358.80 lb while the first rises from 223.53 to 250.00 lb.
const TWO_SPANS = {
  ...SAMPLE_INPUT,
  batten: { length: 40, weightPerLength: 2.72, pickPoints: [0, 20, 40] },
  items: [{ label: 'a heavy unit', weight: 500, at: 10 }],
}

describe('tension-only lift lines (check values from issue 13)', () => {
  it('when the 49 ft batten is solved, then the rigid loads stay as they were and line 1 goes slack with the issue figures', () => {
    const result = run(LONG_BATTEN)
    expect(loadsOf(result.lineLoads)).toEqual([-3.08, 456.49, 73.55, 10.98, 30.01, 15.32])
    expect(result.tensionOnly).toEqual({
      lineLoads: [2, 11, 20, 29, 38, 47].map((at, k) => ({ at, load: [0, 449.5, 78.51, 9.66, 30.34, 15.27][k] })),
      slackLines: [0],
      stable: true,
    })
  })

  it('when the two-span batten is solved, then the middle line carries 358.80 lb and the first 250.00 lb', () => {
    const result = run(TWO_SPANS)
    expect(loadsOf(result.lineLoads)).toEqual([223.53, 411.75, -26.48])
    expect(loadsOf(result.tensionOnly!.lineLoads)).toEqual([250, 358.8, 0])
    expect(result.tensionOnly!.slackLines).toEqual([2])
  })

  it('when a line goes slack, then the danger names it, what the others carry and which is closest to its limit', () => {
    const slack = run(LONG_BATTEN).checks.filter((c) => c.code === 'line-slack')
    expect(slack).toHaveLength(1)
    expect(slack[0]!.level).toBe('danger')
    expect(slack[0]!.message).toBe(
      'Lift line at 2 ft would have to push up 3.08 lb: it goes slack and the batten lifts there. ' +
        'The other lines then carry 449.5 lb at 11 ft, 78.51 lb at 20 ft, 9.66 lb at 29 ft, 30.34 lb at 38 ft and ' +
        '15.27 lb at 47 ft; the line at 11 ft is then closest to its limit (449.5 lb of 875 lb). Move load or add a line',
    )
  })

  it('when a line carries more once another goes slack, then its working load check uses that larger load', () => {
    // The first line: 223.53 lb rigid, 250 lb with the far line slack; a limit of 240 lb (1,920 lb ÷ 8) lies between.
    const input = { ...TWO_SPANS, liftLine: { breakingStrength: 1920, designFactor: 8 } }
    const over = run(input).checks.filter((c) => c.code === 'line-over-limit')
    expect(over.map((c) => c.message)).toEqual([
      'Lift line at 0 ft carries 250 lb once a line goes slack (223.53 lb as a rigid line), above its working load limit of 240 lb (1,920 lb ÷ 8)',
      'Lift line at 20 ft carries 411.75 lb, above its working load limit of 240 lb (1,920 lb ÷ 8)',
    ])
  })

  it('when no rigid line load is zero or below, then the result has no tension-only figures', () => {
    expect(run(SAMPLE_INPUT).tensionOnly).toBeUndefined()
  })

  it('when a line goes slack, then the peak moment is the tension-only one (the simple span 0-20 ft with its overhang)', () => {
    // 500 lb at mid-span of 20 ft with 2.72 lb/ft: PL/4 + wL²/8 less half the overhang moment wc²/2 at 10 ft
    // (simple beam with overhang, AISC beam diagrams): 2,500 + 136 - 272 = 2,364 lb·ft.
    expect(run(TWO_SPANS).moment).toEqual({ max: 2364, at: 10 })
  })
})

describe('a batten that would tip (issue 13, §2)', () => {
  it('when the centre of load lies beyond the end lines, then batten-tips is a danger and no counterweight plan is given', () => {
    // Lines at 0 and 10 ft under a 40 ft batten of 2.72 lb/ft: its own weight centres at 20 ft.
    const input = { ...SAMPLE_INPUT, batten: { length: 40, weightPerLength: 2.72, pickPoints: [0, 10] }, items: [] }
    const result = run(input)
    expect(result.tensionOnly).toMatchObject({ slackLines: [0], stable: false })
    expect(loadsOf(result.tensionOnly!.lineLoads)).toEqual([0, 108.8])
    const tips = result.checks.find((c) => c.code === 'batten-tips')!
    expect(tips.level).toBe('danger')
    expect(tips.message).toBe(
      'The batten cannot hang level: the centre of its load, at 20 ft, lies beyond the end line at 10 ft, so it tips. ' +
        'No brick plan is offered; move the load between the lines or add a line',
    )
    expect(result.counterweight).toBeUndefined()
    expect(result.checks.map((c) => c.code)).not.toContain('brick-plan')
  })

  it('when only one line would hold once the pushing lines go slack, then the batten tips about it', () => {
    // A weightless 20 ft batten on lines at 0, 10 and 20 ft with its one load of 100 lb hanging at the last line.
    const result = run({
      ...SAMPLE_INPUT,
      batten: { length: 20, weightPerLength: 0, pickPoints: [0, 10, 20] },
      items: [{ weight: 100, at: 20 }],
    })
    expect(result.tensionOnly).toMatchObject({ slackLines: [0, 1], stable: false })
    expect(result.checks.find((c) => c.code === 'batten-tips')!.message).toMatch(
      /^The batten cannot hang level: once the lines that would push go slack, fewer than two lines hold it \(the centre of its load is at 20 ft\), so it tips/,
    )
  })
})
