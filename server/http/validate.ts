import type { RequestHandler } from 'express'
import type { ZodType } from 'zod'
import { validationErrorBody } from '../../shared/errors/fields.js'
import { AppError } from './errors.js'

interface Schemas {
  body?: ZodType
  query?: ZodType
  params?: ZodType
}

/**
 * Parses request parts with the shared zod schemas and replaces them with the parsed values;
 * answers 400 with field messages. Invalid `params` are a 404: a malformed id names no record.
 */
export function validate(schemas: Schemas): RequestHandler {
  return (req, _res, next) => {
    if (schemas.params) {
      const parsed = schemas.params.safeParse(req.params)
      if (!parsed.success) return next(new AppError(404, 'not_found', 'That record was not found'))
      req.params = parsed.data as typeof req.params
    }
    for (const part of ['query', 'body'] as const) {
      const schema = schemas[part]
      if (!schema) continue
      const parsed = schema.safeParse(req[part])
      if (!parsed.success) {
        const { error } = validationErrorBody(parsed.error.issues)
        return next(new AppError(400, error.code, error.message, error.fields))
      }
      // Express 5 makes req.query a getter; define the parsed value in its place.
      Object.defineProperty(req, part, { value: parsed.data, writable: true, configurable: true })
    }
    next()
  }
}
