import { z } from 'zod'
import type { Quantity, UnitSystem } from '../units/systems.js'
import type { CurrentHang } from './hang.js'
import type { Lockout } from './lockout.js'
import type { OperatingStatus } from './operating-status.js'
import { pickPointProblems, SINGLE_LINE_HEMP_RULE, wrongLineCount } from './batten-rules.js'
import { count, figure, optionalFigure, typedInField, versionField } from './quantity.js'
import { COUNT_RANGES } from './ranges.js'
import { multiLineText, singleLineText } from './text.js'
import { ROPE_SIZE_KEYS } from '../engine/ropes.js'

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

/** The most lift lines one lineset may have (the calculation holds the same limit). */
export const MAX_PICK_POINTS = COUNT_RANGES.pickPoints.max

export const isCounterweightKind = (kind: LinesetKind) =>
  kind === 'counterweight-single' || kind === 'counterweight-double'

/** Whether a set is hauled by hand on rope (one line or several), and so may carry a sandbag. */
export const isHempKind = (kind: LinesetKind) => kind === 'hemp-single' || kind === 'hemp-multi'

/** The lineset's fields with every figure held to its range in `units`, the venue's unit system. */
function linesetFields(units: UnitSystem) {
  const required = (name: Parameters<typeof figure>[0], label: string) => figure(name, units, label)
  const optional = (name: Parameters<typeof figure>[0], label: string) => optionalFigure(name, units, label)
  return z.object({
    number: count('linesetNumber', 'Lineset number'),
    name: singleLineText('Name', 80, { required: true }),
    kind: z.enum(LINESET_KINDS, { error: 'Choose a kind of lineset' }),
    status: z.enum(LINESET_STATUSES, { error: 'Choose a status' }),
    distanceFromPlasterLine: optional('distanceFromPlasterLine', 'Distance from the plaster line'),
    battenLength: required('battenLength', 'Batten length'),
    // A key of the standard pipe table, or `custom` with figures entered by hand.
    pipeSize: singleLineText('Pipe size', 40, { required: true, emptyMessage: 'Choose a pipe size' }),
    pipeWeightPerLength: required('pipeWeightPerLength', 'Pipe weight per length'),
    pipeMomentOfInertia: optional('momentOfInertia', 'Moment of inertia'),
    pipeSectionModulus: optional('sectionModulus', 'Section modulus'),
    pickPoints: z
      .array(required('position', 'Lift line position'), { error: 'List the lift line positions' })
      .min(1, 'At least one lift line')
      .max(MAX_PICK_POINTS, `At most ${MAX_PICK_POINTS} lift lines`),
    liftLineWeightPerLength: optional('liftLineWeightPerLength', 'Lift line weight per length'),
    liftLineBreakingStrength: optional('ratedLoad', 'Breaking strength'),
    // Each line's length from its head block, in lift line order; with a rope size or EA the lines stretch.
    liftLineLengths: z
      .array(required('liftLineLength', 'Lift line length'), { error: 'List the lift line lengths' })
      .max(MAX_PICK_POINTS, `At most ${MAX_PICK_POINTS} lift line lengths`)
      .nullable()
      .optional(),
    liftLineRope: z
      .enum(ROPE_SIZE_KEYS as [string, ...string[]], { error: 'Choose a rope from the table' })
      .nullable()
      .optional(),
    liftLineAxialStiffness: optional('ropeAxialStiffness', 'Rope stiffness (EA)'),
    arborEmptyWeight: optional('arborEmptyWeight', 'Arbor empty weight'),
    arborCapacity: optional('arborCapacity', 'Arbor capacity'),
    arborStackLength: optional('arborStackLength', 'Arbor stack length'),
    ratedLoad: optional('ratedLoad', 'Rated load'),
    pipeWeight: optional('pipeWeightAboard', 'Pipe weight'),
    travel: optional('travel', 'Travel'),
    sandbagWeight: optional('sandbagWeight', 'Sandbag weight'),
    hoistRatedCapacity: optional('ratedLoad', 'Hoist rated capacity'),
    hoistSpeed: optional('hoistSpeed', 'Hoist speed'),
    notes: multiLineText('Notes', 2000).optional(),
    // The units the figures were typed in; they set each figure's range, and a write whose units the venue
    // has left since is refused with 409.
    unitSystem: typedInField(),
  })
}

