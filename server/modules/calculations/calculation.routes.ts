import express, { Router } from 'express'
import { ROLES } from '../../../shared/schemas/role.js'
import { requireRole } from '../../http/auth.js'
import { AppError } from '../../http/errors.js'
import type { CalculationPool } from './calculation-pool.js'

/**
 * A calculation's JSON body read as text, mounted before the API's JSON reader (which then leaves it alone): the
 * calculation thread parses it, so the thread that answers HTTP neither parses it nor copies an object tree across.
 */
export const calculationBodyAsText = express.text({ type: 'application/json', limit: '1mb' })

/**
 * `POST /calculations`: the balancing engine for any signed-in member; the same JSON as the CLI. The engine runs
 * on the calculation thread, so this thread keeps answering everyone else meanwhile.
 */
export function calculationRoutes(pool: CalculationPool) {
  const router = Router()
  router.post('/', requireRole(ROLES), async (req, res) => {
    // The JSON text the app's reader kept for this route (see `calculationBodyAsText`); any other body is
    // handed over as it was read.
    const outcome = typeof req.body === 'string' ? await pool.answer(req.body) : await pool.run(req.body)
    if (!outcome.ok) {
      const { code, message, fields } = outcome.error.error
      throw new AppError(400, code, message, fields)
    }
    if ('json' in outcome) res.type('json').send(outcome.json)
    else res.json(outcome.result)
  })
  return router
}
