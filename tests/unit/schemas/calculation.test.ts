import { describe, expect, it } from 'vitest'
import { runCalculation } from '../../../shared/engine/calculate.js'
import { SAMPLE_INPUT } from '../engine/lineset-input.js'
import { BAD_CALCULATION_INPUTS, withBatten } from '../../support/bad-calculation-inputs.js'

function fieldsOf(raw: unknown): Record<string, string> {
  const outcome = runCalculation(raw)
  if (outcome.ok) throw new Error('expected a validation error')
  expect(outcome.error.error.code).toBe('validation_failed')
  return outcome.error.error.fields!
}
describe('calculation input validation', () => {
  it.each(BAD_CALCULATION_INPUTS)('when the input has %s, then the error names %s', (_, raw, field) => {
    expect(Object.keys(fieldsOf(raw))).toContain(field)
  })

  it('when a number is NaN or infinite (as JSON cannot carry, but a caller can), then it is refused on its field', () => {
    expect(Object.keys(fieldsOf(withBatten({ length: Number.NaN })))).toContain('batten.length')
    expect(Object.keys(fieldsOf(withBatten({ length: Number.POSITIVE_INFINITY })))).toContain('batten.length')
  })

  it('when an unknown field is sent, then the strict schema refuses it', () => {
    expect(runCalculation({ ...SAMPLE_INPUT, colour: 'red' }).ok).toBe(false)
  })

  it('when the message is read, then it is plain words naming the figures', () => {
    expect(fieldsOf(withBatten({ pickPoints: [0, 20, 10] }))['batten.pickPoints.2']).toBe(
      'Pick points must be in order from one end: 10 comes after 20',
    )
  })
})
