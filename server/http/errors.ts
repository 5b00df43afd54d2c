import type { ErrorRequestHandler, RequestHandler } from 'express'
import type { ErrorBody } from '../../shared/errors/fields.js'

/** The one error services throw; the error handler turns it into `{ error: { code, message, fields } }`. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message)
    this.name = 'AppError'
  }
}

export const notFound = (what = 'That record') => new AppError(404, 'not_found', `${what} was not found`)
export const forbidden = () => new AppError(403, 'forbidden', 'Your role does not allow this')
export const staleVersion = (what: string) =>
  new AppError(409, 'stale_version', `${what} was changed by someone else since you opened it; reload and try again`)

/** Postgres and driver failures that mean "the database is unreachable", not "your request was bad". */
const UNAVAILABLE_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ETIMEDOUT',
  'EPIPE',
  'ENOTFOUND',
  '57P01',
  '57P02',
  '57P03',
  '08000',
  '08001',
  '08003',
  '08006',
])
const UNAVAILABLE_NAMES = new Set([
  'SequelizeConnectionError',
  'SequelizeConnectionRefusedError',
  'SequelizeConnectionAcquireTimeoutError',
  'SequelizeConnectionTimedOutError',
  'SequelizeHostNotReachableError',
  'SequelizeAccessDeniedError',
])

export function isDatabaseUnavailable(error: unknown): boolean {
  if (!error || typeof error !== 'object') return false
  const e = error as { name?: string; code?: string; parent?: unknown; original?: unknown; message?: string }
  if (e.name && UNAVAILABLE_NAMES.has(e.name)) return true
  if (e.code && UNAVAILABLE_CODES.has(e.code)) return true
  if (
    e.message &&
    /Connection terminated|connect ECONNREFUSED|timeout exceeded when trying to connect/i.test(e.message)
  )
    return true
  return isDatabaseUnavailable(e.parent) || (e.original !== e.parent && isDatabaseUnavailable(e.original))
}

function toAppError(error: unknown): AppError {
  if (error instanceof AppError) return error
  if (isDatabaseUnavailable(error))
    return new AppError(503, 'database_unavailable', 'The database is not reachable right now; try again shortly')
  const e = error as { type?: string; status?: number; name?: string; expose?: boolean; message?: string }
  if (e?.type === 'entity.parse.failed')
    return new AppError(400, 'malformed_json', 'The request body is not valid JSON')
  if (e?.type === 'entity.too.large') return new AppError(413, 'too_large', 'The request body is too large')
  // Other client faults the body reader names itself (an unsupported charset or encoding, say).
  if (e?.expose && e.status && e.status >= 400 && e.status < 500)
    return new AppError(
      e.status,
      'unreadable_request',
      `The request could not be read: ${e.message ?? 'unsupported body'}`,
    )
  if (e?.name === 'SequelizeUniqueConstraintError')
    return new AppError(409, 'duplicate', 'A record with the same identifying value already exists')
  return new AppError(500, 'internal_error', 'Something went wrong on the server; the problem has been logged')
}

/** Turns every error into the one JSON shape, never with a stack trace. */
export function errorHandler(log: (error: unknown) => void): ErrorRequestHandler {
  return (error, _req, res, _next) => {
    const appError = toAppError(error)
    if (appError.status === 500) log(error)
    // A 503 names what is out of reach (the database, the mail server) by its code.
    else if (appError.status === 503)
      console.warn(`loftledger: ${appError.code.replace(/_/g, ' ')} (${(error as Error)?.message ?? error})`)
    const body: ErrorBody = { error: { code: appError.code, message: appError.message } }
    if (appError.fields) body.error.fields = appError.fields
    if (res.headersSent) return
    res.status(appError.status).json(body)
  }
}

/** Unknown `/api` routes. */
export const apiNotFound: RequestHandler = (req, _res, next) =>
  next(new AppError(404, 'not_found', `No API route ${req.method} ${req.originalUrl}`))
