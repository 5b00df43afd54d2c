/** One error shape for the API, the CLI and the forms: `{ error: { code, message, fields } }`. */
export interface ErrorBody {
  error: { code: string; message: string; fields?: Record<string, string> }
}

/** The parts of a zod issue this module reads (kept structural so shared/ stays independent of zod's classes). */
export interface IssueLike {
  path: ReadonlyArray<PropertyKey>
  message: string
}

/**
 * Turns validation issues into `path -> message`, the first message per field winning.
 * Paths are dot-joined: `batten.pickPoints.2`; an issue on the whole input is keyed `(root)`.
 *
 * @example
 * fieldsFromIssues([{ path: ['batten', 'length'], message: 'Too small' }]) // { 'batten.length': 'Too small' }
 */
export function fieldsFromIssues(issues: ReadonlyArray<IssueLike>): Record<string, string> {
  const fields: Record<string, string> = {}
  for (const issue of issues) {
    const key = issue.path.length ? issue.path.map(String).join('.') : '(root)'
    fields[key] ??= issue.message
  }
  return fields
}

/**
 * The error body for input that failed validation.
 *
 * @example
 * validationErrorBody([{ path: ['units'], message: 'Unknown units' }]).error.code // 'validation_failed'
 */
export function validationErrorBody(issues: ReadonlyArray<IssueLike>): ErrorBody {
  const fields = fieldsFromIssues(issues)
  const names = Object.keys(fields)
  const message = `Check ${names.length === 1 ? 'this field' : 'these fields'}: ${names.join(', ')}`
  return { error: { code: 'validation_failed', message, fields } }
}
