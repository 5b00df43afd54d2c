import { randomBytes, timingSafeEqual } from 'node:crypto'
import type { Request, RequestHandler } from 'express'
import { AppError } from './errors.js'

declare module 'express-session' {
  interface SessionData {
    csrfToken?: string
  }
}

const UNSAFE_METHODS = new Set(['POST', 'PUT', 'PATCH', 'DELETE'])

/** The session's CSRF token, created on first ask (the synchronizer-token pattern). */
export function csrfTokenFor(req: Request): string {
  req.session.csrfToken ??= randomBytes(32).toString('base64url')
  return req.session.csrfToken
}

function matches(expected: string | undefined, given: string | undefined) {
  if (!expected || !given) return false
  const a = Buffer.from(expected)
  const b = Buffer.from(given)
  return a.length === b.length && timingSafeEqual(a, b)
}

/** Every state-changing request, sign-in included, must carry the session's token in X-CSRF-Token. */
export const requireCsrfToken: RequestHandler = (req, _res, next) => {
  if (!UNSAFE_METHODS.has(req.method)) return next()
  if (matches(req.session?.csrfToken, req.get('x-csrf-token'))) return next()
  next(new AppError(403, 'csrf_failed', 'The request lacks a valid X-CSRF-Token header; reload the page and try again'))
}
