import { Router } from 'express'
import { brickTypeInputSchemaFor, brickTypeUpdateSchemaFor } from '../../../shared/schemas/brick-type.js'
import { idParamsSchema } from '../../../shared/schemas/id.js'
import { INVENTORY_EDITORS, ROLES } from '../../../shared/schemas/role.js'
import type { Database } from '../../db/models.js'
import { currentUser, requireRole } from '../../http/auth.js'
import { validate } from '../../http/validate.js'
import { validateInVenueUnits } from '../venues/venue-units.js'
import * as brickTypes from './brick-type.service.js'

export function brickTypeRoutes(db: Database) {
  const router = Router()
  const byId = validate({ params: idParamsSchema })
  router.get('/', requireRole(ROLES), async (req, res) => {
    res.json(await brickTypes.listBrickTypes(db, currentUser(req)))
  })
  router.post(
    '/',
    requireRole(INVENTORY_EDITORS),
    validateInVenueUnits(db, brickTypeInputSchemaFor),
    async (req, res) => {
      res.status(201).json(await brickTypes.createBrickType(db, currentUser(req), req.body))
    },
  )
  router.put(
    '/:id',
    requireRole(INVENTORY_EDITORS),
    byId,
    validateInVenueUnits(db, brickTypeUpdateSchemaFor),
    async (req, res) => {
      res.json(await brickTypes.updateBrickType(db, currentUser(req), req.params.id as string, req.body))
    },
  )
  router.delete('/:id', requireRole(INVENTORY_EDITORS), byId, async (req, res) => {
    await brickTypes.deleteBrickType(db, currentUser(req), req.params.id as string)
    res.status(204).end()
  })
  return router
}
