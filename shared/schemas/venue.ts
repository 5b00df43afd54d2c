import { z } from 'zod'
import type { UnitSystem } from '../units/systems.js'
import { designFactor, figure, versionField } from './quantity.js'
import { singleLineText } from './text.js'

const settingsIn = (units: UnitSystem) =>
  z.object({
    name: singleLineText('Venue name', 120, { required: true }),
    unitSystem: z.literal(units, { error: 'Choose imperial or metric' }),
    balanceTolerance: figure('tolerance', units, 'Balance tolerance'),
    ropeLockHolding: figure('ropeLockHolding', units, 'Rope lock holding'),
    wireRopeDesignFactor: designFactor('Design factor'),
    version: versionField(),
  })

/**
 * Venue settings: its unit system and the policies every balance check uses. The policies are in the unit
 * system being chosen, which sets their ranges.
 *
 * @example
 * venueSettingsSchema.safeParse({ name: 'Playhouse', unitSystem: 'metric', balanceTolerance: 5,
 *   ropeLockHolding: 23, wireRopeDesignFactor: 8, version: 0 }).success // true
 */
export const venueSettingsSchema = z.discriminatedUnion('unitSystem', [settingsIn('imperial'), settingsIn('metric')], {
  error: (issue) => (issue.code === 'invalid_union' ? 'Choose imperial or metric' : undefined),
})
export type VenueSettingsUpdate = z.infer<ReturnType<typeof settingsIn>>

export interface Venue extends VenueSettingsUpdate {
  id: string
}
