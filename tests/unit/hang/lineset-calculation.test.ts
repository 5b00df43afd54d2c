import { describe, expect, it } from 'vitest'
import { runCalculation } from '../../../shared/engine/calculate.js'
import { linesetCalculationInput } from '../../../shared/hang/lineset-calculation.js'
import type { Lineset } from '../../../shared/schemas/lineset.js'
import { calculationInputSchema } from '../../../shared/schemas/calculation.js'

// Invented test lineset in imperial units.
const lineset: Lineset = {
  id: '00000000-0000-4000-8000-000000000001',
  version: 0,
  updatedAt: '2026-01-01T00:00:00.000Z',
  number: 1,
  name: 'Test',
  kind: 'counterweight-single',
  status: 'in-service',
  distanceFromPlasterLine: 2,
  battenLength: 40,
  pipeSize: 'nps-1-1/2-sch40',
  pipeWeightPerLength: 2.72,
  pipeMomentOfInertia: null,
  pipeSectionModulus: null,
  pickPoints: [0, 20, 40],
  liftLineWeightPerLength: 0.11,
  liftLineBreakingStrength: 7000,
  arborEmptyWeight: 90,
  arborCapacity: 2000,
  arborStackLength: 60,
  ratedLoad: 1000,
  pipeWeight: 18.8,
  travel: 50,
  sandbagWeight: null,
  hoistRatedCapacity: null,
  hoistSpeed: null,
  notes: '',
  unitSystem: 'imperial',
}
const venue = { unitSystem: 'imperial' as const, balanceTolerance: 10, ropeLockHolding: 50, wireRopeDesignFactor: 8 }
const brickTypes = [{ name: 'Full', unitWeight: 20, thickness: 2, quantityOwned: 100 }]

describe('linesetCalculationInput', () => {
  it('when a counterweight lineset is mapped, then the engine accepts it and the pipe weight aboard balances the empty batten', () => {
    const input = linesetCalculationInput({ lineset, venue, brickTypes, items: [] })
    expect(calculationInputSchema.safeParse(input).success).toBe(true)
    const outcome = runCalculation(input)
    if (!outcome.ok) throw new Error(JSON.stringify(outcome.error))
    // Empty batten 40 ft x 2.72 lb/ft = 108.8 lb; arbor 90 + pipe weight 18.8 = 108.8 lb: nothing more to load.
    expect(outcome.result.counterweight).toMatchObject({ required: 0, loaded: 0, outOfBalance: 0 })
  })

  it('when a hemp set or a motorized set is mapped, then it carries its sandbag or hoist and no arbor', () => {
    const hemp = linesetCalculationInput({
      lineset: { ...lineset, kind: 'hemp-multi', sandbagWeight: 60 },
      venue,
      brickTypes,
      items: [],
    })
    expect(hemp).toMatchObject({ sandbag: { weight: 60 } })
    expect(hemp.arbor).toBeUndefined()
    const motor = linesetCalculationInput({
      lineset: { ...lineset, kind: 'motorized', hoistRatedCapacity: 2000 },
      venue,
      brickTypes,
      items: [],
    })
    expect(motor).toMatchObject({ hoist: { ratedCapacity: 2000 } })
    expect(runCalculation(motor).ok).toBe(true)
  })
})
