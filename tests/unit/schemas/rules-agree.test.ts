import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { fieldsFromIssues } from '../../../shared/errors/fields.js'
import { linesetCalculationInput } from '../../../shared/hang/lineset-calculation.js'
import { brickTypeInputSchemaFor } from '../../../shared/schemas/brick-type.js'
import { calculationInputSchema } from '../../../shared/schemas/calculation.js'
import { linesetInputSchemaFor, type Lineset, type LinesetKind } from '../../../shared/schemas/lineset.js'
import { venueSettingsSchema, type Venue } from '../../../shared/schemas/venue.js'
import type { UnitSystem } from '../../../shared/units/index.js'

// The lineset, brick type and venue rules and the calculation rules are built from one table of ranges; here they
// are shown to accept and refuse the same figures, the calculation input built from the stored records as the
// lineset page builds it (shared/hang/lineset-calculation.ts).

const baseLineset = (kind: LinesetKind, units: UnitSystem = 'imperial') => ({
  id: '00000000-0000-4000-8000-000000000001',
  version: 0,
  updatedAt: '2026-01-01T00:00:00.000Z',
  number: 1,
  name: 'Border 1',
  kind,
  status: 'in-service' as const,
  battenLength: 40,
  pipeSize: 'custom',
  pipeWeightPerLength: 2.72,
  // 1-1/2 in Schedule 40 (ASME B36.10M, nominal wall): 0.310 in⁴ and 0.326 in³, or 129,000 mm⁴ and 5,340 mm³.
  pipeMomentOfInertia: units === 'imperial' ? 0.31 : 129000,
  pipeSectionModulus: units === 'imperial' ? 0.326 : 5340,
  pickPoints: [0, 10, 20, 30, 40],
  liftLineWeightPerLength: 0.11,
  liftLineBreakingStrength: 7000,
  arborEmptyWeight: 90,
  arborCapacity: 2000,
  arborStackLength: 60,
  ratedLoad: 1000,
  pipeWeight: 110,
  travel: 50,
  sandbagWeight: 20,
  hoistRatedCapacity: 2000,
  unitSystem: units,
})
const baseVenue = (units: UnitSystem): Venue => ({
  id: '00000000-0000-4000-8000-000000000002',
  name: 'The Harbour Hall',
  unitSystem: units,
  balanceTolerance: 10,
  ropeLockHolding: 50,
  wireRopeDesignFactor: 8,
  version: 0,
})
const brickIn = (units: UnitSystem) => ({
  name: 'Full',
  material: 'Steel',
  unitWeight: 19.5,
  thickness: 2,
  quantityOwned: 400,
  unitSystem: units,
})

/** Each lineset figure and where the calculation input carries it, with a kind that carries it. */
const LINESET_TO_CALCULATION: ReadonlyArray<[string, string, LinesetKind]> = [
  ['battenLength', 'batten.length', 'counterweight-single'],
  ['pipeWeightPerLength', 'batten.weightPerLength', 'counterweight-single'],
  ['pickPoints.2', 'batten.pickPoints.2', 'counterweight-single'],
  ['pipeMomentOfInertia', 'batten.pipe.momentOfInertia', 'counterweight-single'],
  ['pipeSectionModulus', 'batten.pipe.sectionModulus', 'counterweight-single'],
  ['liftLineWeightPerLength', 'liftLine.weightPerLength', 'counterweight-single'],
  ['liftLineBreakingStrength', 'liftLine.breakingStrength', 'counterweight-single'],
  ['arborEmptyWeight', 'arbor.emptyWeight', 'counterweight-double'],
  ['arborCapacity', 'arbor.capacity', 'counterweight-single'],
  ['arborStackLength', 'arbor.stackLength', 'counterweight-single'],
  ['ratedLoad', 'ratedLoad', 'hemp-multi'],
  ['pipeWeight', 'pipeWeightAboard', 'counterweight-single'],
  ['travel', 'travel', 'spot-line'],
  ['sandbagWeight', 'sandbag.weight', 'hemp-multi'],
  ['hoistRatedCapacity', 'hoist.ratedCapacity', 'motorized'],
]

