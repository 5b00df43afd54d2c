import { Router } from 'express'
import { idParamsSchema } from '../../../shared/schemas/id.js'
import { itemTypeInputSchemaFor, itemTypeUpdateSchemaFor } from '../../../shared/schemas/item-type.js'
import { HANG_EDITORS, ROLES } from '../../../shared/schemas/role.js'
import { memberContext, type AppContext } from '../../context.js'
import { requireRole } from '../../http/auth.js'
import { validate, validateByUnitsTypedIn } from '../../http/validate.js'
import * as itemTypes from './item-type.service.js'

/** The venue's item library: everyone reads it, those who enter hangs keep it. */
export function itemTypeRoutes(app: AppContext) {
  const router = Router()
  const byId = validate({ params: idParamsSchema })
  router.get('/', requireRole(ROLES), async (req, res) => {
    res.json(await itemTypes.listItemTypes(memberContext(app, req)))
  })
  router.post('/', requireRole(HANG_EDITORS), validateByUnitsTypedIn(itemTypeInputSchemaFor), async (req, res) => {
    res.status(201).json(await itemTypes.createItemType(memberContext(app, req), req.body))
  })
  router.put(
    '/:id',
    requireRole(HANG_EDITORS),
    byId,
    validateByUnitsTypedIn(itemTypeUpdateSchemaFor),
    async (req, res) => {
      res.json(await itemTypes.updateItemType(memberContext(app, req), req.params.id as string, req.body))
    },
  )
  router.delete('/:id', requireRole(HANG_EDITORS), byId, async (req, res) => {
    await itemTypes.retireItemType(memberContext(app, req), req.params.id as string)
    res.status(204).end()
  })
  return router
}
