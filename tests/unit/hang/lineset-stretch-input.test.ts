import { describe, expect, it } from 'vitest'
import { runCalculation } from '../../../shared/engine/calculate.js'
import { linesetCalculationInput } from '../../../shared/hang/lineset-calculation.js'
import type { Lineset } from '../../../shared/schemas/lineset.js'

// Invented test lineset in metric units: three lines on a 12 m batten, the head block beyond the 0 m end.
const lineset: Lineset = {
  id: '00000000-0000-4000-8000-000000000002',
  version: 0,
  updatedAt: '2026-01-01T00:00:00.000Z',
  number: 2,
  name: 'Stretch',
  kind: 'hemp-multi',
  status: 'in-service',
  battenLength: 12,
  pipeSize: 'nps-1-1/2-sch40',
  pipeWeightPerLength: 4.05,
  pickPoints: [1, 6, 11],
  liftLineLengths: [16, 21, 26],
  liftLineRope: '7x19-galvanized-3/16',
  liftLineAxialStiffness: null,
  unitSystem: 'metric',
}
const venue = { unitSystem: 'metric' as const, balanceTolerance: 5, ropeLockHolding: 23, wireRopeDesignFactor: 8 }
const items = [{ label: 'Border', weightPerLength: 6 }]

describe('linesetCalculationInput with lines that stretch', () => {
  it('when the lineset gives lengths and a rope, then the input carries them and the result has stretching loads', () => {
    const input = linesetCalculationInput({ lineset, venue, brickTypes: [], items })
    expect(input.liftLine).toMatchObject({ lengths: [16, 21, 26], rope: '7x19-galvanized-3/16' })
    const outcome = runCalculation(input)
    if (!outcome.ok) throw new Error(JSON.stringify(outcome.error))
    const elastic = outcome.result.elasticLines!
    expect(elastic.lineLoads.map((l) => l.at)).toEqual([1, 6, 11])
    // The 3/16 in rope table figure in kg: 168,750 lb x 0.45359237 = 76,543.7 kg (NIST SP 811), over 16 m.
    expect(elastic.stiffness[0]!.stiffness).toBeCloseTo((168750 * 0.45359237) / 16, 1)
    // Springs soften the middle line's hold; on a symmetric batten with a centred middle line the end loads stay
    // equal whatever the lengths (moment equilibrium alone fixes them once the middle one is known).
    expect(elastic.lineLoads[1]!.load).toBeLessThan(outcome.result.lineLoads[1]!.load)
    expect(elastic.lineLoads[0]!.load).toBeCloseTo(elastic.lineLoads[2]!.load, 6)
  })

  it('when the lengths no longer match the lines, then they are left out and the lines stay rigid', () => {
    const input = linesetCalculationInput({
      lineset: { ...lineset, liftLineLengths: [16, 21] },
      venue,
      brickTypes: [],
      items,
    })
    expect(input.liftLine?.lengths).toBeUndefined()
  })
})
