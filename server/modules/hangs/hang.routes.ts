import { Router } from 'express'
import { hangParamsSchema, hangSaveSchemaFor } from '../../../shared/schemas/hang.js'
import { idParamsSchema } from '../../../shared/schemas/id.js'
import { HANG_EDITORS, ROLES } from '../../../shared/schemas/role.js'
import { memberContext, type AppContext } from '../../context.js'
import { requireRole } from '../../http/auth.js'
import { validate, validateByUnitsTypedIn } from '../../http/validate.js'
import * as hangs from './hang.service.js'

/** A lineset's saved hangs, mounted beside the lineset routes: everyone reads, the fly crew saves. */
export function hangRoutes(app: AppContext) {
  const router = Router()
  router.get('/:id/hangs', requireRole(ROLES), validate({ params: idParamsSchema }), async (req, res) => {
    res.json(await hangs.listHangs(memberContext(app, req), req.params.id as string))
  })
  router.post(
    '/:id/hangs',
    requireRole(HANG_EDITORS),
    validate({ params: idParamsSchema }),
    validateByUnitsTypedIn(hangSaveSchemaFor),
    async (req, res) => {
      res.status(201).json(await hangs.saveHang(memberContext(app, req), req.params.id as string, req.body))
    },
  )
  router.get('/:id/hangs/:hangId', requireRole(ROLES), validate({ params: hangParamsSchema }), async (req, res) => {
    res.json(await hangs.getHang(memberContext(app, req), req.params.id as string, req.params.hangId as string))
  })
  return router
}
