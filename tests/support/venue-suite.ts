import { afterAll, beforeAll } from 'vitest'
import type { Role } from '../../shared/schemas/role.js'
import { seedVenue, type VenueFixture } from './fixtures.js'
import { signedIn, startTestApp, type Client, type TestApp } from './test-app.js'

/**
 * For an API test file: the real server on a database of its own, one seeded venue, and a client signed in
 * as one of its members. Read the fields inside tests (they exist after beforeAll).
 */
export function venueSuite(role: Role = 'administrator', key = 'alpha') {
  const suite = {} as { app: TestApp; venue: VenueFixture; client: Client }
  beforeAll(async () => {
    suite.app = await startTestApp()
    suite.venue = await seedVenue(suite.app.handle.context, key)
    suite.client = await signedIn(suite.app.url, suite.venue.emails[role])
  })
  afterAll(() => suite.app?.stop())
  return suite
}
