import { rateLimit } from 'express-rate-limit'
import type { Sequelize } from 'sequelize'
import { AppError } from './errors.js'
import { PostgresRateLimitStore } from './rate-limit-store.js'

/**
 * More than `attempts` failed sign-ins from one address within a minute are refused with 429. A browser that
 * has signed in to the account before (`res.locals.trustedDevice`) is not held back by its address: a
 * crowded network address, or a stranger behind it, must not keep crew members out of their own accounts.
 * Its guesses are limited by its own streak instead.
 */
export function signInLimiter(sequelize: Sequelize, attempts: number) {
  return rateLimit({
    windowMs: 60_000,
    limit: attempts,
    skipSuccessfulRequests: true,
    skip: (_req, res) => res.locals.trustedDevice !== undefined,
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
