import { Router } from 'express'
import { idParamsSchema } from '../../../shared/schemas/id.js'
import { lockoutReleaseSchema, lockoutSchema } from '../../../shared/schemas/lockout.js'
import { INVENTORY_EDITORS } from '../../../shared/schemas/role.js'
import { memberContext, type AppContext } from '../../context.js'
import { requireRole } from '../../http/auth.js'
import { validate } from '../../http/validate.js'
import { lockOut, releaseLockout } from './lockout.service.js'

/** `/linesets/:id/lockout`: technical directors and administrators lock a set out and release it, each with
 * a reason (why it must not be operated; what was checked or fixed). */
export function lockoutRoutes(app: AppContext) {
  const router = Router()
  const byId = validate({ params: idParamsSchema })
  router.post(
    '/:id/lockout',
    requireRole(INVENTORY_EDITORS),
    byId,
    validate({ body: lockoutSchema }),
    async (req, res) => {
      res.status(201).json(await lockOut(memberContext(app, req), req.params.id as string, req.body))
    },
  )
  router.delete(
    '/:id/lockout',
    requireRole(INVENTORY_EDITORS),
    byId,
    validate({ body: lockoutReleaseSchema }),
    async (req, res) => {
      await releaseLockout(memberContext(app, req), req.params.id as string, req.body)
      res.status(204).end()
    },
  )
  return router
}
