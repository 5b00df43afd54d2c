import * as z from 'zod'
import type { UnitSystem } from '../units/index.js'
import { PIPE_SIZE_KEYS } from '../engine/pipes.js'
import { ROPE_SIZE_KEYS } from '../engine/ropes.js'
import { checkCalculationInput } from './calculation-rules.js'
import { LINESET_KINDS, MAX_PICK_POINTS } from './lineset.js'
import { count, designFactor, figure } from './quantity.js'
import { COUNT_RANGES } from './ranges.js'
import { singleLineText } from './text.js'

export type { CalculationResult } from './calculation-result.js'

// The engine balances every kind a lineset may be.
export { LINESET_KINDS, type LinesetKind } from './lineset.js'

/** The most items one batten may carry in a single calculation. */
export const MAX_ITEMS = COUNT_RANGES.items.max
/** The most brick types one calculation may weigh. */
export const MAX_BRICK_TYPES = COUNT_RANGES.brickTypes.max

/** The input's fields with every figure held to its range in `units`, the units the input says it is in. */
function inputFields(units: UnitSystem) {
  const f = (name: Parameters<typeof figure>[0], label: string) => figure(name, units, label)
  const pipe = z.strictObject({
    momentOfInertia: f('momentOfInertia', 'Moment of inertia'),
    sectionModulus: f('sectionModulus', 'Section modulus'),
    elasticModulus: f('elasticModulus', 'Elastic modulus').optional(),
    yieldStrength: f('yieldStrength', 'Yield strength').optional(),
  })
  const batten = z.strictObject({
    length: f('battenLength', 'Batten length'),
    weightPerLength: f('pipeWeightPerLength', 'Batten weight per length').optional(),
    pickPoints: z
      .array(f('position', 'Pick point'), { error: 'Pick points must be a list of positions' })
      .min(1, 'At least one pick point (lift line) is required')
      .max(MAX_PICK_POINTS, `At most ${MAX_PICK_POINTS} pick points are supported`),
    pipeSize: z
      .enum(PIPE_SIZE_KEYS as [string, ...string[]], { error: `Pipe size must be one of ${PIPE_SIZE_KEYS.join(', ')}` })
      .optional(),
    pipe: pipe.optional(),
  })
  const item = z.strictObject({
    label: singleLineText('Label', 200).optional(),
    weight: f('itemWeight', 'Item weight').optional(),
    at: f('position', 'Item position').optional(),
    weightPerLength: f('itemWeightPerLength', 'Item weight per length').optional(),
    from: f('position', 'Start of the span').optional(),
    to: f('position', 'End of the span').optional(),
  })
  const brick = z.strictObject({
    name: singleLineText('Brick name', 80, { required: true }),
    weight: f('brickWeight', 'Brick weight'),
    thickness: f('brickThickness', 'Brick thickness'),
    available: count('bricks', 'Bricks available'),
  })
  return z.strictObject({
    units: z.literal(units),
    kind: z.enum(LINESET_KINDS, { error: `Kind must be one of ${LINESET_KINDS.join(', ')}` }),
    batten,
    items: z.array(item).max(MAX_ITEMS, `At most ${MAX_ITEMS} items can hang on one batten`).default([]),
    hardwareWeight: f('itemWeight', 'Hardware weight').optional(),
    arbor: z
      .strictObject({
        emptyWeight: f('arborEmptyWeight', 'Arbor empty weight'),
        capacity: f('arborCapacity', 'Arbor capacity'),
        stackLength: f('arborStackLength', 'Arbor stack length'),
        stackUsed: f('arborStackLength', 'Stack length already used').optional(),
      })
      .optional(),
    bricks: z.array(brick).max(MAX_BRICK_TYPES, `At most ${MAX_BRICK_TYPES} brick types`).optional(),
    pipeWeightAboard: f('pipeWeightAboard', 'Pipe weight aboard').optional(),
    liftLine: z
      .strictObject({
        weightPerLength: f('liftLineWeightPerLength', 'Lift line weight per length').optional(),
        breakingStrength: f('ratedLoad', 'Breaking strength').optional(),
        designFactor: designFactor('Design factor').optional(),
        // Each line's length from its head block, in pick point order: with a stiffness, the lines stretch.
        lengths: z
          .array(f('liftLineLength', 'Lift line length'), { error: 'Lift line lengths must be a list of lengths' })
          .max(MAX_PICK_POINTS, `At most ${MAX_PICK_POINTS} lift line lengths`)
          .optional(),
        axialStiffness: f('ropeAxialStiffness', 'Rope stiffness (EA)').optional(),
        rope: z
          .enum(ROPE_SIZE_KEYS as [string, ...string[]], { error: `Rope must be one of ${ROPE_SIZE_KEYS.join(', ')}` })
          .optional(),
      })
      .optional(),
    tolerance: f('tolerance', 'Tolerance').optional(),
    ratedLoad: f('ratedLoad', 'Rated load').optional(),
    travel: f('travel', 'Travel').optional(),
    trims: z.strictObject({ in: f('travel', 'In trim'), out: f('travel', 'Out trim') }).optional(),
    sandbag: z.strictObject({ weight: f('sandbagWeight', 'Sandbag weight') }).optional(),
    spotLine: z.strictObject({ blockRating: f('ratedLoad', 'Block rating') }).optional(),
    hoist: z
      .strictObject({
        ratedCapacity: f('ratedLoad', 'Hoist rated capacity'),
        counterweightAssist: f('itemWeight', 'Counterweight assist').optional(),
      })
      .optional(),
    ropeLockHolding: f('ropeLockHolding', 'Rope lock holding').optional(),
  })
}

const inUnits = (units: UnitSystem) => inputFields(units).superRefine(checkCalculationInput)

/**
 * The contract of the CLI and the API: one lineset and what hangs on it.
 * Lengths are measured from one end of the batten; figures are in the input's units, which set their ranges.
 *
 * @example
 * calculationInputSchema.safeParse({ units: 'imperial', kind: 'hemp-single',
 *   batten: { length: 4, weightPerLength: 1, pickPoints: [2] } }).success // true
 */
export const calculationInputSchema = z.discriminatedUnion('units', [inUnits('imperial'), inUnits('metric')], {
  error: (issue) => (issue.code === 'invalid_union' ? 'Units must be "imperial" or "metric"' : undefined),
})

/** A parsed calculation input, in either unit system. */
export type CalculationInput = Omit<z.infer<ReturnType<typeof inputFields>>, 'units'> & { units: UnitSystem }
