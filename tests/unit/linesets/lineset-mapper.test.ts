import { describe, expect, it } from 'vitest'
import { linesetInputSchemaFor } from '../../../shared/schemas/lineset.js'
import { UNIT_SYSTEMS } from '../../../shared/units/systems.js'
import {
  linesetFromApi,
  linesetToApi,
  storedFromRow,
  storedToApi,
  type LinesetRow,
} from '../../../server/modules/linesets/lineset.mapper.js'
import { sampleLineset } from '../../support/fixtures.js'

/** A plain row, as the list's SQL read hands it back: every stored field under its attribute name. */
function plainRow(): LinesetRow {
  const { unitSystem: _typedIn, ...body } = linesetInputSchemaFor('imperial').parse({
    ...sampleLineset(7, { notes: 'Spare electric' }),
    unitSystem: 'imperial',
  })
  const at = new Date('2026-03-04T05:06:07.089Z')
  return {
    ...linesetFromApi(body, 'imperial'),
    id: '3f1b8f8e-5d1c-4e47-9a51-6c1d1c0b7a01',
    venueId: '0b5e6d0c-0f0e-4c4e-8a7e-2b1f0a9c6d02',
    version: 4,
    retiredAt: null,
    createdAt: at,
    updatedAt: at,
  } as LinesetRow
}

describe('a lineset row read for the API', () => {
  it.each(UNIT_SYSTEMS)(
    'when a row is mapped in place (%s), then its answer is byte for byte the one mapped from a copy of its stored fields',
    (system) => {
      const row = plainRow()
      const fromCopy = {
        id: row.id,
        version: row.version,
        updatedAt: row.updatedAt.toISOString(),
        ...storedToApi(storedFromRow(row), system),
      }
      expect(JSON.stringify(linesetToApi(row, system))).toBe(JSON.stringify(fromCopy))
    },
  )
})
