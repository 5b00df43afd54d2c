import { z } from 'zod'

/**
 * The one text rule for every text field: trimmed, bounded, well-formed Unicode and free of control
 * characters (tab and newline only where a field holds several lines). Why refuse rather than clean:
 * PostgreSQL's text and jsonb cannot hold NUL or a lone surrogate, and quietly changing what someone typed
 * would store something they never wrote.
 */

// Control characters (C0, DEL, C1); the multi-line form lets tab and newline through.
const CONTROL = /\p{Cc}/u
const CONTROL_BUT_TAB_AND_NEWLINE = /[^\P{Cc}\t\n]/u
// Line and paragraph separators break a line as surely as a newline does.
const LINE_SEPARATOR = /[\u2028\u2029]/u
// With the u flag a well-formed pair reads as one code point, so only an unpaired half matches.
const LONE_SURROGATE = /\p{Cs}/u

interface TextOptions {
  /** Refuse empty text (after trimming). */
  required?: boolean
  /** The message for empty text, where the plain one does not fit (a choice rather than typing). */
  emptyMessage?: string
}

function text(label: string, max: number, multiLine: boolean, options: TextOptions) {
  const control = multiLine ? CONTROL_BUT_TAB_AND_NEWLINE : CONTROL
  let schema = z
    .string({ error: `${label} must be text` })
    .refine((value) => !control.test(value), `${label} cannot hold control characters`)
    .refine((value) => multiLine || !LINE_SEPARATOR.test(value), `${label} must be a single line`)
    .refine((value) => !LONE_SURROGATE.test(value), `${label} holds a broken character (a lone surrogate)`)
    .trim()
    .max(max, `${label} is too long (${max} characters at most)`)
  if (options.required) schema = schema.min(1, options.emptyMessage ?? `${label} must not be empty`)
  return schema
}

/**
 * One line of text: names, labels, materials.
 *
 * @example
 * singleLineText('Name', 80, { required: true }).safeParse('Fly\u0000').success // false
 */
export const singleLineText = (label: string, max: number, options: TextOptions = {}) =>
  text(label, max, false, options)

/**
 * Several lines of text (notes): tab and newline allowed, other control characters not.
 *
 * @example
 * multiLineText('Notes', 2000).parse('  Check the lock\n\tweekly  ') // 'Check the lock\n\tweekly'
 */
export const multiLineText = (label: string, max: number, options: TextOptions = {}) => text(label, max, true, options)

/** The longest address SMTP can carry in a path (RFC 5321: 256 octets less the angle brackets). */
export const MAX_EMAIL_LENGTH = 254

/**
 * An e-mail address, trimmed and lower-cased.
 *
 * @example
 * emailAddress('Enter your e-mail address').parse(' TD@Example.org ') // 'td@example.org'
 */
export const emailAddress = (missing = 'Enter an e-mail address') =>
  z
    .string({ error: missing })
    .trim()
    .toLowerCase()
    .max(MAX_EMAIL_LENGTH, `An e-mail address has ${MAX_EMAIL_LENGTH} characters at most`)
    .pipe(z.email('Enter a valid e-mail address'))
