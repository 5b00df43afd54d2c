import { z } from 'zod'
import { positive, requiredText, typedInField, versionField } from './quantity.js'

/** A kind of counterweight brick the house owns; weights differ by house, so the venue enters its own. */
const brickTypeFields = z.object({
  name: requiredText(60),
  material: requiredText(40),
  unitWeight: positive(),
  thickness: positive(),
  quantityOwned: z
    .number({ error: 'Enter a number' })
    .int('Must be a whole number')
    .min(0, 'Must not be negative')
    .max(100000),
  unitSystem: typedInField(),
})

export const brickTypeInputSchema = brickTypeFields
export type BrickTypeInput = z.infer<typeof brickTypeInputSchema>

export const brickTypeUpdateSchema = brickTypeFields.extend({ version: versionField() })
export type BrickTypeUpdate = z.infer<typeof brickTypeUpdateSchema>

/** A brick type as the API returns it; `unitSystem` is the one its figures are in (the venue's). */
export interface BrickType extends BrickTypeInput {
  id: string
  version: number
}
