import { z } from 'zod'
import type { HangEntry } from '../hang/hang-items.js'
import type { UnitSystem } from '../units/systems.js'
import { itemCategoryField } from './item-type.js'
import { count, figure } from './quantity.js'
import { singleLineText } from './text.js'

/** The most pick points a piece of scenery may hang from. */
export const MAX_OWN_PICK_POINTS = 24
// Fabric is sold from light scrim (a few oz per running yard) to the heaviest velour (about 35 oz).
const GRADE = { min: 0.1, max: 200 }
// Fullness beyond 300 % is not hung; 1,000 % leaves room for any effect.
const FULLNESS = { min: 0, max: 1000 }

const bounded = (label: string, { min, max }: { min: number; max: number }, unit: string) =>
  z
    .number({ error: `${label} must be a number` })
    .min(min, `${label} must be between ${min} and ${max}${unit}`)
    .max(max, `${label} must be between ${min} and ${max}${unit}`)

/** A stretch runs from one end toward the other: `to` beyond `from`. */
const forwardStretch = (value: { from?: number; to?: number }, ctx: z.RefinementCtx) => {
  if (value.from !== undefined && value.to !== undefined && value.to <= value.from)
    ctx.addIssue({ code: 'custom', path: ['to'], message: 'The end of the stretch must be beyond its start' })
}

function entryShapes(units: UnitSystem) {
  const labelled = { label: singleLineText('Label', 120, { required: true }), category: itemCategoryField() }
  const weight = () => figure('itemWeight', units, 'Weight')
  const position = (label: string) => figure('position', units, label)
  const quantity = () => count('entryQuantity', 'Quantity')
  const point = z.strictObject({
    ...labelled,
    weight: weight(),
    at: position('Position'),
    quantity: quantity().default(1),
  })
  const stretch = z
    .strictObject({
      ...labelled,
      weightPerLength: figure('itemWeightPerLength', units, 'Weight per length'),
      from: position('Start of the stretch'),
      to: position('End of the stretch'),
    })
    .superRefine(forwardStretch)
  const fabric = z
    .strictObject({
      gradeOzPerLinearYard: bounded('Fabric grade', GRADE, ' oz per running yard').optional(),
      weightPerArea: figure('fabricWeightPerArea', units, 'Fabric weight per area').optional(),
      height: figure('fabricHeight', units, 'Finished height'),
      fullnessPercent: bounded('Fullness', FULLNESS, ' %'),
    })
    .superRefine((value, ctx) => {
      if ((value.gradeOzPerLinearYard === undefined) === (value.weightPerArea === undefined))
        ctx.addIssue({
          code: 'custom',
          path: ['gradeOzPerLinearYard'],
          message: 'Give the fabric grade or its weight per area, not both',
        })
    })
  const softGoods = z
    .strictObject({ ...labelled, fabric, from: position('Start of the stretch'), to: position('End of the stretch') })
    .superRefine(forwardStretch)
  const library = z
    .strictObject({
      ...labelled,
      itemTypeId: z.uuid({ error: 'Choose an item from the library' }),
      quantity: quantity(),
      at: position('Position').optional(),
      from: position('Start of the stretch').optional(),
      to: position('End of the stretch').optional(),
    })
    .superRefine((value, ctx) => {
      const atPoint = value.at !== undefined
      const alongStretch = value.from !== undefined || value.to !== undefined
      if (atPoint === alongStretch)
        ctx.addIssue({ code: 'custom', path: ['at'], message: 'Give a point, or a stretch from and to, not both' })
      else if (alongStretch && (value.from === undefined || value.to === undefined))
        ctx.addIssue({ code: 'custom', path: [value.from === undefined ? 'from' : 'to'], message: 'Enter a position' })
      forwardStretch(value, ctx)
    })
  const shared = z.strictObject({
    ...labelled,
    weight: weight(),
    points: z
      .array(position('Pick point'), { error: 'List the pick points' })
      .min(1, 'At least one pick point')
      .max(MAX_OWN_PICK_POINTS, `At most ${MAX_OWN_PICK_POINTS} pick points`),
  })
  /** Which shape an entry is, told by the field only that shape has. */
  return (value: unknown) => {
    if (!value || typeof value !== 'object') return point
    if ('fabric' in value) return softGoods
    if ('itemTypeId' in value) return library
    if ('points' in value) return shared
    if ('weightPerLength' in value) return stretch
    return point
  }
}

function buildEntry(units: UnitSystem) {
  const shapeOf = entryShapes(units)
  return z.unknown().transform((value, ctx): HangEntry => {
    const parsed = shapeOf(value).safeParse(value)
    if (parsed.success) return parsed.data as HangEntry
    for (const issue of parsed.error.issues)
      ctx.addIssue({ code: 'custom', message: issue.message, path: issue.path as PropertyKey[] })
    return z.NEVER
  })
}
const entrySchemas = { imperial: buildEntry('imperial'), metric: buildEntry('metric') }

/**
 * One thing a fly operator hangs, in the units typed in (which set the ranges): a weight at a point (per unit,
 * `quantity` defaulting to 1), a weight per length along a stretch, soft goods from their fabric, library units
 * at a point or spread evenly along a stretch, or scenery on its own pick points. Refusals name the field.
 */
export const hangEntrySchemaFor = (units: UnitSystem) => entrySchemas[units]
