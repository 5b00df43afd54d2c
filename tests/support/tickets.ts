import type { BrickStockLine } from '../../shared/schemas/arbor.js'
import { sampleLineset, type VenueFixture } from './fixtures.js'
import type { Client } from './test-app.js'

// The sample lineset (40 ft batten at 2.72 lb/ft, arbor 90 lb empty with 110 lb of pipe weight aboard) with the
// fixture's 20 lb bricks: a 200 lb drop needs about 109 lb of bricks, so the plan is five (invented test data).

/** A new counterweight lineset (made by `director`) with one saved hang of `weight` lb at mid-batten. */
export async function hungLineset(director: Client, hangEditor: Client, number: number, weight = 200, overrides = {}) {
  const id = (await director.post('/api/v1/linesets', sampleLineset(number, overrides)).expect(201)).body.id as string
  const hang = await saveRevision(hangEditor, id, null, weight)
  return { id, hang }
}

/** Saves the next revision of a lineset's hang: one drop of `weight` lb at 20 ft. */
export async function saveRevision(client: Client, linesetId: string, basedOnRevision: number | null, weight: number) {
  const res = await client
    .post(`/api/v1/linesets/${linesetId}/hangs`, {
      title: `Drop of ${weight} lb`,
      basedOnRevision,
      items: [{ label: 'Drop', category: 'scenery', weight, at: 20 }],
      unitSystem: 'imperial',
    })
    .expect(201)
  return res.body as { id: string; revision: number }
}

/** One brick type's line on the stock page. */
export async function stockLine(client: Client, brickTypeId: string) {
  const lines = (await client.get('/api/v1/brick-stock').expect(200)).body as BrickStockLine[]
  return lines.find((line) => line.brickTypeId === brickTypeId)!
}

/** A lineset's operating status as the list shows it. */
export async function operatingStatusOf(client: Client, linesetId: string) {
  return ((await client.get(`/api/v1/linesets/${linesetId}`).expect(200)).body as { operatingStatus: string })
    .operatingStatus
}

/** Puts `count` of the venue's brick type on its sample lineset's arbor, at the version the arbor is read at. */
export async function loadSampleArbor(client: Client, venue: VenueFixture, count: number) {
  const arbor = (await client.get(`/api/v1/linesets/${venue.linesetId}/arbor`).expect(200)).body
  await client
    .put(`/api/v1/linesets/${venue.linesetId}/arbor`, {
      version: arbor.version,
      bricks: [{ brickTypeId: venue.brickTypeId, count }],
    })
    .expect(200)
}
