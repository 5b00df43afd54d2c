import { Router } from 'express'
import { boardQuerySchema, type BoardQuery } from '../../../shared/schemas/board.js'
import { ROLES } from '../../../shared/schemas/role.js'
import { memberContext, type AppContext } from '../../context.js'
import { requireRole } from '../../http/auth.js'
import { sendCachedAnswer } from '../../http/cached-answer.js'
import { validate } from '../../http/validate.js'
import type { LiveHub } from '../../live/live-hub.js'
import { boardStream } from './board-stream.js'
import { getBoard } from './board.service.js'

/** `/board`: every member reads the board and follows its stream. */
export function boardRoutes(app: AppContext, hub: LiveHub, keepAliveMs: number) {
  const router = Router()
  router.get('/', requireRole(ROLES), validate({ query: boardQuerySchema }), async (req, res) => {
    const ctx = memberContext(app, req)
    const query = req.query as unknown as BoardQuery
    // One lineset's board is small and asked for rarely: computed each time. A production's is stored under
    // its id; one of another venue 404s while computing, so nothing is ever stored for it.
    if (query.linesetId) return void res.json(await getBoard(ctx, query))
    const name = query.productionId ? `board:${query.productionId}` : 'board'
    await sendCachedAnswer(ctx, req, res, name, () => getBoard(ctx, query))
  })
  router.get('/stream', requireRole(ROLES), boardStream(app, hub, keepAliveMs))
  return router
}
