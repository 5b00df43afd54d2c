import { Router } from 'express'
import { brickTypeInputSchemaFor, brickTypeUpdateSchemaFor } from '../../../shared/schemas/brick-type.js'
import { idParamsSchema } from '../../../shared/schemas/id.js'
import { INVENTORY_EDITORS, ROLES } from '../../../shared/schemas/role.js'
import { memberContext, type AppContext } from '../../context.js'
import { requireRole } from '../../http/auth.js'
import { validate, validateByUnitsTypedIn } from '../../http/validate.js'
import * as brickTypes from './brick-type.service.js'

export function brickTypeRoutes(app: AppContext) {
  const router = Router()
  const byId = validate({ params: idParamsSchema })
  router.get('/', requireRole(ROLES), async (req, res) => {
    res.json(await brickTypes.listBrickTypes(memberContext(app, req)))
  })
  router.post(
    '/',
    requireRole(INVENTORY_EDITORS),
    validateByUnitsTypedIn(brickTypeInputSchemaFor),
    async (req, res) => {
      res.status(201).json(await brickTypes.createBrickType(memberContext(app, req), req.body))
    },
  )
  router.put(
    '/:id',
    requireRole(INVENTORY_EDITORS),
    byId,
    validateByUnitsTypedIn(brickTypeUpdateSchemaFor),
    async (req, res) => {
      res.json(await brickTypes.updateBrickType(memberContext(app, req), req.params.id as string, req.body))
    },
  )
  router.delete('/:id', requireRole(INVENTORY_EDITORS), byId, async (req, res) => {
    await brickTypes.deleteBrickType(memberContext(app, req), req.params.id as string)
    res.status(204).end()
  })
  return router
}
