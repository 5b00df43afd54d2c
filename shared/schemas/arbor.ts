import { z } from 'zod'
import { count, versionField } from './quantity.js'
import { multiLineText } from './text.js'

/** How many bricks of one type sit on an arbor (a type left out of a count holds none). */
export const arborBrickCountSchema = z.object({
  brickTypeId: z.uuid({ error: 'Choose a brick type' }),
  count: count('bricks', 'Bricks on the arbor'),
})

/**
 * The body of `PUT /api/v1/linesets/:id/arbor`: the count taken at the rail, one entry per brick type
 * (a type named twice is refused), the arbor `version` it was read at and an optional note.
 *
 * @example
 * arborCountSchema.safeParse({ version: 0, bricks: [{ brickTypeId, count: 12 }] }).success // true
 */
export const arborCountSchema = z.object({
  version: versionField(),
  bricks: z
    .array(arborBrickCountSchema, { error: 'List the bricks on the arbor' })
    .max(20, 'At most 20 brick types')
    .superRefine((bricks, ctx) => {
      const seen = new Set<string>()
      bricks.forEach((brick, index) => {
        if (seen.has(brick.brickTypeId))
          ctx.addIssue({ code: 'custom', path: [index, 'brickTypeId'], message: 'This brick type is listed twice' })
        seen.add(brick.brickTypeId)
      })
    }),
  note: multiLineText('Note', 2000).optional(),
})
export type ArborCount = z.infer<typeof arborCountSchema>

/** What one arbor holds, as `GET /api/v1/linesets/:id/arbor` answers. */
export interface ArborContents {
  linesetId: string
  bricks: { brickTypeId: string; name: string; count: number }[]
  /** The arbor's own version: a count based on an older one is refused with 409. */
  version: number
}

/** One brick type of the venue by where its bricks are; owned = onArbors + reserved + inStorage, always. */
export interface BrickStockLine {
  brickTypeId: string
  name: string
  owned: number
  onArbors: number
  reserved: number
  inStorage: number
  /** A retired type stays listed while any of its bricks are on an arbor or reserved. */
  retired: boolean
  byLineset: { linesetId: string; number: number; name: string; count: number }[]
}
