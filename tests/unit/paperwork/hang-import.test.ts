import { describe, expect, it } from 'vitest'
import { csvDocument } from '../../../shared/paperwork/csv.js'
import { readCsvText } from '../../../shared/paperwork/csv-read.js'
import { HANG_COLUMNS, hangColumnHeader, hangEntryCells } from '../../../shared/paperwork/hang-columns.js'
import { guessMapping, readImportRows, type ImportChoices } from '../../../shared/paperwork/hang-import.js'
import type { HangEntry } from '../../../shared/hang/hang-items.js'

// Invented test data: a small lighting list and a venue library of two fixtures.
const WASH = '11111111-1111-4111-8111-111111111111'
const choices: ImportChoices = {
  units: 'imperial',
  library: [
    { id: WASH, name: 'LED wash', category: 'lighting' },
    { id: '22222222-2222-4222-8222-222222222222', name: 'Profile 26', category: 'lighting' },
  ],
  defaultCategory: 'lighting',
}

const lightingList = [
  'Unit,Fixture,Position (ft),Qty,Notes',
  '101,LED wash,4,1,"Focus DS, centre"',
  '102,led wash ,8,2,',
  ',,,,',
  '103,Moving spot,12,1,not in the library',
  '104,LED wash,200,1,beyond any batten',
  '105,LED wash,abc,1,',
].join('\n')

describe('reading a lighting list into hang entries', () => {
  const { header, rows } = readCsvText(lightingList)
  const mapping = { label: 0, item: 1, at: 2, quantity: 3 }

  it('when fixtures are in the library, then rows become library entries matched by name, case and spaces aside', () => {
    const read = readImportRows(header, rows, mapping, choices)
    expect(read[0]).toEqual({
      row: 2,
      entry: { label: '101', category: 'lighting', itemTypeId: WASH, quantity: 1, at: 4 },
      errors: [],
      unmatchedItem: null,
    })
    expect(read[1]!.entry).toMatchObject({ itemTypeId: WASH, quantity: 2, at: 8 })
  })

  it('when a row is blank, then it is skipped and the rows after keep their spreadsheet numbers', () => {
    expect(readImportRows(header, rows, mapping, choices).map((row) => row.row)).toEqual([2, 3, 5, 6, 7])
  })

  it('when a fixture is not in the library, then the row says so, and a weight typed for it makes it a point load', () => {
    const unmatched = readImportRows(header, rows, mapping, choices)[2]!
    expect(unmatched).toMatchObject({ row: 5, entry: null, unmatchedItem: 'Moving spot' })
    expect(unmatched.errors).toEqual(['Fixture: “Moving spot” is not in the item library; give its weight'])
    const weighed = readImportRows(header, rows, mapping, { ...choices, weights: new Map([[5, 38]]) })[2]!
    expect(weighed.entry).toEqual({ label: '103', category: 'lighting', weight: 38, at: 12, quantity: 1 })
  })

  it('when a cell is wrong, then the row has an error in words naming the column as the file calls it', () => {
    const read = readImportRows(header, rows, mapping, choices)
    expect(read[3]!.errors).toEqual(['Position (ft): Position must be between 0 and 131 ft'])
    expect(read[4]!.errors).toEqual(['Position (ft): “abc” is not a number'])
  })

  it('when a category is not one of ours, then the row names the column and the categories there are', () => {
    const read = readImportRows(
      ['Label', 'Category', 'Weight (lb)', 'Position (ft)'],
      [['Drop', 'Props', '20', '3']],
      { label: 0, category: 1, weight: 2, at: 3 },
      choices,
    )
    expect(read[0]!.errors[0]).toMatch(/^Category: “Props” is not a category \(Lighting, Audio and video/)
  })

  it('when the header is an export of ours, then every column is found by its words and units', () => {
    const header = HANG_COLUMNS.map((column) => hangColumnHeader(column, 'metric'))
    expect(guessMapping(header, 'metric')).toEqual(
      Object.fromEntries(HANG_COLUMNS.map((column, index) => [column, index])),
    )
    expect(guessMapping(['Label', 'position', 'Weight (kg)'], 'imperial')).toEqual({ label: 0, at: 1, weight: 2 })
  })
})

describe('a hang written as CSV and read back', () => {
  it('when every shape of entry is exported and imported, then the same entries come back', () => {
    const entries: HangEntry[] = [
      { label: 'Wash', category: 'lighting', itemTypeId: WASH, quantity: 5, from: 4, to: 36 },
      { label: 'Wash, single', category: 'lighting', itemTypeId: WASH, quantity: 1, at: 2.25 },
      { label: 'Cable', category: 'hardware', weightPerLength: 0.5, from: 0, to: 40 },
      { label: '=Sandbag', category: 'hardware', weight: 25, at: 20, quantity: 2 },
      {
        label: 'Border',
        category: 'soft-goods',
        fabric: { gradeOzPerLinearYard: 25, height: 8, fullnessPercent: 50 },
        from: 2,
        to: 38,
      },
      {
        label: 'Scrim',
        category: 'soft-goods',
        fabric: { weightPerArea: 0.02, height: 20, fullnessPercent: 0 },
        from: 0,
        to: 40,
      },
      { label: 'Truss', category: 'scenery', weight: 310.5, points: [5, 20, 35] },
    ]
    const names = new Map([[WASH, 'LED wash']])
    const text = csvDocument(
      HANG_COLUMNS.map((column) => hangColumnHeader(column, 'imperial')),
      entries.map((entry) => hangEntryCells(entry, names)),
    )
    const { header, rows } = readCsvText(text)
    const read = readImportRows(header, rows, guessMapping(header, 'imperial'), choices)
    expect(read.flatMap((row) => row.errors)).toEqual([])
    // A label that would start a formula went out with an apostrophe before it and comes back without.
    expect(read.map((row) => row.entry)).toEqual(entries)
  })
})
