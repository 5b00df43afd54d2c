import type { RequestHandler } from 'express'
import type { ZodType } from 'zod'
import type { UnitSystem } from '../../../shared/units/systems.js'
import type { Database } from '../../db/models.js'
import { currentUser } from '../../http/auth.js'
import { validate } from '../../http/validate.js'
import { venueUnitSystem } from './venue.service.js'

/**
 * Validates a body whose figures are in the venue's units with the shared schema for those units, since the
 * units set each figure's range (40 is a fine batten length in feet and an impossible one in metres).
 * Behind requireRole, so a member is signed in.
 */
export function validateInVenueUnits(db: Database, schemaFor: (units: UnitSystem) => ZodType): RequestHandler {
  return async (req, res, next) => {
    const units = await venueUnitSystem(db, currentUser(req).venueId)
    validate({ body: schemaFor(units) })(req, res, next)
  }
}
