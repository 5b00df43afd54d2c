import { Router } from 'express'
import { ROLES } from '../../../shared/schemas/role.js'
import { memberContext, type AppContext } from '../../context.js'
import { requireRole } from '../../http/auth.js'
import { listBrickStock } from './brick-stock-list.js'

export function brickStockRoutes(app: AppContext) {
  const router = Router()
  router.get('/', requireRole(ROLES), async (req, res) => {
    res.json(await listBrickStock(memberContext(app, req)))
  })
  return router
}
