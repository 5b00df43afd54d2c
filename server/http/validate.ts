import type { RequestHandler } from 'express'
import type { ZodType } from 'zod'
import { validationErrorBody } from '../../shared/errors/fields.js'
import { unitsTypedIn } from '../../shared/schemas/quantity.js'
import type { UnitSystem } from '../../shared/units/systems.js'
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

/**
 * Validates a body whose figures carry the units they were typed in (`unitSystem`) with the shared schema for
 * those units, since the units set each figure's range (40 is a fine batten length in feet and an impossible
 * one in metres). Whether those are still the venue's units is the service's check (409 `units_changed`).
 */
export function validateByUnitsTypedIn(schemaFor: (units: UnitSystem) => ZodType): RequestHandler {
  return (req, res, next) => validate({ body: schemaFor(unitsTypedIn(req.body)) })(req, res, next)
}
