import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { readCsvText } from '../../shared/paperwork/csv-read.js'
import { guessMapping, readImportRows } from '../../shared/paperwork/hang-import.js'
import type { VenueFixture } from '../support/fixtures.js'
import type { Client, TestApp } from '../support/test-app.js'
import { loadSampleArbor } from '../support/tickets.js'
import { startTwoVenues } from '../support/venue-suite.js'

// Invented test data: an imperial venue (alpha) and a metric one (beta), each hanging an electric.
let app: TestApp
let alpha: VenueFixture
let beta: VenueFixture
let operator: Client
let director: Client
let stageManager: Client
let metricOperator: Client
let hangId: string
let totalLoad: number

const electric = (washId: string) => [
  { label: 'Wash', category: 'lighting', itemTypeId: washId, quantity: 5, from: 4, to: 36 },
  { label: 'Cable, stage left', category: 'hardware', weightPerLength: 0.5, from: 0, to: 40 },
  { label: '=HYPERLINK("http://example.test")', category: 'other', weight: 25, at: 20 },
  { label: '-3 dB speaker', category: 'audio-video', weight: 12.25, at: 2.5, quantity: 2 },
]

async function saveElectric(client: Client, linesetId: string, unitSystem: 'imperial' | 'metric') {
  const wash = { name: 'LED wash', category: 'lighting', unitWeight: 12, allowancePerUnit: 2, unitSystem }
  const washId = (await client.post('/api/v1/item-types', wash).expect(201)).body.id
  const body = { title: 'Act one electric', basedOnRevision: null, items: electric(washId), unitSystem }
  const res = await client.post(`/api/v1/linesets/${linesetId}/hangs`, body)
  expect(res.status, res.text).toBe(201)
  return res.body as { id: string; totalLoad: number }
}

beforeAll(async () => {
  const venues = await startTwoVenues('metric')
  ;({ app, alpha, beta } = venues)
  operator = venues.atAlpha['fly-operator']
  director = venues.atAlpha['technical-director']
  stageManager = venues.atAlpha['stage-manager']
  metricOperator = venues.atBeta['fly-operator']
  const saved = await saveElectric(operator, alpha.linesetId, 'imperial')
  hangId = saved.id
  totalLoad = saved.totalLoad
  await saveElectric(metricOperator, beta.linesetId, 'metric')
  await loadSampleArbor(director, alpha, 26)
})
afterAll(() => app.stop())

/** The file as a spreadsheet reads it, after checking what every export promises about its bytes. */
function spreadsheet(res: { status: number; text: string; headers: Record<string, string> }) {
  expect(res.status, res.text).toBe(200)
  expect(res.headers['content-type']).toBe('text/csv; charset=utf-8')
  expect(res.headers['content-disposition']).toMatch(/^attachment; filename="[A-Za-z0-9._-]+\.csv"/)
  expect(res.text.startsWith('\uFEFF')).toBe(true)
  expect(res.text.endsWith('\r\n')).toBe(true)
  expect(res.text.replace(/\r\n/g, '')).not.toMatch(/(?<!")[\r\n](?!")/) // every record ends in CR LF
  return readCsvText(res.text)
}

describe('the lineset schedule as CSV', () => {
  it('when a stage manager downloads it, then each lineset reads with its hang, its load in lb and its bricks', async () => {
    const sheet = spreadsheet(await stageManager.get('/api/v1/schedule.csv').buffer(true))
    expect(sheet.header).toEqual([
      'Number',
      'Name',
      'Kind',
      'Status',
      'Operating status',
      'Hang revision',
      'Hang title',
      'Total load (lb)',
      'Bricks on the arbor: Full (count)',
    ])
    const row = sheet.rows.find((cells) => cells[0] === '1')!
    expect(row.slice(0, 7)).toEqual([
      '1',
      'Test set 1',
      'Counterweight, single purchase',
      'In service',
      row[4],
      '1',
      'Act one electric',
    ])
    expect(Number(row[7])).toBe(totalLoad)
    expect(row[8]).toBe('26')
  })

  it('when a metric venue downloads it, then the load is in kg and only its own linesets are listed', async () => {
    const res = await metricOperator.get('/api/v1/schedule.csv').buffer(true)
    const sheet = spreadsheet(res)
    expect(sheet.header).toContain('Total load (kg)')
    expect(sheet.rows.map((cells) => cells[1])).toEqual(['Test set 1'])
    expect(res.text).not.toContain('Bricks on the arbor')
  })
})

