import { Router } from 'express'
import { boardQuerySchema, type BoardQuery } from '../../../shared/schemas/board.js'
import { ROLES } from '../../../shared/schemas/role.js'
import { memberContext, type AppContext } from '../../context.js'
import { requireRole } from '../../http/auth.js'
import { validate } from '../../http/validate.js'
import type { LiveHub } from '../../live/live-hub.js'
import { boardStream } from './board-stream.js'
import { getBoard } from './board.service.js'

/** `/board`: every member reads the board and follows its stream. */
export function boardRoutes(app: AppContext, hub: LiveHub, keepAliveMs: number) {
  const router = Router()
  router.get('/', requireRole(ROLES), validate({ query: boardQuerySchema }), async (req, res) => {
    res.json(await getBoard(memberContext(app, req), req.query as unknown as BoardQuery))
  })
  router.get('/stream', requireRole(ROLES), boardStream(app, hub, keepAliveMs))
  return router
}
