import { z } from 'zod'

/**
 * What a password someone sets must be. Sign-in itself only asks that something was typed: these rules
 * apply where a password is chosen (a new account, a change, an accepted invitation).
 */

/** Fewest characters a chosen password may have. */
export const PASSWORD_MIN_CHARACTERS = 12

/** The password hash reads only the first 72 bytes (UTF-8); a longer password would be silently cut. */
export const PASSWORD_MAX_BYTES = 72

/** The demo venue's password, printed in the README and by `npm start`; the demo seeder takes it from here. */
export const PUBLISHED_DEMO_PASSWORD = 'loft-demo-2026'

/** Passwords anyone can read, so no real account may choose one. */
export const PUBLISHED_PASSWORDS: readonly string[] = [PUBLISHED_DEMO_PASSWORD]

/** The rule in one sentence, shown beside every field where a password is set. */
export const PASSWORD_RULE =
  `At least ${PASSWORD_MIN_CHARACTERS} characters (at most ${PASSWORD_MAX_BYTES} bytes); ` +
  "not the demo password, the account's e-mail address, or one character repeated."

/**
 * Bytes the text takes in UTF-8 (a lone surrogate counts as the 3 bytes of its replacement character).
 *
 * @example
 * utf8Length('abc') // 3
 * utf8Length('é') // 2
 */
export function utf8Length(text: string): number {
  let bytes = 0
  for (const character of text) {
    const code = character.codePointAt(0)!
    bytes += code < 0x80 ? 1 : code < 0x800 ? 2 : code < 0x10000 ? 3 : 4
  }
  return bytes
}

// A high surrogate not followed by a low one, or a low one not preceded by a high one.
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/

/**
 * The first rule the password breaks, in words for the form, or null when it keeps them all.
 *
 * @example
 * passwordProblem('short') // 'At least 12 characters'
 * passwordProblem('rigging-is-fun-2026') // null
 */
export function passwordProblem(password: string): string | null {
  if ([...password].length < PASSWORD_MIN_CHARACTERS) return `At least ${PASSWORD_MIN_CHARACTERS} characters`
  if (utf8Length(password) > PASSWORD_MAX_BYTES)
    return `At most ${PASSWORD_MAX_BYTES} bytes (accented letters and symbols take 2 to 4 each)`
  if (LONE_SURROGATE.test(password) || password.includes('\0')) return 'Use only characters a keyboard can type'
  if (password.trim() === '') return 'Must not be all spaces'
  if (new Set(password).size === 1) return 'Must not be one character repeated'
  if (PUBLISHED_PASSWORDS.includes(password)) return 'The demo password is public; choose another'
  return null
}

/**
 * Whether the password is the person's e-mail address, or its part before the @, in any case.
 *
 * @example
 * passwordMatchesEmail('Flyrail.Hand@x.test', 'flyrail.hand@x.test') // true
 */
export function passwordMatchesEmail(password: string, email: string): boolean {
  const lower = password.toLowerCase()
  const address = email.trim().toLowerCase()
  return lower === address || lower === address.split('@')[0]
}

/** A chosen password, checked by every rule that does not need the person's e-mail address. */
export const passwordSchema = z.string({ error: 'Enter a password' }).superRefine((password, context) => {
  const problem = passwordProblem(password)
  if (problem) context.addIssue({ code: 'custom', message: problem })
})

/**
 * Refuses a password that spells the person's own e-mail address; add it to an object schema that has both
 * fields, so the message lands on `password`.
 *
 * @example
 * z.object({ email: z.string(), password: passwordSchema }).superRefine(refusePasswordMatchingEmail)
 */
export function refusePasswordMatchingEmail(
  value: { email?: string; password?: string },
  context: z.RefinementCtx,
): void {
  if (value.password && value.email && passwordMatchesEmail(value.password, value.email))
    context.addIssue({ code: 'custom', path: ['password'], message: "Must not be the account's e-mail address" })
}
