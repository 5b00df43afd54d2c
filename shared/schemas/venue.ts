import { z } from 'zod'
import { UNIT_SYSTEMS } from '../units/systems.js'
import { nonNegative, requiredText, versionField } from './quantity.js'

/** Venue settings: its unit system and the policies every balance check uses. */
export const venueSettingsSchema = z.object({
  name: requiredText(120),
  unitSystem: z.enum(UNIT_SYSTEMS, { error: 'Choose imperial or metric' }),
  balanceTolerance: nonNegative(),
  ropeLockHolding: nonNegative(),
  wireRopeDesignFactor: z
    .number({ error: 'Enter a number' })
    .finite()
    .min(1, 'Must be 1 or more')
    .max(20, 'At most 20'),
  version: versionField(),
})
export type VenueSettingsUpdate = z.infer<typeof venueSettingsSchema>

export interface Venue extends VenueSettingsUpdate {
  id: string
}
