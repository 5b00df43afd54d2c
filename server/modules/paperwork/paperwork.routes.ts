import { Router } from 'express'
import { hangParamsSchema } from '../../../shared/schemas/hang.js'
import { idParamsSchema } from '../../../shared/schemas/id.js'
import { ROLES } from '../../../shared/schemas/role.js'
import { memberContext, type AppContext } from '../../context.js'
import { requireRole } from '../../http/auth.js'
import { validate } from '../../http/validate.js'
import { hangItemsCsv, ledgerCsv, scheduleCsv } from './csv-exports.service.js'
import { sendPaper } from './download.js'
import { railCard, schedule } from './pdf-exports.service.js'

/** The venue's papers, mounted at the API's root: every role reads every one of them. */
export function paperworkRoutes(app: AppContext) {
  const router = Router()
  const byId = validate({ params: idParamsSchema })
  router.get('/schedule.csv', requireRole(ROLES), async (req, res) => {
    sendPaper(res, await scheduleCsv(memberContext(app, req)), 'attachment')
  })
  router.get('/linesets/:id/events.csv', requireRole(ROLES), byId, async (req, res) => {
    sendPaper(res, await ledgerCsv(memberContext(app, req), req.params.id as string), 'attachment')
  })
  router.get(
    '/linesets/:id/hangs/:hangId/items.csv',
    requireRole(ROLES),
    validate({ params: hangParamsSchema }),
    async (req, res) => {
      const ctx = memberContext(app, req)
      sendPaper(res, await hangItemsCsv(ctx, req.params.id as string, req.params.hangId as string), 'attachment')
    },
  )
  router.get('/schedule.pdf', requireRole(ROLES), async (req, res) => {
    sendPaper(res, await schedule(memberContext(app, req)), 'inline')
  })
  router.get('/linesets/:id/rail-card.pdf', requireRole(ROLES), byId, async (req, res) => {
    sendPaper(res, await railCard(memberContext(app, req), req.params.id as string), 'inline')
  })
  return router
}
