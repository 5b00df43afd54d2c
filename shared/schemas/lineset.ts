import { z } from 'zod'
import type { Quantity } from '../units/systems.js'
import type { CurrentHang } from './hang.js'
import {
  nonNegative,
  optionalNonNegative,
  optionalPositive,
  positive,
  requiredText,
  typedInField,
  versionField,
} from './quantity.js'

/** Every kind of lineset a house may have; each is balanced and checked differently. */
export const LINESET_KINDS = [
  'counterweight-single',
  'counterweight-double',
  'hemp-single',
  'hemp-multi',
  'spot-line',
  'motorized',
] as const
export type LinesetKind = (typeof LINESET_KINDS)[number]

/** Whether the set may be used: our own three words, not a balance state. */
export const LINESET_STATUSES = ['in-service', 'needs-inspection', 'out-of-service'] as const
export type LinesetStatus = (typeof LINESET_STATUSES)[number]

export const MAX_PICK_POINTS = 16

/** Whether a set is balanced by bricks on an arbor (single or double purchase). */
export const isCounterweightKind = (kind: LinesetKind) =>
  kind === 'counterweight-single' || kind === 'counterweight-double'

/** Whether a set is hauled by hand on rope (one line or several), and so may carry a sandbag. */
export const isHempKind = (kind: LinesetKind) => kind === 'hemp-single' || kind === 'hemp-multi'

/** Pipe choice: a key of the standard pipe table, or `custom` with figures entered by hand. */
const pipeSize = z.string({ error: 'Choose a pipe size' }).trim().min(1, 'Choose a pipe size').max(40)

const linesetFields = z.object({
  number: z.number({ error: 'Enter a number' }).int('Must be a whole number').min(1, 'Must be 1 or more').max(9999),
  name: requiredText(80),
  kind: z.enum(LINESET_KINDS, { error: 'Choose a kind of lineset' }),
  status: z.enum(LINESET_STATUSES, { error: 'Choose a status' }),
  distanceFromPlasterLine: optionalNonNegative(),
  battenLength: positive(),
  pipeSize,
  pipeWeightPerLength: nonNegative(),
  pipeMomentOfInertia: optionalPositive(),
  pipeSectionModulus: optionalPositive(),
  pickPoints: z
    .array(nonNegative(), { error: 'List the lift line positions' })
    .min(1, 'At least one lift line')
    .max(MAX_PICK_POINTS, `At most ${MAX_PICK_POINTS} lift lines`),
  liftLineWeightPerLength: optionalNonNegative(),
  liftLineBreakingStrength: optionalPositive(),
  arborEmptyWeight: optionalNonNegative(),
  arborCapacity: optionalPositive(),
  arborStackLength: optionalPositive(),
  ratedLoad: optionalPositive(),
  pipeWeight: optionalNonNegative(),
  travel: optionalPositive(),
  sandbagWeight: optionalNonNegative(),
  hoistRatedCapacity: optionalPositive(),
  hoistSpeed: optionalPositive(),
  notes: z.string().trim().max(2000, 'At most 2000 characters').optional(),
  unitSystem: typedInField(),
})

type LinesetFields = z.infer<typeof linesetFields>

const isFiniteNumber = (value: unknown): value is number => typeof value === 'number' && Number.isFinite(value)

/**
 * Rules between fields: positions along the batten, and what each kind must have. They run even while
 * other fields are wrong (see `whenObject`), so a form shows every problem at once; hence the type guards.
 */
function checkLineset(value: Partial<Record<keyof LinesetFields, unknown>>, ctx: z.RefinementCtx) {
  const pickPoints = Array.isArray(value.pickPoints) ? (value.pickPoints as unknown[]) : []
  const length = isFiniteNumber(value.battenLength) ? value.battenLength : undefined
  pickPoints.forEach((at, index) => {
    const previous = pickPoints[index - 1]
    if (!isFiniteNumber(at)) return
    if (length !== undefined && at > length)
      ctx.addIssue({ code: 'custom', path: ['pickPoints', index], message: 'Lies beyond the end of the batten' })
    else if (isFiniteNumber(previous) && at <= previous)
      ctx.addIssue({ code: 'custom', path: ['pickPoints', index], message: 'List positions in order, each once' })
  })
  const require = (field: keyof LinesetFields, message: string) => {
    if (value[field] === null || value[field] === undefined) ctx.addIssue({ code: 'custom', path: [field], message })
  }
  if (value.kind === 'counterweight-single' || value.kind === 'counterweight-double') {
    require('arborEmptyWeight', 'A counterweight set needs its arbor empty weight')
    require('arborCapacity', 'A counterweight set needs its arbor capacity')
  }
  if (value.kind === 'motorized') require('hoistRatedCapacity', 'A motorized set needs its hoist rated capacity')
  if (value.kind === 'hemp-single' && pickPoints.length !== 1)
    ctx.addIssue({ code: 'custom', path: ['pickPoints'], message: 'A single-line hemp set has exactly one line' })
}

// Run the rules between fields whenever the body is an object, not only once every field is valid.
const whenObject = {
  when: (payload: { value: unknown }) => typeof payload.value === 'object' && payload.value !== null,
}

/** The lineset form and the body of `POST /api/v1/linesets`, figures in the venue's units. */
export const linesetInputSchema = linesetFields.superRefine(checkLineset, whenObject)
export type LinesetInput = z.infer<typeof linesetInputSchema>

/** The body of `PUT /api/v1/linesets/:id`: the whole lineset plus the version it was read at. */
export const linesetUpdateSchema = linesetFields
  .extend({ version: versionField() })
  .superRefine(checkLineset, whenObject)
export type LinesetUpdate = z.infer<typeof linesetUpdateSchema>

/** A lineset as the API returns it; `unitSystem` is the one its figures are in (the venue's). */
export interface Lineset extends LinesetInput {
  id: string
  version: number
  updatedAt: string
}

/** A lineset in the list, with what hangs on it now (its latest saved revision), if anything. */
export interface LinesetListItem extends Lineset {
  currentHang: CurrentHang | null
}

/** Which quantity each figure of a lineset is entered and stored in (pick points are lengths too). */
export const LINESET_FIGURE_QUANTITIES = {
  distanceFromPlasterLine: 'length',
  battenLength: 'length',
  pipeWeightPerLength: 'weightPerLength',
  pipeMomentOfInertia: 'momentOfInertia',
  pipeSectionModulus: 'sectionModulus',
  liftLineWeightPerLength: 'weightPerLength',
  liftLineBreakingStrength: 'weight',
  arborEmptyWeight: 'weight',
  arborCapacity: 'weight',
  arborStackLength: 'shortLength',
  ratedLoad: 'weight',
  pipeWeight: 'weight',
  travel: 'length',
  sandbagWeight: 'weight',
  hoistRatedCapacity: 'weight',
  hoistSpeed: 'speed',
} as const satisfies Record<string, Quantity>
