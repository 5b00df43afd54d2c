import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { LiveEvent } from '../../server/live/live-publisher.js'
import { listenLive, type LiveListener } from '../../server/live/postgres-live.js'
import { sampleLineset, seedVenue, type VenueFixture } from '../support/fixtures.js'
import { signedIn, startTestApp, type Client, type TestApp } from '../support/test-app.js'

let app: TestApp
let venue: VenueFixture
let listener: LiveListener
const heard: LiveEvent[] = []

beforeAll(async () => {
  app = await startTestApp()
  venue = await seedVenue(app.handle.context, 'alpha')
  listener = await listenLive(app.databaseUrl, (event) => heard.push(event))
})
afterAll(async () => {
  await listener.close()
  await app.stop()
})

/** Waits until an event matching `wanted` has been heard (the listener has its own connection). */
async function heardEvent(wanted: (event: LiveEvent) => boolean) {
  await expect.poll(() => heard.find(wanted), { timeout: 5000, interval: 20 }).toBeDefined()
  return heard.find(wanted)!
}

describe('live events', () => {
  it('when a change is rolled back and a later one commits, then only the committed one is heard', async () => {
    const { db, live } = app.handle.context
    const event = (linesetId: string): LiveEvent => ({ type: 'lineset-changed', venueId: venue.venueId, linesetId })
    const rolledBack = '00000000-0000-4000-8000-00000000dead'
    const committed = '00000000-0000-4000-8000-00000000beef'
    await expect(
      db.sequelize.transaction(async (transaction) => {
        await live.publish(event(rolledBack), transaction)
        throw new Error('changed my mind')
      }),
    ).rejects.toThrow('changed my mind')
    await db.sequelize.transaction((transaction) => live.publish(event(committed), transaction))
    await heardEvent((e) => e.linesetId === committed)
    // Notifications from one server arrive in commit order: had the first been delivered, it would be here.
    expect(heard.some((e) => e.linesetId === rolledBack)).toBe(false)
  })

  it('when a lineset is added, changed and retired, then each is announced with its id', async () => {
    const admin: Client = await signedIn(app.url, venue.emails.administrator)
    const created = (await admin.post('/api/v1/linesets', sampleLineset(7)).expect(201)).body
    await admin.put(`/api/v1/linesets/${created.id}`, { ...created, name: 'Renamed' }).expect(200)
    await admin.delete(`/api/v1/linesets/${created.id}`).expect(204)
    for (const type of ['lineset-added', 'lineset-changed', 'lineset-retired'] as const)
      expect(await heardEvent((e) => e.linesetId === created.id && e.type === type)).toEqual({
        type,
        venueId: venue.venueId,
        linesetId: created.id,
        eventId: expect.stringMatching(/^[1-9]\d*$/),
        horizon: expect.stringMatching(/^\d+$/),
      })
  })

  it('when a save is refused, then nothing is announced for it', async () => {
    const admin = await signedIn(app.url, venue.emails.administrator)
    const current = (await admin.get(`/api/v1/linesets/${venue.linesetId}`).expect(200)).body
    await admin.put(`/api/v1/linesets/${venue.linesetId}`, { ...current, version: current.version + 5 }).expect(409)
    const marker = (await admin.post('/api/v1/linesets', sampleLineset(8)).expect(201)).body
    await heardEvent((e) => e.linesetId === marker.id)
    expect(heard.some((e) => e.linesetId === venue.linesetId && e.type === 'lineset-changed')).toBe(false)
  })
})
