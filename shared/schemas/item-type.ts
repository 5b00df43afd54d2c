import { z } from 'zod'
import { ITEM_CATEGORIES, type ItemCategory } from '../hang/hang-items.js'
import type { UnitSystem } from '../units/systems.js'
import { figure, typedInField, versionField } from './quantity.js'
import { multiLineText, singleLineText } from './text.js'

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
 * with it (clamp, safety cable, a share of cable), in the venue's units, which set the ranges.
 */
const itemTypeFields = (units: UnitSystem) =>
  z.object({
    name: singleLineText('Name', 80, { required: true }),
    category: itemCategoryField(),
    unitWeight: figure('itemWeight', units, 'Weight of one unit').refine(
      (value) => value > 0,
      'Weight of one unit must be more than 0',
    ),
    allowancePerUnit: figure('itemWeight', units, 'Allowance per unit'),
    notes: multiLineText('Notes', 500).default(''),
    unitSystem: typedInField(),
  })

const buildUpdate = (units: UnitSystem) => itemTypeFields(units).extend({ version: versionField() })
const inputSchemas = { imperial: itemTypeFields('imperial'), metric: itemTypeFields('metric') }
const updateSchemas = { imperial: buildUpdate('imperial'), metric: buildUpdate('metric') }

/** The item type form and the body of `POST /api/v1/item-types`. */
export const itemTypeInputSchemaFor = (units: UnitSystem) => inputSchemas[units]
export type ItemTypeInput = z.input<ReturnType<typeof itemTypeFields>>

/** The body of `PUT /api/v1/item-types/:id`: the whole item type plus the version it was read at. */
export const itemTypeUpdateSchemaFor = (units: UnitSystem) => updateSchemas[units]
export type ItemTypeUpdate = z.infer<ReturnType<typeof buildUpdate>>

/** An item type as the API returns it; figures in `unitSystem`, the venue's. */
export interface ItemType extends z.infer<ReturnType<typeof itemTypeFields>> {
  id: string
  version: number
}
