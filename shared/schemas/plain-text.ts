import { z } from 'zod'

// NUL cannot be stored in a text column, and a lone surrogate is not text at all.
const UNSTORABLE = /\u0000|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/

/**
 * Text a person typed, trimmed, at most `max` characters, refused when it holds characters that cannot be
 * stored (NUL, a lone surrogate). `required` refuses empty text; otherwise empty is kept as ''.
 *
 * @example
 * plainText(80, { required: true }).parse('  Border  ') // 'Border'
 */
export function plainText(max: number, options: { required?: boolean } = {}) {
  const text = z
    .string({ error: 'Enter some text' })
    .trim()
    .max(max, `At most ${max} characters`)
    .refine((value) => !UNSTORABLE.test(value), 'Contains characters that cannot be stored')
  return options.required ? text.refine((value) => value.length > 0, 'Must not be empty') : text
}
