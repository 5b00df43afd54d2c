import { describe, expect, it } from 'vitest'
import { analyseBatten } from '../../../shared/engine/batten-analysis.js'
import { battenInput } from './lineset-input.js'

const loads = (input: Parameters<typeof analyseBatten>[0]) => analyseBatten(input).lineLoads.map((l) => l.toNumber())
const uniform = (spans: number, L = 10, w = 1) =>
  battenInput({ length: spans * L, pickPoints: Array.from({ length: spans + 1 }, (_, k) => k * L), weightPerLength: w })

describe('continuous batten under uniform load (AISC Steel Construction Manual, beam diagrams and formulas)', () => {
  it('when two equal spans carry w, then the lines take 0.375wL, 1.25wL, 0.375wL and the peak moment is 0.125wL² over the middle line', () => {
    const analysis = analyseBatten(uniform(2))
    expect(analysis.lineLoads.map(String)).toEqual(['3.75', '12.5', '3.75'])
    expect(analysis.peak.value.toNumber()).toBeCloseTo(-12.5, 12)
    expect(analysis.peak.at.toNumber()).toBe(10)
  })

  it('when three equal spans carry w, then the ends take 0.4wL, the inner lines 1.1wL and the peak moment is 0.1wL²', () => {
    const analysis = analyseBatten(uniform(3))
    loads(uniform(3)).forEach((load, k) => expect(load).toBeCloseTo([4, 11, 11, 4][k]!, 12))
    expect(analysis.peak.value.abs().toNumber()).toBeCloseTo(10, 12)
  })

  it('when four equal spans carry w, then the lines take 11/28, 32/28, 26/28 wL and the peak moment is 3/28 wL²', () => {
    const expected = [11, 32, 26, 32, 11].map((n) => (n / 28) * 10)
    loads(uniform(4)).forEach((load, k) => expect(load).toBeCloseTo(expected[k]!, 12))
    expect(analyseBatten(uniform(4)).peak.value.abs().toNumber()).toBeCloseTo((3 / 28) * 100, 12)
  })

  it('when the loads are exact decimals on equal spans, then the two-span line loads are exact in decimal', () => {
    expect(analyseBatten(uniform(2, 10, 2.72)).lineLoads.map(String)).toEqual(['10.2', '34', '10.2'])
  })
})

describe('point loads and overhangs (AISC beam diagrams and formulas)', () => {
  it('when one of two equal spans carries P at its centre, then the lines take 13/32 P, 11/16 P and -3/32 P, so the far line goes slack', () => {
    const input = battenInput({ length: 20, pickPoints: [0, 10, 20], items: [{ weight: 320, at: 5 }] })
    expect(analyseBatten(input).lineLoads.map(String)).toEqual(['130', '220', '-30'])
  })

  it('when a simple beam overhangs one support by a under uniform w, then R1 = w/2L (L² - a²) and R2 = w/2L (L + a)²', () => {
    const [L, a, w] = [8, 2, 3]
    const input = battenInput({ length: L + a, pickPoints: [0, L], weightPerLength: w })
    const [r1, r2] = loads(input)
    expect(r1).toBeCloseTo((w / (2 * L)) * (L * L - a * a), 12)
    expect(r2).toBeCloseTo((w / (2 * L)) * (L + a) ** 2, 12)
  })

  it('when a simple span carries uniform w, then the midspan deflection is 5wL⁴/384EI', () => {
    // 1 lb/ft over 10 ft, E = 29,000 ksi, I = 1 in⁴: 5 · (1/12) · 120⁴ / (384 · 29e6) in
    const input = battenInput({ length: 10, pickPoints: [0, 10], weightPerLength: 1, extra: {} })
    const withPipe = { ...input, batten: { ...input.batten, pipe: { momentOfInertia: 1, sectionModulus: 1 } } }
    const span = analyseBatten(withPipe).deflection!.spans[0]!
    expect(span.max.toNumber()).toBeCloseTo((5 * (1 / 12) * 120 ** 4) / (384 * 29e6), 9)
    expect(span.at.toNumber()).toBeCloseTo(5, 5)
  })

  it('when a cantilever overhang carries P at its tip beyond a simple span, then the tip drops by the span rotation plus PL³/3EI', () => {
    // span L = 10 ft, overhang c = 2 ft, P = 100 lb at the tip; tip drop = P c² (L + c) / 3EI (AISC, beam overhanging one support, concentrated load at end of overhang)
    const base = battenInput({ length: 12, pickPoints: [0, 10], items: [{ weight: 100, at: 12 }] })
    const input = { ...base, batten: { ...base.batten, pipe: { momentOfInertia: 1, sectionModulus: 1 } } }
    const tip = analyseBatten(input).deflection!.overhangs[0]!
    const expected = (100 * 24 ** 2 * (120 + 24)) / (3 * 29e6)
    expect(tip.end).toBe('end')
    expect(tip.tip.toNumber()).toBeCloseTo(expected, 9)
  })

  it('when a batten hangs from one pick point with its load off centre, then the unbalanced moment is reported', () => {
    const input = battenInput({ length: 4, pickPoints: [2], items: [{ weight: 50, at: 3 }] })
    const analysis = analyseBatten(input)
    expect(analysis.lineLoads.map(String)).toEqual(['50'])
    expect(analysis.unbalancedMoment.toString()).toBe('50')
  })
})
