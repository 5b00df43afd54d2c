import { z } from 'zod'
import type { HangEntry } from '../hang/hang-items.js'
import { itemCategoryField } from './item-type.js'
import { plainText } from './plain-text.js'
import { nonNegative, positive } from './quantity.js'

/** The most units one entry may stand for (a batten carries at most 1,000 loads in all). */
export const MAX_ENTRY_QUANTITY = 1000
/** The most pick points a piece of scenery may hang from. */
export const MAX_OWN_PICK_POINTS = 24

const labelled = {
  label: plainText(120, { required: true }),
  category: itemCategoryField(),
}
const quantity = () =>
  z
    .number({ error: 'Enter a number' })
    .int('Must be a whole number')
    .min(1, 'At least 1')
    .max(MAX_ENTRY_QUANTITY, `At most ${MAX_ENTRY_QUANTITY}`)

/** A stretch runs from one end toward the other: `to` beyond `from`. */
const forwardStretch = (value: { from?: number; to?: number }, ctx: z.RefinementCtx) => {
  if (value.from !== undefined && value.to !== undefined && value.to <= value.from)
    ctx.addIssue({ code: 'custom', path: ['to'], message: 'Must be beyond the start of the stretch' })
}

const pointEntry = z.strictObject({
  ...labelled,
  weight: nonNegative(),
  at: nonNegative(),
  quantity: quantity().default(1),
})

const stretchEntry = z
  .strictObject({ ...labelled, weightPerLength: nonNegative(), from: nonNegative(), to: nonNegative() })
  .superRefine(forwardStretch)

const fabric = z
  .strictObject({
    gradeOzPerLinearYard: positive().optional(),
    weightPerArea: positive().optional(),
    height: positive(),
    fullnessPercent: nonNegative(),
  })
  .superRefine((value, ctx) => {
    if ((value.gradeOzPerLinearYard === undefined) === (value.weightPerArea === undefined))
      ctx.addIssue({
        code: 'custom',
        path: ['gradeOzPerLinearYard'],
        message: 'Give the fabric grade or its weight per area, not both',
      })
  })
const fabricEntry = z
  .strictObject({ ...labelled, fabric, from: nonNegative(), to: nonNegative() })
  .superRefine(forwardStretch)

const libraryEntry = z
  .strictObject({
    ...labelled,
    itemTypeId: z.uuid({ error: 'Choose an item from the library' }),
    quantity: quantity(),
    at: nonNegative().optional(),
    from: nonNegative().optional(),
    to: nonNegative().optional(),
  })
  .superRefine((value, ctx) => {
    const atPoint = value.at !== undefined
    const alongStretch = value.from !== undefined || value.to !== undefined
    if (atPoint === alongStretch)
      ctx.addIssue({ code: 'custom', path: ['at'], message: 'Give a point, or a stretch from and to, not both' })
    else if (alongStretch && (value.from === undefined || value.to === undefined))
      ctx.addIssue({ code: 'custom', path: [value.from === undefined ? 'from' : 'to'], message: 'Enter a number' })
    forwardStretch(value, ctx)
  })

const sharedEntry = z.strictObject({
  ...labelled,
  weight: nonNegative(),
  points: z
    .array(nonNegative(), { error: 'List the pick points' })
    .min(1, 'At least one pick point')
    .max(MAX_OWN_PICK_POINTS, `At most ${MAX_OWN_PICK_POINTS} pick points`),
})

/** Which shape an entry is, told by the field only that shape has. */
function shapeOf(value: unknown) {
  if (!value || typeof value !== 'object') return pointEntry
  if ('fabric' in value) return fabricEntry
  if ('itemTypeId' in value) return libraryEntry
  if ('points' in value) return sharedEntry
  if ('weightPerLength' in value) return stretchEntry
  return pointEntry
}

/**
 * One thing a fly operator hangs, in the venue's units: a weight at a point (per unit, `quantity` defaulting
 * to 1), a weight per length along a stretch, soft goods from their fabric, library units at a point or spread
 * evenly along a stretch, or scenery on its own pick points. Refusals name the field within the entry.
 */
export const hangEntrySchema = z.unknown().transform((value, ctx): HangEntry => {
  const parsed = shapeOf(value).safeParse(value)
  if (parsed.success) return parsed.data as HangEntry
  for (const issue of parsed.error.issues)
    ctx.addIssue({ code: 'custom', message: issue.message, path: issue.path as PropertyKey[] })
  return z.NEVER
})