type LinesetFields = z.infer<ReturnType<typeof linesetFields>>

/**
 * Rules between fields: positions along the batten, and what each kind must have. They run even while
 * other fields are wrong (see `whenObject`), so a form shows every problem at once.
 */
function checkLineset(value: Partial<Record<keyof LinesetFields, unknown>>, ctx: z.RefinementCtx) {
  const pickPoints = Array.isArray(value.pickPoints) ? (value.pickPoints as unknown[]) : []
  for (const { index, message } of pickPointProblems(pickPoints, value.battenLength))
    ctx.addIssue({ code: 'custom', path: ['pickPoints', index], message })
  const require = (field: keyof LinesetFields, message: string) => {
    if (value[field] === null || value[field] === undefined) ctx.addIssue({ code: 'custom', path: [field], message })
  }
  if (value.kind === 'counterweight-single' || value.kind === 'counterweight-double') {
    require('arborEmptyWeight', 'A counterweight set needs its arbor empty weight')
    require('arborCapacity', 'A counterweight set needs its arbor capacity')
  }
  if (value.kind === 'motorized') require('hoistRatedCapacity', 'A motorized set needs its hoist rated capacity')
  if (Array.isArray(value.liftLineLengths) && value.liftLineLengths.length !== pickPoints.length)
    ctx.addIssue({
      code: 'custom',
      path: ['liftLineLengths'],
      message: 'Give one lift line length for each lift line, or none',
    })
  if (wrongLineCount(value.kind, pickPoints.length))
    ctx.addIssue({ code: 'custom', path: ['pickPoints'], message: SINGLE_LINE_HEMP_RULE })
}

// Run the rules between fields whenever the body is an object, not only once every field is valid.
const whenObject = {
  when: (payload: { value: unknown }) => typeof payload.value === 'object' && payload.value !== null,
}

const buildInput = (units: UnitSystem) => linesetFields(units).superRefine(checkLineset, whenObject)
const buildUpdate = (units: UnitSystem) =>
  linesetFields(units).extend({ version: versionField() }).superRefine(checkLineset, whenObject)
const inputSchemas = { imperial: buildInput('imperial'), metric: buildInput('metric') }
const updateSchemas = { imperial: buildUpdate('imperial'), metric: buildUpdate('metric') }

/**
 * The lineset form and the body of `POST /api/v1/linesets`, figures in the venue's units (which set their ranges).
 *
 * @example
 * linesetInputSchemaFor('metric').safeParse({ ...body, battenLength: 50 }).success // false: 0.01 to 40 m
 */
export const linesetInputSchemaFor = (units: UnitSystem) => inputSchemas[units]
export type LinesetInput = z.infer<ReturnType<typeof buildInput>>

/** The body of `PUT /api/v1/linesets/:id`: the whole lineset plus the version it was read at. */
export const linesetUpdateSchemaFor = (units: UnitSystem) => updateSchemas[units]
export type LinesetUpdate = z.infer<ReturnType<typeof buildUpdate>>

/** A lineset as the API returns it; `unitSystem` is the one its figures are in (the venue's). */
export interface Lineset extends LinesetInput {
  id: string
  version: number
  updatedAt: string
}

/** Whether a lineset may be operated now, and its lock-out if it has one (`GET /linesets` and `/linesets/:id`). */
export interface LinesetOperating {
  operatingStatus: OperatingStatus
  lockout: Lockout | null
}

/** A lineset as `GET /api/v1/linesets/:id` answers it. */
export interface LinesetDetail extends Lineset, LinesetOperating {}

/** A lineset in the list, with what hangs on it now (its latest saved revision), if anything. */
export interface LinesetListItem extends LinesetDetail {
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
  liftLineAxialStiffness: 'weight',
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
