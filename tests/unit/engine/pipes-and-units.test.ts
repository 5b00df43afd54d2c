import { describe, expect, it } from 'vitest'
import { PIPE_SIZES, findPipeSize, pipeSection } from '../../../shared/engine/pipes.js'
import { bendingStress } from '../../../shared/engine/structural-units.js'
import { convert } from '../../../shared/units/index.js'

describe('pipe table (ASME B36.10M dimensions and weights)', () => {
  it('when the table is read, then it holds the published OD, nominal wall and weight per foot', () => {
    expect(PIPE_SIZES.map((p) => [p.key, p.outsideDiameter, p.wall, p.weightPerFoot])).toEqual([
      ['nps-1-1/4-sch40', 1.66, 0.14, 2.27],
      ['nps-1-1/4-sch80', 1.66, 0.191, 3.0],
      ['nps-1-1/2-sch40', 1.9, 0.145, 2.72],
      ['nps-1-1/2-sch80', 1.9, 0.2, 3.63],
    ])
  })

  it('when 1-1/2 Sch 40 is computed on the nominal wall, then I = 0.310 in⁴ and S = 0.326 in³', () => {
    const { outsideDiameter, wall } = findPipeSize('nps-1-1/2-sch40')!
    const section = pipeSection(outsideDiameter, wall)
    expect(section.momentOfInertia.toFixed(3)).toBe('0.310')
    expect(section.sectionModulus.toFixed(3)).toBe('0.326')
  })

  it('when a moment in lb·ft meets S in in³, then the stress is M·12/S in ksi', () => {
    expect(bendingStress(100, 0.326, 'imperial').toNumber()).toBeCloseTo(1200 / 0.326 / 1000, 12)
  })

  it('when units convert, then they use the exact NIST SP 811 factors', () => {
    expect(convert(1, 'weight', 'imperial', 'metric').toString()).toBe('0.45359237')
    expect(convert(1, 'length', 'imperial', 'metric').toString()).toBe('0.3048')
  })
})
