import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { seedVenue, type VenueFixture } from '../support/fixtures.js'
import { Client, startTestApp, type TestApp } from '../support/test-app.js'

let app: TestApp
let venue: VenueFixture

beforeAll(async () => {
  app = await startTestApp()
  venue = await seedVenue(app.handle.context, 'alpha')
})
afterAll(() => app.stop())

describe('failed sign-ins are limited per address', () => {
  it('when one address fails more than 10 times in a minute, then the next try answers 429, even with the right password', async () => {
    const client = new Client(app.url)
    await client.refreshToken()
    const good = await client.signIn(venue.emails['fly-operator'])
    expect(good.status).toBe(200) // a success does not count against the address
    for (let attempt = 1; attempt <= 10; attempt++) {
      const res = await client.signIn(venue.emails.administrator, `wrong-${attempt}`)
      expect(res.status, `attempt ${attempt}`).toBe(401)
    }
    const blocked = await client.signIn(venue.emails.administrator)
    expect(blocked.status).toBe(429)
    expect(blocked.body.error.code).toBe('too_many_attempts')
    expect(blocked.headers['ratelimit-policy']).toBeDefined()
  })

  it('when the counters live in PostgreSQL, then a second app process on the same database sees them', async () => {
    const other = await startTestApp({ databaseUrl: app.databaseUrl })
    try {
      const res = await new Client(other.url).signIn(venue.emails.administrator)
      expect(res.status).toBe(429)
    } finally {
      await other.stop()
    }
  })
})
