import { mkdirSync, writeFileSync } from 'node:fs'
import jsQRModule from 'jsqr'
import { PDFParse } from 'pdf-parse'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { BALANCE_CAUTIONS } from '../../shared/engine/cautions.js'
import type { VenueFixture } from '../support/fixtures.js'
import type { Client, TestApp } from '../support/test-app.js'
import { loadSampleArbor } from '../support/tickets.js'
import { startTwoVenues } from '../support/venue-suite.js'

// Invented test data: the sample lineset (arbor 90 lb empty, 110 lb of pipe weight aboard, rated 1,000 lb,
// arbor capacity 2,000 lb) hung with a 25 lb piece and a 0.5 lb/ft cable, in an imperial and a metric venue.
let app: TestApp
let alpha: VenueFixture
let beta: VenueFixture
let operator: Client
let director: Client
let stageManager: Client
let metricOperator: Client

// In lb, 105 + 0.5 x 40 = 125 lb on the 108.8 lb batten outweighs the 200 lb of arbor frame and pipe weight, so the
// plan adds bricks (a lighter hang would leave the arbor heavy even empty, and no ticket opens on that).
const hang = (unitSystem: 'imperial' | 'metric') => ({
  title: 'Act one electric',
  basedOnRevision: null,
  items: [
    { label: 'Sandbag', category: 'hardware', weight: unitSystem === 'imperial' ? 105 : 25, at: 20 },
    { label: 'Cable', category: 'hardware', weightPerLength: 0.5, from: 0, to: 40 },
  ],
  unitSystem,
})

beforeAll(async () => {
  const venues = await startTwoVenues('metric')
  ;({ app, alpha, beta } = venues)
  operator = venues.atAlpha['fly-operator']
  director = venues.atAlpha['technical-director']
  stageManager = venues.atAlpha['stage-manager']
  metricOperator = venues.atBeta['fly-operator']
  const metricDirector = venues.atBeta['technical-director']
  const saved = (await operator.post(`/api/v1/linesets/${alpha.linesetId}/hangs`, hang('imperial')).expect(201)).body
  await metricDirector.post(`/api/v1/linesets/${beta.linesetId}/hangs`, hang('metric')).expect(201)
  await loadSampleArbor(director, alpha, 2)
  await loadSampleArbor(metricDirector, beta, 3)
  const ticket = (await operator.post('/api/v1/tickets', { hangId: saved.id }).expect(201)).body
  await director.post(`/api/v1/tickets/${ticket.id}/approve`, { version: ticket.version }).expect(200)
})
afterAll(() => app.stop())

// jsqr is CommonJS declaring an ES default export: under NodeNext the default import is the module object.
type Decode = (data: Uint8ClampedArray, width: number, height: number) => { data: string } | null
const jsQR = (jsQRModule as unknown as { default: Decode }).default

async function pdfOf(client: Client, path: string) {
  const res = await client
    .get(path)
    .buffer(true)
    .parse((stream, done) => {
      const chunks: Buffer[] = []
      stream.on('data', (chunk: Buffer) => chunks.push(chunk))
      stream.on('end', () => done(null, Buffer.concat(chunks)))
    })
  expect(res.status).toBe(200)
  expect(res.headers['content-type']).toBe('application/pdf')
  expect(res.headers['content-disposition']).toMatch(/^inline; filename="[A-Za-z0-9._-]+\.pdf"/)
  const parser = new PDFParse({ data: new Uint8Array(res.body as Buffer) })
  const text = await parser.getText()
  return { parser, text: text.text.replace(/\s+/g, ' '), pages: text.total, bytes: res.body as Buffer }
}

const today = () => new Date().toISOString().slice(0, 10)

