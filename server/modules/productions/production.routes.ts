import { Router } from 'express'
import { idParamsSchema } from '../../../shared/schemas/id.js'
import { productionInputSchema, productionUpdateSchema } from '../../../shared/schemas/production.js'
import { PRODUCTION_MANAGERS, ROLES } from '../../../shared/schemas/role.js'
import { memberContext, type AppContext } from '../../context.js'
import { requireRole } from '../../http/auth.js'
import { validate } from '../../http/validate.js'
import * as productions from './production.service.js'

/** The venue's productions: everyone reads them, administrators and technical directors manage them. */
export function productionRoutes(app: AppContext) {
  const router = Router()
  router.get('/', requireRole(ROLES), async (req, res) => {
    res.json(await productions.listProductions(memberContext(app, req)))
  })
  router.post('/', requireRole(PRODUCTION_MANAGERS), validate({ body: productionInputSchema }), async (req, res) => {
    res.status(201).json(await productions.createProduction(memberContext(app, req), req.body))
  })
  router.put(
    '/:id',
    requireRole(PRODUCTION_MANAGERS),
    validate({ params: idParamsSchema, body: productionUpdateSchema }),
    async (req, res) => {
      res.json(await productions.updateProduction(memberContext(app, req), req.params.id as string, req.body))
    },
  )
  return router
}
