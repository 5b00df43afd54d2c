import { describe, expect, it } from 'vitest'
import { brickTypeInputSchemaFor } from '../../../shared/schemas/brick-type.js'
import { personInputSchema } from '../../../shared/schemas/person.js'
import { signInSchema } from '../../../shared/schemas/session.js'
import { emailAddress, multiLineText, singleLineText } from '../../../shared/schemas/text.js'

const name = singleLineText('Name', 20, { required: true })
const notes = multiLineText('Notes', 200)
const messages = (result: { error?: { issues: Array<{ message: string }> } }) =>
  result.error?.issues.map((issue) => issue.message)

describe('the text rule', () => {
  it('when text holds a NUL or another control character, then it is refused, never cleaned', () => {
    expect(messages(name.safeParse('Border\u0000'))).toEqual(['Name cannot hold control characters'])
    expect(name.safeParse('Bor\u0007der').success).toBe(false)
    expect(name.safeParse('Bor\u009Fder').success).toBe(false)
    expect(notes.safeParse('check\u0000').success).toBe(false)
    expect(notes.safeParse('check\r\nweekly').success).toBe(false)
  })

  it('when text holds a lone surrogate, then it is refused; a well-formed pair is kept', () => {
    expect(messages(name.safeParse('Border \uD800'))).toEqual(['Name holds a broken character (a lone surrogate)'])
    expect(name.safeParse('\uDFFF').success).toBe(false)
    expect(name.parse('Border \uD83C\uDFAD')).toBe('Border \uD83C\uDFAD')
  })

  it('when one-line text holds a tab or a line break, then it is refused; notes may hold tabs and newlines', () => {
    expect(name.safeParse('Border\t1').success).toBe(false)
    expect(name.safeParse('Border\n1').success).toBe(false)
    expect(messages(name.safeParse('Border\u20281'))).toEqual(['Name must be a single line'])
    expect(notes.parse('  Check the lock\n\tweekly  ')).toBe('Check the lock\n\tweekly')
  })

  it('when text is blank or too long, then it is refused after trimming', () => {
    expect(messages(name.safeParse('   '))).toEqual(['Name must not be empty'])
    expect(name.parse('  Border 1  ')).toBe('Border 1')
    expect(messages(name.safeParse('x'.repeat(21)))).toEqual(['Name is too long (20 characters at most)'])
  })

  it('when a brick type or a person carries bad text, then the field is named', () => {
    const brick = brickTypeInputSchemaFor('imperial').safeParse({
      name: 'Full\u0000',
      material: 'Steel\uD800',
      unitWeight: 19.5,
      thickness: 2,
      quantityOwned: 10,
      unitSystem: 'imperial',
    })
    expect(brick.error?.issues.map((issue) => issue.path.join('.'))).toEqual(['name', 'material'])
    const person = personInputSchema.safeParse({ email: 'a@b.test', name: 'Ann\u0000', role: 'stage-manager' })
    expect(person.error?.issues.map((issue) => issue.path.join('.'))).toEqual(['name'])
  })
})

describe('e-mail addresses', () => {
  // 254 characters: the longest address SMTP can carry (RFC 5321, a path of 256 octets less its angle brackets).
  const address = (length: number) => `${'a'.repeat(length - '@example.org'.length)}@example.org`

  it('when an address is longer than 254 characters, then it is refused everywhere one is typed', () => {
    expect(emailAddress().safeParse(address(254)).success).toBe(true)
    expect(messages(emailAddress().safeParse(address(255)))).toEqual(['An e-mail address has 254 characters at most'])
    expect(signInSchema.safeParse({ email: address(255), password: 'x' }).success).toBe(false)
    expect(personInputSchema.safeParse({ email: address(300), name: 'Ann', role: 'stage-manager' }).success).toBe(false)
  })

  it('when an address is typed with blanks and capitals, then it is kept trimmed and lower-cased', () => {
    expect(emailAddress().parse('  TD@Example.ORG ')).toBe('td@example.org')
  })
})