describe('the rail card', () => {
  it('when a stage manager prints it in an imperial venue, then one page carries the figures in lb and who approved', async () => {
    const card = await pdfOf(stageManager, `/api/v1/linesets/${alpha.linesetId}/rail-card.pdf`)
    expect(card.pages).toBe(1)
    for (const words of [
      'Lineset 1',
      'Test set 1',
      'Counterweight, single purchase · In service',
      'Revision 1, “Act one electric”: 2 items',
      '2 × Full (20 lb each); 40 lb of bricks',
      'Rated load:',
      'of 1,000 lb',
      'Arbor capacity: 40 lb of 2,000 lb (2 %) in bricks',
      'Out of balance at the batten:',
      BALANCE_CAUTIONS[0]!,
      'Last change approved by technical-director of alpha',
      `Printed ${today()}`,
    ])
      expect(card.text).toContain(words)
  })

  it('when a metric venue prints it, then its figures are in kg', async () => {
    const card = await pdfOf(metricOperator, `/api/v1/linesets/${beta.linesetId}/rail-card.pdf`)
    expect(card.pages).toBe(1)
    expect(card.text).toContain('3 × Full (9 kg each); 27 kg of bricks')
    expect(card.text).toContain('of 2,000 kg')
    expect(card.text).not.toMatch(/\d lb\b/)
    expect(card.text).toContain('No weight change approved in Loftledger yet')
  })

  it('when the card is rendered to an image, then its QR code reads as the link to the lineset page', async () => {
    const card = await pdfOf(stageManager, `/api/v1/linesets/${alpha.linesetId}/rail-card.pdf`)
    const shot = await card.parser.getScreenshot({ scale: 3, imageBuffer: true, imageDataUrl: false })
    const png = shot.pages[0]!.data
    mkdirSync('tests/artifacts', { recursive: true })
    writeFileSync('tests/artifacts/rail-card.png', png)
    const { createCanvas, loadImage } = await import('@napi-rs/canvas')
    const image = await loadImage(Buffer.from(png))
    const canvas = createCanvas(image.width, image.height)
    const context = canvas.getContext('2d')
    context.drawImage(image, 0, 0)
    const pixels = context.getImageData(0, 0, image.width, image.height)
    const code = jsQR(new Uint8ClampedArray(pixels.data), image.width, image.height)
    expect(code?.data).toBe(`${app.config.publicUrl}/linesets/${alpha.linesetId}`)
  })

  it("when another venue asks for a lineset's card, then 404", async () => {
    expect((await metricOperator.get(`/api/v1/linesets/${alpha.linesetId}/rail-card.pdf`)).status).toBe(404)
  })
})

describe('the lineset schedule as PDF', () => {
  it('when printed in an imperial venue, then each lineset has its row with status, hang, load in lb, arbor and page numbers', async () => {
    const more = Array.from({ length: 40 }, (_, i) => i + 2)
    for (const number of more) await director.post('/api/v1/linesets', { ...(await sampleBody(number)) }).expect(201)
    const schedule = await pdfOf(stageManager, '/api/v1/schedule.pdf')
    expect(schedule.pages).toBeGreaterThan(1)
    expect(schedule.text).toContain(`page 1 of ${schedule.pages}`)
    expect(schedule.text).toContain(`page ${schedule.pages} of ${schedule.pages}`)
    expect(schedule.text).toContain(`Printed ${today()} · loads in lb · 41 linesets`)
    expect(schedule.text).toMatch(
      /1 Test set 1 Counterweight, single purchase Ready 1: Act one electric [\d,.]+ lb 2 × Full/,
    )
    expect(schedule.text).toContain('Test set 41')
  })

  it('when printed in a metric venue, then the loads are in kg', async () => {
    const schedule = await pdfOf(metricOperator, '/api/v1/schedule.pdf')
    expect(schedule.pages).toBe(1)
    expect(schedule.text).toContain('loads in kg · 1 linesets')
    expect(schedule.text).toMatch(/Act one electric [\d,.]+ kg 3 × Full/)
  })
})

async function sampleBody(number: number) {
  const { sampleLineset } = await import('../support/fixtures.js')
  return sampleLineset(number)
}
