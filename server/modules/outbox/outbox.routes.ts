import { Router } from 'express'
import { idParamsSchema } from '../../../shared/schemas/id.js'
import { OUTBOX_READERS, outboxQuerySchema, type OutboxQuery } from '../../../shared/schemas/outbox.js'
import { memberContext, type AppContext } from '../../context.js'
import { requireRole } from '../../http/auth.js'
import { validate } from '../../http/validate.js'
import { getOutboxMessage, listOutbox } from './outbox-read.service.js'

/** `/outbox`: administrators read the venue's outgoing mail and where each message stands. */
export function outboxRoutes(app: AppContext) {
  const router = Router()
  router.get('/', requireRole(OUTBOX_READERS), validate({ query: outboxQuerySchema }), async (req, res) => {
    res.json(await listOutbox(memberContext(app, req), req.query as unknown as OutboxQuery))
  })
  router.get('/:id', requireRole(OUTBOX_READERS), validate({ params: idParamsSchema }), async (req, res) => {
    res.json(await getOutboxMessage(memberContext(app, req), req.params.id as string))
  })
  return router
}
