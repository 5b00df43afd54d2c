import * as z from 'zod'
import { UNIT_SYSTEMS } from '../units/index.js'
import { PIPE_SIZE_KEYS } from '../engine/pipes.js'
import { checkCalculationInput } from './calculation-rules.js'
import { LINESET_KINDS } from './lineset.js'

export type { CalculationResult } from './calculation-result.js'

// The engine balances every kind a lineset may be.
export { LINESET_KINDS, type LinesetKind } from './lineset.js'

/** The most items one batten may carry in a single calculation. */
export const MAX_ITEMS = 1000

function number(name: string) {
  return z.number({
    error: (issue) => (issue.input === undefined ? `${name} is required` : `${name} must be a finite number`),
  })
}
const atLeastZero = (name: string) => number(name).min(0, `${name} cannot be negative`)
const aboveZero = (name: string) => number(name).positive(`${name} must be more than zero`)

const pipeSchema = z.strictObject({
  momentOfInertia: aboveZero('Moment of inertia'),
  sectionModulus: aboveZero('Section modulus'),
  elasticModulus: aboveZero('Elastic modulus').optional(),
  yieldStrength: aboveZero('Yield strength').optional(),
})

const battenSchema = z.strictObject({
  length: aboveZero('Batten length'),
  weightPerLength: atLeastZero('Batten weight per length').optional(),
  pickPoints: z
    .array(atLeastZero('Pick point'), { error: 'Pick points must be a list of positions' })
    .min(1, 'At least one pick point (lift line) is required')
    .max(24, 'At most 24 pick points are supported'),
  pipeSize: z
    .enum(PIPE_SIZE_KEYS as [string, ...string[]], { error: `Pipe size must be one of ${PIPE_SIZE_KEYS.join(', ')}` })
    .optional(),
  pipe: pipeSchema.optional(),
})

const itemSchema = z.strictObject({
  label: z.string({ error: 'Label must be text' }).max(200, 'Label is too long (200 characters at most)').optional(),
  weight: atLeastZero('Item weight').optional(),
  at: atLeastZero('Item position').optional(),
  weightPerLength: atLeastZero('Item weight per length').optional(),
  from: atLeastZero('Start of the span').optional(),
  to: atLeastZero('End of the span').optional(),
})

const brickSchema = z.strictObject({
  name: z
    .string({ error: 'Brick name must be text' })
    .min(1, 'Brick name is required')
    .max(80, 'Brick name is too long'),
  weight: aboveZero('Brick weight'),
  thickness: aboveZero('Brick thickness'),
  available: atLeastZero('Bricks available').int('Bricks available must be a whole number'),
})

const baseSchema = z.strictObject({
  units: z.enum(UNIT_SYSTEMS, { error: 'Units must be "imperial" or "metric"' }),
  kind: z.enum(LINESET_KINDS, { error: `Kind must be one of ${LINESET_KINDS.join(', ')}` }),
  batten: battenSchema,
  items: z.array(itemSchema).max(MAX_ITEMS, `At most ${MAX_ITEMS} items can hang on one batten`).default([]),
  hardwareWeight: atLeastZero('Hardware weight').optional(),
  arbor: z
    .strictObject({
      emptyWeight: atLeastZero('Arbor empty weight'),
      capacity: aboveZero('Arbor capacity'),
      stackLength: aboveZero('Arbor stack length'),
      stackUsed: atLeastZero('Stack length already used').optional(),
    })
    .optional(),
  bricks: z.array(brickSchema).max(20, 'At most 20 brick types').optional(),
  pipeWeightAboard: atLeastZero('Pipe weight aboard').optional(),
  liftLine: z
    .strictObject({
      weightPerLength: atLeastZero('Lift line weight per length').optional(),
      breakingStrength: aboveZero('Breaking strength').optional(),
      designFactor: aboveZero('Design factor').optional(),
    })
    .optional(),
  tolerance: atLeastZero('Tolerance').optional(),
  ratedLoad: aboveZero('Rated load').optional(),
  travel: atLeastZero('Travel').optional(),
  trims: z.strictObject({ in: atLeastZero('In trim'), out: atLeastZero('Out trim') }).optional(),
  sandbag: z.strictObject({ weight: atLeastZero('Sandbag weight') }).optional(),
  spotLine: z.strictObject({ blockRating: aboveZero('Block rating') }).optional(),
  hoist: z
    .strictObject({
      ratedCapacity: aboveZero('Hoist rated capacity'),
      counterweightAssist: atLeastZero('Counterweight assist').optional(),
    })
    .optional(),
  ropeLockHolding: atLeastZero('Rope lock holding').optional(),
})

/**
 * The contract of the CLI and the API: one lineset and what hangs on it.
 * Lengths are measured from one end of the batten; figures are in the input's units.
 *
 * @example
 * calculationInputSchema.safeParse({ units: 'imperial', kind: 'hemp-single',
 *   batten: { length: 4, weightPerLength: 1, pickPoints: [2] } }).success // true
 */
export const calculationInputSchema = baseSchema.superRefine(checkCalculationInput)

export type CalculationInput = z.infer<typeof calculationInputSchema>