/** Figures at and past every kind of edge: bounds, the API's rounding step, absurd sizes, and anything between. */
const figureValues = fc.oneof(
  fc.constantFrom(0, -0.5, 1e-7, 1e-6, 0.01, 0.0329, 0.394, 1, 2.21, 4, 131, 393, 2000, 11000, 44000, 110000),
  fc.constantFrom(2.5e9, 1e11, 1e21, 1e-308, 19.1234567, Number.NaN, Number.POSITIVE_INFINITY),
  fc.double({ min: -10, max: 200000, noNaN: true }),
  fc.integer({ min: 0, max: 500 }).map((n) => n / 7),
)
const unitSystems = fc.constantFrom<UnitSystem>('imperial', 'metric')

function calculationFields(lineset: unknown, venue: unknown, brick: unknown): Record<string, string> | undefined {
  const input = linesetCalculationInput({
    lineset: lineset as Lineset,
    venue: venue as Venue,
    brickTypes: [brick as ReturnType<typeof brickIn>],
    items: [],
  })
  const parsed = calculationInputSchema.safeParse(input)
  return parsed.success ? undefined : fieldsFromIssues(parsed.error.issues)
}

const setAt = (record: Record<string, unknown>, path: string, value: number) => {
  const [field, index] = path.split('.') as [string, string | undefined]
  if (index === undefined) return { ...record, [field]: value }
  const list = [...(record[field] as number[])]
  list[Number(index)] = value
  return { ...record, [field]: list }
}

describe('the lineset rules and the calculation rules', () => {
  it('when the sample records are read, then every rule accepts them', () => {
    for (const units of ['imperial', 'metric'] as const) {
      expect(linesetInputSchemaFor(units).safeParse(baseLineset('counterweight-single', units)).success).toBe(true)
      expect(venueSettingsSchema.safeParse(baseVenue(units)).success).toBe(true)
      expect(brickTypeInputSchemaFor(units).safeParse(brickIn(units)).success).toBe(true)
      expect(
        calculationFields(baseLineset('counterweight-single', units), baseVenue(units), brickIn(units)),
      ).toBeUndefined()
    }
  })

  it('when any lineset figure takes any value, then the lineset and the calculation accept or refuse it alike', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...LINESET_TO_CALCULATION),
        figureValues,
        unitSystems,
        ([field, path, kind], value, units) => {
          const lineset = setAt(baseLineset(kind, units), field, value)
          const own = linesetInputSchemaFor(units).safeParse(lineset)
          const refusedHere = !own.success && field in fieldsFromIssues(own.error.issues)
          const refusedThere = path in (calculationFields(lineset, baseVenue(units), brickIn(units)) ?? {})
          expect(refusedThere, `${field} = ${value} (${units})`).toBe(refusedHere)
        },
      ),
      { numRuns: 600 },
    )
  })

  it('when the count of lift lines changes, then both hold the same limit', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 40 }), unitSystems, (lines, units) => {
        const pickPoints = Array.from({ length: lines }, (_, k) => k)
        const lineset = { ...baseLineset('hemp-multi', units), battenLength: 40, pickPoints }
        const own = linesetInputSchemaFor(units).safeParse(lineset)
        const there = calculationFields(lineset, baseVenue(units), brickIn(units))
        expect(own.success, `${lines} lines`).toBe(there === undefined)
      }),
    )
  })

  it('when a brick type or a venue policy takes any value, then the calculation that uses it agrees', () => {
    const pairs: ReadonlyArray<['brick' | 'venue', string, string]> = [
      ['brick', 'unitWeight', 'bricks.0.weight'],
      ['brick', 'thickness', 'bricks.0.thickness'],
      ['brick', 'quantityOwned', 'bricks.0.available'],
      ['venue', 'balanceTolerance', 'tolerance'],
      ['venue', 'ropeLockHolding', 'ropeLockHolding'],
      ['venue', 'wireRopeDesignFactor', 'liftLine.designFactor'],
    ]
    fc.assert(
      fc.property(fc.constantFrom(...pairs), figureValues, unitSystems, ([record, field, path], value, units) => {
        const brick = record === 'brick' ? { ...brickIn(units), [field]: value } : brickIn(units)
        const venue = record === 'venue' ? { ...baseVenue(units), [field]: value } : baseVenue(units)
        const own =
          record === 'brick' ? brickTypeInputSchemaFor(units).safeParse(brick) : venueSettingsSchema.safeParse(venue)
        const refusedHere = !own.success && field in fieldsFromIssues(own.error.issues)
        const refusedThere = path in (calculationFields(baseLineset('counterweight-single', units), venue, brick) ?? {})
        expect(refusedThere, `${field} = ${value} (${units})`).toBe(refusedHere)
      }),
      { numRuns: 400 },
    )
  })
})
