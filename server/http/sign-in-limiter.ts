import { rateLimit } from 'express-rate-limit'
import type { Sequelize } from 'sequelize'
import { AppError } from './errors.js'
import { PostgresRateLimitStore } from './rate-limit-store.js'

/** More than `attempts` failed sign-ins from one address within a minute are refused with 429. */
export function signInLimiter(sequelize: Sequelize, attempts: number) {
  return rateLimit({
    windowMs: 60_000,
    limit: attempts,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    store: new PostgresRateLimitStore(sequelize, 'sign-in'),
    handler: (_req, _res, next) =>
      next(
        new AppError(
          429,
          'too_many_attempts',
          'Too many failed sign-ins from this address; wait a minute and try again',
        ),
      ),
  })
}
