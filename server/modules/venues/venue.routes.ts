import { Router } from 'express'
import { INVENTORY_EDITORS, ROLES } from '../../../shared/schemas/role.js'
import { venueSettingsSchema } from '../../../shared/schemas/venue.js'
import { memberContext, type AppContext } from '../../context.js'
import { requireRole } from '../../http/auth.js'
import { validate } from '../../http/validate.js'
import * as venues from './venue.service.js'

export function venueRoutes(app: AppContext) {
  const router = Router()
  router.get('/', requireRole(ROLES), async (req, res) => {
    res.json(await venues.getVenue(memberContext(app, req)))
  })
  router.put('/', requireRole(INVENTORY_EDITORS), validate({ body: venueSettingsSchema }), async (req, res) => {
    res.json(await venues.updateVenue(memberContext(app, req), req.body))
  })
  return router
}
