import { describe, expect, it } from 'vitest'
import { battenProfile } from '../../../shared/engine/batten-profile.js'
import { calculate } from '../../../shared/engine/calculate.js'
import { calculationInputSchema } from '../../../shared/schemas/calculation.js'
import { battenInput, SAMPLE_INPUT } from './lineset-input.js'

const withPipe = (input: ReturnType<typeof battenInput>) => ({
  ...input,
  batten: { ...input.batten, pipe: { momentOfInertia: 1, sectionModulus: 1 } },
})
const at = (profile: ReturnType<typeof battenProfile>, x: number) => profile.samples.find((s) => s.at === x)!

describe('the batten profile: moment and deflected shape sampled along the batten', () => {
  it('when a simple span of 10 ft carries 1 lb/ft, then mid-span shows wL²/8 and 5wL⁴/384EI (AISC beam diagrams, case 1)', () => {
    const profile = battenProfile(withPipe(battenInput({ length: 10, pickPoints: [0, 10], weightPerLength: 1 })))
    expect(at(profile, 5).moment).toBeCloseTo(12.5, 9)
    // 5 · (1/12 lb/in) · 120⁴ in⁴ / (384 · 29e6 lb/in² · 1 in⁴)
    expect(at(profile, 5).drop).toBeCloseTo((5 * (1 / 12) * 120 ** 4) / (384 * 29e6), 9)
    expect(at(profile, 0).drop).toBeCloseTo(0, 12)
    expect(profile.hasShape).toBe(true)
  })

  it('when two equal spans carry w, then the moment over the middle line is -wL²/8 and the shape is zero at every line (AISC, case 29)', () => {
    const profile = battenProfile(withPipe(battenInput({ length: 20, pickPoints: [0, 10, 20], weightPerLength: 1 })))
    expect(at(profile, 10).moment).toBeCloseTo(-12.5, 9)
    for (const line of [0, 10, 20]) expect(at(profile, line).drop).toBeCloseTo(0, 9)
  })

  it('when the sample lineset is profiled, then its largest moment and span drops agree with the engine', () => {
    const input = calculationInputSchema.parse({
      ...SAMPLE_INPUT,
      batten: { ...SAMPLE_INPUT.batten, pipeSize: 'nps-1-1/2-sch40' },
    })
    const result = calculate(input)
    const profile = battenProfile(input, 400)
    const peak = profile.samples.reduce((best, s) => (Math.abs(s.moment) > Math.abs(best.moment) ? s : best))
    expect(Math.abs(peak.moment)).toBeCloseTo(Math.abs(result.moment.max), 1)
    for (const span of result.deflection!.spans) {
      const inside = profile.samples.filter((s) => s.at >= span.from && s.at <= span.to)
      // the engine names each span's largest drop by size, up or down
      const largest = inside.reduce((best, s) => (Math.abs(s.drop!) > Math.abs(best) ? s.drop! : best), 0)
      // the engine states drops to two decimals
      expect(largest).toBeCloseTo(span.max, 2)
    }
  })

  it('when the batten hangs from one line, then the moment is drawn and no shape is claimed', () => {
    const profile = battenProfile(withPipe(battenInput({ length: 4, pickPoints: [2], items: [{ weight: 10, at: 1 }] })))
    expect(profile.hasShape).toBe(false)
    expect(at(profile, 2).moment).toBeCloseTo(-10, 9)
    expect(profile.samples.every((s) => s.drop === undefined)).toBe(true)
  })

  it('when positions are sampled, then they run from one end to the other in order and include every line and point load', () => {
    const profile = battenProfile(
      battenInput({ length: 13, pickPoints: [1.5, 7.25], items: [{ weight: 5, at: 3.3 }] }),
      10,
    )
    const places = profile.samples.map((s) => s.at)
    expect(places[0]).toBe(0)
    expect(places[places.length - 1]).toBe(13)
    expect([...places].sort((a, b) => a - b)).toEqual(places)
    for (const x of [1.5, 7.25, 3.3]) expect(places).toContain(x)
  })
})
