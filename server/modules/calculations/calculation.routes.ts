import { Router } from 'express'
import { runCalculation } from '../../../shared/engine/calculate.js'
import { ROLES } from '../../../shared/schemas/role.js'
import { requireRole } from '../../http/auth.js'
import { AppError } from '../../http/errors.js'

/** `POST /calculations`: the balancing engine for any signed-in member; the same JSON as the CLI. */
export function calculationRoutes() {
  const router = Router()
  router.post('/', requireRole(ROLES), (req, res) => {
    const outcome = runCalculation(req.body)
    if (!outcome.ok) {
      const { code, message, fields } = outcome.error.error
      throw new AppError(400, code, message, fields)
    }
    res.json(outcome.result)
  })
  return router
}
