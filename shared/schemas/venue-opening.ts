import { z } from 'zod'
import { UNIT_SYSTEMS } from '../units/systems.js'
import { passwordSchema, refusePasswordMatchingEmail } from './password.js'
import { personInputSchema } from './person.js'
import { singleLineText } from './text.js'

/**
 * Opening a venue with its first administrator, from the command line of the server that hosts it
 * (`npm run venue:open`): the way in for a deployment on its own PostgreSQL, where no demo is seeded.
 */
export const venueOpeningSchema = z
  .object({
    venueName: singleLineText('Venue name', 120, { required: true }),
    unitSystem: z.enum(UNIT_SYSTEMS, { error: 'Choose imperial or metric' }),
    email: personInputSchema.shape.email,
    name: singleLineText('Name', 120, { required: true }),
    password: passwordSchema,
  })
  .superRefine(refusePasswordMatchingEmail)
export type VenueOpening = z.infer<typeof venueOpeningSchema>
