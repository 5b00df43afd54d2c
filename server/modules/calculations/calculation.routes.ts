import { Router } from 'express'
import { ROLES } from '../../../shared/schemas/role.js'
import { requireRole } from '../../http/auth.js'
import { AppError } from '../../http/errors.js'
import type { CalculationPool } from './calculation-pool.js'

/**
 * `POST /calculations`: the balancing engine for any signed-in member; the same JSON as the CLI. The engine runs
 * on the calculation thread, so this thread keeps answering everyone else meanwhile.
 */
export function calculationRoutes(pool: CalculationPool) {
  const router = Router()
  router.post('/', requireRole(ROLES), async (req, res) => {
    const outcome = await pool.run(req.body)
    if (!outcome.ok) {
      const { code, message, fields } = outcome.error.error
      throw new AppError(400, code, message, fields)
    }
    res.json(outcome.result)
  })
  return router
}
