import { Router } from 'express'
import { idParamsSchema } from '../../../shared/schemas/id.js'
import { linesetEventsQuerySchema, type LinesetEventsQuery } from '../../../shared/schemas/lineset-event.js'
import { linesetInputSchemaFor, linesetUpdateSchemaFor } from '../../../shared/schemas/lineset.js'
import { INVENTORY_EDITORS, ROLES } from '../../../shared/schemas/role.js'
import { memberContext, type AppContext } from '../../context.js'
import { requireRole } from '../../http/auth.js'
import { sendCachedAnswer } from '../../http/cached-answer.js'
import { validate, validateByUnitsTypedIn } from '../../http/validate.js'
import { listLinesetEvents } from './lineset-events.service.js'
import * as linesets from './lineset.service.js'

export function linesetRoutes(app: AppContext) {
  const router = Router()
  const byId = validate({ params: idParamsSchema })
  router.get('/', requireRole(ROLES), async (req, res) => {
    const ctx = memberContext(app, req)
    await sendCachedAnswer(ctx, req, res, 'linesets', () => linesets.listLinesets(ctx))
  })
  router.get('/:id', requireRole(ROLES), byId, async (req, res) => {
    res.json(await linesets.getLineset(memberContext(app, req), req.params.id as string))
  })
  router.get(
    '/:id/events',
    requireRole(ROLES),
    byId,
    validate({ query: linesetEventsQuerySchema }),
    async (req, res) => {
      res.json(
        await listLinesetEvents(
          memberContext(app, req),
          req.params.id as string,
          req.query as unknown as LinesetEventsQuery,
        ),
      )
    },
  )
  router.post('/', requireRole(INVENTORY_EDITORS), validateByUnitsTypedIn(linesetInputSchemaFor), async (req, res) => {
    res.status(201).json(await linesets.createLineset(memberContext(app, req), req.body))
  })
  router.put(
    '/:id',
    requireRole(INVENTORY_EDITORS),
    byId,
    validateByUnitsTypedIn(linesetUpdateSchemaFor),
    async (req, res) => {
      res.json(await linesets.updateLineset(memberContext(app, req), req.params.id as string, req.body))
    },
  )
  router.delete('/:id', requireRole(['administrator']), byId, async (req, res) => {
    await linesets.retireLineset(memberContext(app, req), req.params.id as string)
    res.status(204).end()
  })
  return router
}
