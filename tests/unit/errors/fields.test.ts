import { describe, expect, it } from 'vitest'
import { z } from 'zod'
import { fieldsSummary, validationErrorBody } from '../../../shared/errors/fields.js'
import { ticketCompleteSchema } from '../../../shared/schemas/ticket.js'

describe('the words of a validation refusal', () => {
  it('when one brick row of a completion is wrong, then the message is its own words and the path stays in fields', () => {
    const parsed = ticketCompleteSchema.safeParse({
      version: 2,
      loaded: [{ brickTypeId: 'a0000000-0000-4000-8000-0000000000f1', count: -1 }],
      feltBalance: 'balanced',
    })
    expect(parsed.success).toBe(false)
    const { error } = validationErrorBody(parsed.error!.issues)
    expect(Object.keys(error.fields!)).toEqual(['loaded.0.count'])
    expect(error.message).toMatch(/^Bricks loaded must be a whole number between .+\.$/)
    expect(error.message).not.toMatch(/loaded\.0|Check this field/)
  })

  it('when several fields are wrong, then the message counts them and repeats at most three, without paths', () => {
    const schema = z.object({
      a: z.string({ error: 'Name must be text' }),
      b: z.string({ error: 'Material must be text' }),
      c: z.string({ error: 'Notes must be text' }),
      d: z.string({ error: 'Colour must be text' }),
    })
    const { error } = validationErrorBody(schema.safeParse({}).error!.issues)
    expect(error.message).toBe(
      '4 entries need a change: Name must be text; Material must be text; Notes must be text; and 1 more.',
    )
  })

  it('when two fields carry the same words, then they are said once', () => {
    expect(
      fieldsSummary({ 'items.0.quantity': 'Quantity is too big', 'items.3.quantity': 'Quantity is too big.' }),
    ).toBe('Quantity is too big.')
  })
})
