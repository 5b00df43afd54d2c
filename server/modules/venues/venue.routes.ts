import { Router } from 'express'
import { INVENTORY_EDITORS, ROLES } from '../../../shared/schemas/role.js'
import { venueSettingsSchema } from '../../../shared/schemas/venue.js'
import type { Database } from '../../db/models.js'
import { currentUser, requireRole } from '../../http/auth.js'
import { validate } from '../../http/validate.js'
import * as venues from './venue.service.js'

export function venueRoutes(db: Database) {
  const router = Router()
  router.get('/', requireRole(ROLES), async (req, res) => {
    res.json(await venues.getVenue(db, currentUser(req)))
  })
  router.put('/', requireRole(INVENTORY_EDITORS), validate({ body: venueSettingsSchema }), async (req, res) => {
    res.json(await venues.updateVenue(db, currentUser(req), req.body))
  })
  return router
}
