import { Router } from 'express'
import { idParamsSchema } from '../../../shared/schemas/id.js'
import { linesetInputSchemaFor, linesetUpdateSchemaFor } from '../../../shared/schemas/lineset.js'
import { INVENTORY_EDITORS, ROLES } from '../../../shared/schemas/role.js'
import type { Database } from '../../db/models.js'
import { currentUser, requireRole } from '../../http/auth.js'
import { validate } from '../../http/validate.js'
import { validateInVenueUnits } from '../venues/venue-units.js'
import * as linesets from './lineset.service.js'

export function linesetRoutes(db: Database) {
  const router = Router()
  const byId = validate({ params: idParamsSchema })
  router.get('/', requireRole(ROLES), async (req, res) => {
    res.json(await linesets.listLinesets(db, currentUser(req)))
  })
  router.get('/:id', requireRole(ROLES), byId, async (req, res) => {
    res.json(await linesets.getLineset(db, currentUser(req), req.params.id as string))
  })
  router.post(
    '/',
    requireRole(INVENTORY_EDITORS),
    validateInVenueUnits(db, linesetInputSchemaFor),
    async (req, res) => {
      res.status(201).json(await linesets.createLineset(db, currentUser(req), req.body))
    },
  )
  router.put(
    '/:id',
    requireRole(INVENTORY_EDITORS),
    byId,
    validateInVenueUnits(db, linesetUpdateSchemaFor),
    async (req, res) => {
      res.json(await linesets.updateLineset(db, currentUser(req), req.params.id as string, req.body))
    },
  )
  router.delete('/:id', requireRole(['administrator']), byId, async (req, res) => {
    await linesets.retireLineset(db, currentUser(req), req.params.id as string)
    res.status(204).end()
  })
  return router
}
