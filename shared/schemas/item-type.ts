import { z } from 'zod'
import { ITEM_CATEGORIES, type ItemCategory } from '../hang/hang-items.js'
import { plainText } from './plain-text.js'
import { nonNegative, positive, typedInField, versionField } from './quantity.js'

export { ITEM_CATEGORIES, type ItemCategory }

/** How each category reads on screen. */
export const ITEM_CATEGORY_LABELS: Readonly<Record<ItemCategory, string>> = {
  lighting: 'Lighting',
  'audio-video': 'Audio and video',
  'soft-goods': 'Soft goods',
  scenery: 'Scenery',
  hardware: 'Hardware',
  other: 'Other',
}

export const itemCategoryField = () => z.enum(ITEM_CATEGORIES, { error: 'Choose a category' })

/**
 * A generic thing the crew hangs again and again: one unit's weight and a per-unit allowance for what goes
 * with it (clamp, safety cable, a share of cable), in the venue's units.
 */
const itemTypeFields = z.object({
  name: plainText(80, { required: true }),
  category: itemCategoryField(),
  unitWeight: positive(),
  allowancePerUnit: nonNegative(),
  notes: plainText(500).default(''),
  unitSystem: typedInField(),
})

export const itemTypeInputSchema = itemTypeFields
export type ItemTypeInput = z.input<typeof itemTypeInputSchema>

export const itemTypeUpdateSchema = itemTypeFields.extend({ version: versionField() })
export type ItemTypeUpdate = z.infer<typeof itemTypeUpdateSchema>

/** An item type as the API returns it; figures in `unitSystem`, the venue's. */
export interface ItemType extends z.infer<typeof itemTypeInputSchema> {
  id: string
  version: number
}
