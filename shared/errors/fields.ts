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

/** How many field messages a summary repeats before it only counts the rest. */
const SUMMARY_MESSAGES = 3

/**
 * One sentence for a person from the field messages, which carry their own labels ("Reason must not be empty"):
 * the field paths (`loaded.0.count`) stay in `fields` for screens and programs, never in the words.
 *
 * @example
 * fieldsSummary({ reason: 'Reason must not be empty' }) // 'Reason must not be empty.'
 */
export function fieldsSummary(fields: Readonly<Record<string, string>>): string {
  const messages = [...new Set(Object.values(fields).map((message) => message.replace(/[.\s]+$/, '')))]
  if (messages.length === 0) return 'Something in the form needs a change.'
  if (messages.length === 1) return `${messages[0]}.`
  const shown = messages.slice(0, SUMMARY_MESSAGES).join('; ')
  const rest = messages.length - SUMMARY_MESSAGES
  return `${messages.length} entries need a change: ${shown}${rest > 0 ? `; and ${rest} more` : ''}.`
}

/**
 * The error body for input that failed validation.
 *
 * @example
 * validationErrorBody([{ path: ['units'], message: 'Unknown units' }]).error.code // 'validation_failed'
 */
export function validationErrorBody(issues: ReadonlyArray<IssueLike>): ErrorBody {
  const fields = fieldsFromIssues(issues)
  return { error: { code: 'validation_failed', message: fieldsSummary(fields), fields } }
}
