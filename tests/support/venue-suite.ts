import { afterAll, beforeAll } from 'vitest'
import { ROLES, type Role } from '../../shared/schemas/role.js'
import type { UnitSystem } from '../../shared/units/systems.js'
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

/** Two venues on one real server, and a client signed in as each member of each. */
export interface TwoVenues {
  app: TestApp
  alpha: VenueFixture
  beta: VenueFixture
  atAlpha: Record<Role, Client>
  atBeta: Record<Role, Client>
}

/**
 * For an API test file that works in venue alpha (imperial) and checks what venue beta (in `betaUnits`) sees:
 * the real server on a database of its own, both venues seeded, and every member of each signed in.
 */
export async function startTwoVenues(betaUnits: UnitSystem = 'imperial'): Promise<TwoVenues> {
  const app = await startTestApp()
  const alpha = await seedVenue(app.handle.context, 'alpha')
  const beta = await seedVenue(app.handle.context, 'beta', betaUnits)
  return { app, alpha, beta, atAlpha: await membersOf(app, alpha), atBeta: await membersOf(app, beta) }
}

async function membersOf(app: TestApp, venue: VenueFixture): Promise<Record<Role, Client>> {
  const clients = {} as Record<Role, Client>
  for (const role of ROLES) clients[role] = await signedIn(app.url, venue.emails[role])
  return clients
}
