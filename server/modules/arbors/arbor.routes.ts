import { Router } from 'express'
import { arborCountSchema } from '../../../shared/schemas/arbor.js'
import { idParamsSchema } from '../../../shared/schemas/id.js'
import { INVENTORY_EDITORS, ROLES } from '../../../shared/schemas/role.js'
import { memberContext, type AppContext } from '../../context.js'
import { requireRole } from '../../http/auth.js'
import { validate } from '../../http/validate.js'
import { countArbor, getArbor } from './arbor.service.js'

/** `/linesets/:id/arbor`: what the arbor holds; a count taken at the rail by those who keep the inventory. */
export function arborRoutes(app: AppContext) {
  const router = Router()
  const byId = validate({ params: idParamsSchema })
  router.get('/:id/arbor', requireRole(ROLES), byId, async (req, res) => {
    res.json(await getArbor(memberContext(app, req), req.params.id as string))
  })
  router.put(
    '/:id/arbor',
    requireRole(INVENTORY_EDITORS),
    byId,
    validate({ body: arborCountSchema }),
    async (req, res) => {
      res.json(await countArbor(memberContext(app, req), req.params.id as string, req.body))
    },
  )
  return router
}
