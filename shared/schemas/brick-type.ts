import { z } from 'zod'
import type { UnitSystem } from '../units/systems.js'
import { count, figure, typedInField, versionField } from './quantity.js'
import { singleLineText } from './text.js'

/**
 * A kind of counterweight brick the house owns; weights differ by house, so the venue enters its own.
 * Figures are in the venue's units, which set their ranges.
 */
const brickTypeFields = (units: UnitSystem) =>
  z.object({
    name: singleLineText('Name', 60, { required: true }),
    material: singleLineText('Material', 40, { required: true }),
    unitWeight: figure('brickWeight', units, 'Weight of one brick'),
    thickness: figure('brickThickness', units, 'Thickness'),
    quantityOwned: count('bricks', 'Bricks owned'),
    unitSystem: typedInField(),
  })

const buildUpdate = (units: UnitSystem) => brickTypeFields(units).extend({ version: versionField() })
const inputSchemas = { imperial: brickTypeFields('imperial'), metric: brickTypeFields('metric') }
const updateSchemas = { imperial: buildUpdate('imperial'), metric: buildUpdate('metric') }

/**
 * The brick type form and the body of `POST /api/v1/brick-types`.
 *
 * @example
 * brickTypeInputSchemaFor('imperial').safeParse({ name: 'Full', material: 'Steel', unitWeight: 19.5,
 *   thickness: 2, quantityOwned: 400 }).success // true
 */
export const brickTypeInputSchemaFor = (units: UnitSystem) => inputSchemas[units]
export type BrickTypeInput = z.infer<ReturnType<typeof brickTypeFields>>

/** The body of `PUT /api/v1/brick-types/:id`: the whole brick type plus the version it was read at. */
export const brickTypeUpdateSchemaFor = (units: UnitSystem) => updateSchemas[units]
export type BrickTypeUpdate = z.infer<ReturnType<typeof buildUpdate>>

/** A brick type as the API returns it; `unitSystem` is the one its figures are in (the venue's). */
export interface BrickType extends BrickTypeInput {
  id: string
  version: number
}
