import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { seedDemoIfEmpty } from '../../server/db/seeders/demo.js'
import { DEMO_LINESETS } from '../../server/db/seeders/demo-linesets.js'
import { DEMO_PASSWORD } from '../../server/db/seeders/demo-people.js'
import { signedIn, startTestApp, type TestApp } from '../support/test-app.js'

let app: TestApp

beforeAll(async () => {
  app = await startTestApp()
  expect(await seedDemoIfEmpty(app.handle.context)).toBe(true)
})
afterAll(() => app.stop())

describe('the demo venue', () => {
  it('when the demo is seeded, then every lineset has exactly one lineset-added ledger entry, by its administrator', async () => {
    const { Lineset, LinesetEvent, User } = app.handle.db.models
    const linesets = await Lineset.findAll({ attributes: ['id'] })
    expect(linesets).toHaveLength(DEMO_LINESETS.length)
    const administrator = await User.findOne({ where: { email: 'admin@demo.test' } })
    for (const { id } of linesets) {
      const entries = await LinesetEvent.findAll({ where: { linesetId: id } })
      expect(entries.map((entry) => [entry.eventType, entry.actorId])).toEqual([['lineset-added', administrator!.id]])
    }
  })

  it('when the demo is read through the API, then its history shows the addition in plain words', async () => {
    const reader = await signedIn(app.url, 'sm@demo.test', DEMO_PASSWORD)
    const first = (await reader.get('/api/v1/linesets').expect(200)).body[0]
    const history = (await reader.get(`/api/v1/linesets/${first.id}/events`).expect(200)).body
    expect(history.events.map((e: { summary: string }) => e.summary)).toEqual([`Added as lineset 1, ${first.name}`])
  })

  it('when seeding is asked again, then it leaves the venue as it was', async () => {
    expect(await seedDemoIfEmpty(app.handle.context)).toBe(false)
    expect(await app.handle.db.models.Venue.count()).toBe(1)
  })
})
