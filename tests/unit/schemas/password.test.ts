import { describe, expect, it } from 'vitest'
import { DEMO_PASSWORD } from '../../../server/db/seeders/demo-people.js'
import {
  PASSWORD_RULE,
  passwordMatchesEmail,
  passwordProblem,
  passwordSchema,
  utf8Length,
} from '../../../shared/schemas/password.js'

describe('the password rule', () => {
  it.each([
    ['eleven characters', 'abcdefghijk', 'At least 12 characters'],
    ['eleven characters and an emoji that is two UTF-16 units', 'abcdefghij\u{1F3AD}', 'At least 12 characters'],
    ['73 bytes of ASCII', 'a'.repeat(72) + 'b', 'At most 72 bytes (accented letters and symbols take 2 to 4 each)'],
    [
      '37 two-byte letters (74 bytes, 37 characters)',
      'é'.repeat(36) + 'ü',
      'At most 72 bytes (accented letters and symbols take 2 to 4 each)',
    ],
    ['twelve blanks', ' '.repeat(12), 'Must not be all spaces'],
    ['tabs and spaces', ' \t '.repeat(5), 'Must not be all spaces'],
    ['one character repeated', 'x'.repeat(20), 'Must not be one character repeated'],
    ['one accented character repeated', 'ß'.repeat(12), 'Must not be one character repeated'],
    ['the published demo password', DEMO_PASSWORD, 'The demo password is public; choose another'],
    ['a NUL character', 'rigging-rope\0s', 'Use only characters a keyboard can type'],
    ['a lone surrogate', 'rigging-rope-\uD800', 'Use only characters a keyboard can type'],
  ])('when the password is %s, then it is refused with a reason', (_, password, reason) => {
    expect(passwordProblem(password)).toBe(reason)
    const parsed = passwordSchema.safeParse(password)
    expect(parsed.success).toBe(false)
    expect(parsed.error?.issues[0]?.message).toBe(reason)
  })

  it.each([
    ['exactly 12 characters', 'fly-rail-12!'],
    ['exactly 72 bytes', 'a'.repeat(71) + 'b'],
    ['a passphrase with spaces', 'counterweight arbor at trim'],
    ['36 two-byte letters (72 bytes)', 'é'.repeat(35) + 'ü'],
    ['spaces around a real password', '  lock-rail-batten  '],
  ])('when the password is %s, then it is accepted unchanged', (_, password) => {
    expect(passwordProblem(password)).toBeNull()
    expect(passwordSchema.parse(password)).toBe(password)
  })

  it('when bytes are counted, then they match UTF-8 (as TextEncoder, the standard encoder, counts them)', () => {
    for (const text of ['abc', 'é', '€', '\u{1F3AD}', 'a\u{1F3AD}é€'])
      expect(utf8Length(text), text).toBe(new TextEncoder().encode(text).length)
  })

  it("when the password is the account's e-mail address or its name part, in any case, then it is refused", () => {
    expect(passwordMatchesEmail('Rail.Hand@Venue.test', 'rail.hand@venue.test')).toBe(true)
    expect(passwordMatchesEmail('RAIL.HAND.OF.THE.HOUSE', 'rail.hand.of.the.house@venue.test')).toBe(true)
    expect(passwordMatchesEmail('rail.hand.of.the.house!', 'rail.hand.of.the.house@venue.test')).toBe(false)
  })

  it('when the rule is said on a form, then it names every limit the schema enforces', () => {
    expect(PASSWORD_RULE).toMatch(/12 characters/)
    expect(PASSWORD_RULE).toMatch(/72 bytes/)
    expect(PASSWORD_RULE).toMatch(/demo password/)
    expect(PASSWORD_RULE).toMatch(/e-mail address/)
    expect(PASSWORD_RULE).toMatch(/one character repeated/)
  })
})
