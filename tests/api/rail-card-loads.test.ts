import { PDFParse } from 'pdf-parse'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { sampleLineset, seedVenue, type VenueFixture } from '../support/fixtures.js'
import { signedIn, startTestApp, type Client, type TestApp } from '../support/test-app.js'

let app: TestApp
let venue: VenueFixture
let director: Client

beforeAll(async () => {
  app = await startTestApp()
  venue = await seedVenue(app.handle.context, 'railcard')
  director = await signedIn(app.url, venue.emails['technical-director'])
})
afterAll(() => app.stop())

// Issue 13's long batten: 49 ft of 2.72 lb/ft on lines at 2, 11, 20, 29, 38 and 47 ft with 450 lb at 12 ft; with
// line 1 slack the others carry 449.50, 78.51, 9.66, 30.34 and 15.27 lb.
async function longBatten(number: number, stretch: Record<string, unknown>) {
  const body = sampleLineset(number, {
    battenLength: 49,
    pipeSize: 'nps-1-1/2-sch40',
    pipeWeightPerLength: 2.72,
    pickPoints: [2, 11, 20, 29, 38, 47],
    ...stretch,
  })
  const lineset = (await director.post('/api/v1/linesets', body).expect(201)).body
  const hang = {
    title: 'Heavy unit',
    basedOnRevision: null,
    items: [{ label: 'Heavy unit', category: 'scenery', weight: 450, at: 12 }],
    unitSystem: 'imperial',
  }
  await director.post(`/api/v1/linesets/${lineset.id}/hangs`, hang).expect(201)
  return lineset.id as string
}

async function cardText(linesetId: string) {
  const res = await director
    .get(`/api/v1/linesets/${linesetId}/rail-card.pdf`)
    .buffer(true)
    .parse((stream, done) => {
      const chunks: Buffer[] = []
      stream.on('data', (chunk: Buffer) => chunks.push(chunk))
      stream.on('end', () => done(null, Buffer.concat(chunks)))
    })
  expect(res.status).toBe(200)
  const text = await new PDFParse({ data: new Uint8Array(res.body as Buffer) }).getText()
  return { pages: text.total, text: text.text.replace(/\s+/g, ' ') }
}

describe('the rail card prints the line loads the crew acts on', () => {
  it('when a line goes slack, then the card says which one first and prints what the others then carry', async () => {
    const card = await cardText(await longBatten(81, {}))
    expect(card.pages).toBe(1)
    const slack = card.text.indexOf('DANGER, slack line: the lift line at 2 ft goes slack and carries nothing.')
    const others = card.text.indexOf('The others then carry 449.5 lb at 11 ft, 78.51 lb at 20 ft, 9.66 lb at 29 ft')
    expect(slack).toBeGreaterThan(-1)
    expect(others).toBeGreaterThan(slack)
    expect(card.text).not.toContain('With the lines stretching')
  })

  it('when the lineset says how its lines stretch, then the card prints those loads and the basis of the stiffness', async () => {
    const stretch = { liftLineLengths: [60, 69, 78, 87, 96, 105], liftLineRope: '7x19-galvanized-1/4' }
    const card = await cardText(await longBatten(82, stretch))
    expect(card.pages).toBe(1)
    expect(card.text).toContain('DANGER, slack line: the lift line at 2 ft goes slack')
    const caution = card.text.indexOf('CAUTION: stretching lines move up to')
    const loads = card.text.indexOf('With the lines stretching: 0 lb at 2 ft, ')
    expect(caution).toBeGreaterThan(-1)
    expect(loads).toBeGreaterThan(caution)
    expect(card.text).toContain('Stiffness basis: rope table')
    expect(card.text).toContain('(from memory, unverified)')
  })
})
