import type { RequestHandler } from 'express'
import type { Role } from '../../shared/schemas/role.js'
import type { SessionUser } from '../../shared/schemas/session.js'
import { AppError, forbidden } from './errors.js'

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // passport's req.user is the signed-in member of one venue.
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends SessionUser {}
  }
}

/** 401 unless signed in. */
export const requireSession: RequestHandler = (req, _res, next) => {
  if (!req.user) return next(new AppError(401, 'not_signed_in', 'Sign in to continue'))
  next()
}

/** 401 unless signed in, 403 unless the member's role is one of `roles`. */
export function requireRole(roles: readonly Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) return next(new AppError(401, 'not_signed_in', 'Sign in to continue'))
    if (!roles.includes(req.user.role)) return next(forbidden())
    next()
  }
}

/** The signed-in member; only call behind requireSession or requireRole. */
export function currentUser(req: Express.Request): SessionUser {
  if (!req.user) throw new AppError(401, 'not_signed_in', 'Sign in to continue')
  return req.user
}
