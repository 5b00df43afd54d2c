import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { apiFromStored, exactApiFromStored } from '../../../server/db/quantities.js'
import { QUANTITIES, UNIT_SYSTEMS, toSI } from '../../../shared/units/systems.js'

const quantity = fc.constantFrom(...QUANTITIES)
const system = fc.constantFrom(...UNIT_SYSTEMS)

/** A stored SI figure as PostgreSQL hands NUMERIC back: a plain decimal string, up to 30 places. */
const storedFigure = fc
  .tuple(fc.boolean(), fc.bigInt({ min: 0n, max: 10n ** 12n }), fc.integer({ min: 0, max: 30 }))
  .map(([negative, digits, places]) => {
    const text = digits.toString().padStart(places + 1, '0')
    const figure = places ? `${text.slice(0, -places)}.${text.slice(-places)}` : text
    return negative && digits !== 0n ? `-${figure}` : figure
  })

describe('stored figures read back in the venue units', () => {
  it('when any stored figure is read for the API, then the quick path answers exactly what the 40-digit decimal path does', () => {
    fc.assert(
      fc.property(storedFigure, quantity, system, (stored, q, s) => {
        expect(apiFromStored(stored, q, s)).toBe(exactApiFromStored(stored, q, s))
      }),
      { numRuns: 20_000 },
    )
  })

  it('when a figure lies exactly on a rounding tie (n + 0.5 millionths in the venue units), then it still rounds half away from zero', () => {
    fc.assert(
      fc.property(fc.integer({ min: -(10 ** 12), max: 10 ** 12 }), quantity, system, (millionths, q, s) => {
        const tie = `${millionths}.5e-6`
        const stored = toSI(tie, q, s).toFixed()
        expect(apiFromStored(stored, q, s)).toBe(exactApiFromStored(stored, q, s))
      }),
      { numRuns: 5_000 },
    )
    // 2.0000005 lb stored as kg (NIST SP 811: 1 lb = 0.45359237 kg) reads back as 2.000001 lb.
    expect(apiFromStored(toSI('2.0000005', 'weight', 'imperial').toFixed(), 'weight', 'imperial')).toBe(2.000001)
    expect(apiFromStored(toSI('-2.0000005', 'weight', 'imperial').toFixed(), 'weight', 'imperial')).toBe(-2.000001)
  })

  it('when a figure is very large, then it reads back exactly as before', () => {
    expect(apiFromStored('123456789012345.678901234', 'length', 'metric')).toBe(123456789012345.67)
    expect(apiFromStored('123456789012345.678901234', 'length', 'metric')).toBe(
      exactApiFromStored('123456789012345.678901234', 'length', 'metric'),
    )
  })
})
