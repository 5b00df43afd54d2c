import { Router } from 'express'
import {
  preRunCheckInputSchema,
  preRunChecksQuerySchema,
  type PreRunChecksQuery,
} from '../../../shared/schemas/board.js'
import { PRE_RUN_CHECKERS, ROLES } from '../../../shared/schemas/role.js'
import { memberContext, type AppContext } from '../../context.js'
import { requireRole } from '../../http/auth.js'
import { validate } from '../../http/validate.js'
import { latestPreRunCheck, listPreRunChecks, recordPreRunCheck } from './pre-run-check.service.js'

/** `/pre-run-checks`: stage managers, technical directors and administrators record them; everyone reads them. */
export function preRunCheckRoutes(app: AppContext) {
  const router = Router()
  router.get('/', requireRole(ROLES), validate({ query: preRunChecksQuerySchema }), async (req, res) => {
    res.json(await listPreRunChecks(memberContext(app, req), req.query as unknown as PreRunChecksQuery))
  })
  router.get('/latest', requireRole(ROLES), async (req, res) => {
    res.json(await latestPreRunCheck(memberContext(app, req)))
  })
  router.post('/', requireRole(PRE_RUN_CHECKERS), validate({ body: preRunCheckInputSchema }), async (req, res) => {
    res.status(201).json(await recordPreRunCheck(memberContext(app, req), req.body))
  })
  return router
}
