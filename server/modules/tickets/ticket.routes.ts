import { Router, type RequestHandler } from 'express'
import { idParamsSchema } from '../../../shared/schemas/id.js'
import { HANG_EDITORS, INVENTORY_EDITORS, ROLES } from '../../../shared/schemas/role.js'
import {
  ticketApproveSchema,
  ticketCompleteSchema,
  ticketDeclineSchema,
  ticketListQuerySchema,
  ticketOpenSchema,
  ticketVersionSchema,
} from '../../../shared/schemas/ticket.js'
import type { TicketState } from '../../../shared/schemas/workflow-states.js'
import { memberContext, type AppContext, type ServiceContext } from '../../context.js'
import { requireRole } from '../../http/auth.js'
import { validate } from '../../http/validate.js'
import { approveTicket, declineTicket, withdrawTicket } from './ticket-decisions.service.js'
import { completeTicket, startLoading } from './ticket-loading.service.js'
import { openTicket } from './ticket-open.service.js'
import { listTickets, readTicket } from './ticket-read.service.js'

type Move = (ctx: ServiceContext, id: string, body: never) => Promise<unknown>

/**
 * `/tickets`: fly operators open, technical directors and administrators decide, the fly crew loads; every
 * role reads. The opener-only and never-your-own rules are the services'.
 */
export function ticketRoutes(app: AppContext) {
  const router = Router()
  const byId = validate({ params: idParamsSchema })
  const move = (
    path: string,
    roles: readonly (typeof ROLES)[number][],
    body: Parameters<typeof validate>[0]['body'],
    run: Move,
  ) => {
    const handler: RequestHandler = async (req, res) => {
      res.json(await run(memberContext(app, req), req.params.id as string, req.body as never))
    }
    router.post(`/:id/${path}`, requireRole(roles), byId, validate({ body }), handler)
  }
  router.get('/', requireRole(ROLES), validate({ query: ticketListQuerySchema }), async (req, res) => {
    const { state } = req.query as { state?: TicketState }
    res.json(await listTickets(memberContext(app, req), state))
  })
  router.get('/:id', requireRole(ROLES), byId, async (req, res) => {
    res.json(await readTicket(memberContext(app, req), req.params.id as string))
  })
  router.post('/', requireRole(HANG_EDITORS), validate({ body: ticketOpenSchema }), async (req, res) => {
    res.status(201).json(await openTicket(memberContext(app, req), req.body))
  })
  move('approve', INVENTORY_EDITORS, ticketApproveSchema, approveTicket)
  move('decline', INVENTORY_EDITORS, ticketDeclineSchema, declineTicket)
  move('withdraw', HANG_EDITORS, ticketVersionSchema, withdrawTicket)
  move('start-loading', HANG_EDITORS, ticketVersionSchema, startLoading)
  move('complete', HANG_EDITORS, ticketCompleteSchema, completeTicket)
  return router
}