describe("a lineset's ledger as CSV", () => {
  it('when downloaded, then every entry is a record, newest first, with who and what in words', async () => {
    const sheet = spreadsheet(await stageManager.get(`/api/v1/linesets/${alpha.linesetId}/events.csv`).buffer(true))
    expect(sheet.header).toEqual(['When (UTC)', 'Entry', 'Who', 'What happened'])
    expect(sheet.rows.map((cells) => cells[1])).toEqual(['arbor-counted', 'hang-saved', 'lineset-added'])
    expect(sheet.rows[1]![2]).toBe('fly-operator of alpha')
    expect(sheet.rows[1]![3]).toContain('Act one electric')
  })

  it('when another venue asks for it, then 404 and nothing of it is sent', async () => {
    expect((await metricOperator.get(`/api/v1/linesets/${alpha.linesetId}/events.csv`)).status).toBe(404)
  })
})

describe("a hang revision's items as CSV", () => {
  const itemsOf = (linesetId: string, id: string) => `/api/v1/linesets/${linesetId}/hangs/${id}/items.csv`

  it('when downloaded, then text cells that would start a formula begin with an apostrophe and figures stay figures', async () => {
    const res = await stageManager.get(itemsOf(alpha.linesetId, hangId)).buffer(true)
    const sheet = spreadsheet(res)
    expect(sheet.header.slice(0, 6)).toEqual([
      'Label',
      'Category',
      'Library item',
      'Weight (lb)',
      'Weight per length (lb/ft)',
      'Quantity',
    ])
    expect(sheet.rows.map((cells) => cells[0])).toEqual([
      'Wash',
      'Cable, stage left',
      `'=HYPERLINK("http://example.test")`,
      "'-3 dB speaker",
    ])
    expect(res.text).toContain('"Cable, stage left"')
    expect(sheet.rows[0]!.slice(1, 3)).toEqual(['Lighting', 'LED wash'])
    expect(sheet.rows[3]!.slice(3, 7)).toEqual(['12.25', '', '2', '2.5'])
  })

  it("when another venue asks for a hang's items, then 404", async () => {
    expect((await metricOperator.get(itemsOf(alpha.linesetId, hangId))).status).toBe(404)
    expect((await metricOperator.get(itemsOf(beta.linesetId, hangId))).status).toBe(404)
  })
})

describe('export then import of a hang', () => {
  it('when the items CSV is read back and saved as the next revision, then the new revision holds the same hang', async () => {
    const linesetId = alpha.linesetId
    const csv = (await operator.get(`/api/v1/linesets/${linesetId}/hangs/${hangId}/items.csv`).buffer(true)).text
    const library = (await operator.get('/api/v1/item-types').expect(200)).body
    const { header, rows } = readCsvText(csv)
    const read = readImportRows(header, rows, guessMapping(header, 'imperial'), {
      units: 'imperial',
      library,
      defaultCategory: 'other',
    })
    expect(read.flatMap((row) => row.errors)).toEqual([])
    const body = { title: 'Imported', basedOnRevision: 1, items: read.map((row) => row.entry), unitSystem: 'imperial' }
    const saved = await operator.post(`/api/v1/linesets/${linesetId}/hangs`, body)
    expect(saved.status, saved.text).toBe(201)
    const before = (await operator.get(`/api/v1/linesets/${linesetId}/hangs/${hangId}`).expect(200)).body
    const after = (await operator.get(`/api/v1/linesets/${linesetId}/hangs/${saved.body.id}`).expect(200)).body
    expect(after.items).toEqual(before.items)
    expect(after.totalLoad).toBe(before.totalLoad)
  })
})
