import type { IncomingMessage } from 'node:http'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { ROLES, type Role } from '../../shared/schemas/role.js'
import { sampleBrickType, sampleLineset, seedVenue, type VenueFixture } from '../support/fixtures.js'
import { Client, signedIn, startTestApp, type TestApp } from '../support/test-app.js'

// One table: every route, the status each role gets. Writes that succeed are given bodies that are
// valid, so a 2xx proves the role was let through and a 403 that it was stopped before the service.
type Method = 'get' | 'post' | 'put' | 'delete'
interface RouteCase {
  method: Method
  path: (f: VenueFixture) => string
  body?: (f: VenueFixture, role: Role) => object
  expected: Record<Role, number>
  /** An event stream: read only until its first bytes, then closed. */
  stream?: true
}

const all = (status: number): Record<Role, number> => ({
  administrator: status,
  'technical-director': status,
  'fly-operator': status,
  'stage-manager': status,
})
const editors = (ok: number): Record<Role, number> => ({
  administrator: ok,
  'technical-director': ok,
  'fly-operator': 403,
  'stage-manager': 403,
})
const hangEditors = (ok: number): Record<Role, number> => ({
  administrator: ok,
  'technical-director': ok,
  'fly-operator': ok,
  'stage-manager': 403,
})
const adminOnly = (ok: number): Record<Role, number> => ({
  administrator: ok,
  'technical-director': 403,
  'fly-operator': 403,
  'stage-manager': 403,
})
const preRunCheckers = (ok: number): Record<Role, number> => ({
  administrator: ok,
  'technical-director': ok,
  'fly-operator': 403,
  'stage-manager': ok,
})
const numberFor: Record<Role, number> = {
  administrator: 101,
  'technical-director': 102,
  'fly-operator': 103,
  'stage-manager': 104,
}

const calculation = {
  units: 'imperial',
  kind: 'counterweight-single',
  batten: { length: 40, weightPerLength: 2.72, pickPoints: [0, 20, 40] },
  items: [],
  arbor: { emptyWeight: 90, capacity: 2000, stackLength: 60 },
  bricks: [{ name: 'full', weight: 20, thickness: 2, available: 80 }],
  liftLine: { weightPerLength: 0.11, breakingStrength: 7000, designFactor: 8 },
  tolerance: 10,
}

// No ticket has this id: a role let through reaches the service and hears 404.
const NO_TICKET = '00000000-0000-4000-8000-000000000000'

const ROUTES: RouteCase[] = [
  { method: 'get', path: () => '/api/v1/venue', expected: all(200) },
  {
    method: 'put',
    path: () => '/api/v1/venue',
    body: () => ({
      name: 'Renamed',
      unitSystem: 'imperial',
      balanceTolerance: 10,
      ropeLockHolding: 50,
      wireRopeDesignFactor: 8,
      version: 999,
    }),
    expected: editors(409),
  },
  { method: 'get', path: () => '/api/v1/linesets', expected: all(200) },
  { method: 'get', path: (f) => `/api/v1/linesets/${f.linesetId}`, expected: all(200) },
  { method: 'get', path: (f) => `/api/v1/linesets/${f.linesetId}/events`, expected: all(200) },
  {
    method: 'post',
    path: () => '/api/v1/linesets',
    body: (_f, role) => sampleLineset(numberFor[role]),
    expected: editors(201),
  },
  {
    method: 'put',
    path: (f) => `/api/v1/linesets/${f.linesetId}`,
    body: () => ({ ...sampleLineset(1), version: 999 }),
    expected: editors(409),
  },
  { method: 'delete', path: () => '/api/v1/linesets/00000000-0000-4000-8000-000000000000', expected: adminOnly(404) },
  { method: 'get', path: (f) => `/api/v1/linesets/${f.linesetId}/hangs`, expected: all(200) },
  {
    method: 'post',
    path: (f) => `/api/v1/linesets/${f.linesetId}/hangs`,
    // Based on a revision that does not exist: a role let through meets the 409, one stopped meets 403.
    body: () => ({ title: 'Electric', basedOnRevision: 999, items: [], unitSystem: 'imperial' }),
    expected: hangEditors(409),
  },
  {
    method: 'get',
    path: (f) => `/api/v1/linesets/${f.linesetId}/hangs/00000000-0000-4000-8000-000000000000`,
    expected: all(404),
  },
  { method: 'get', path: () => '/api/v1/brick-types', expected: all(200) },
  {
    method: 'post',
    path: () => '/api/v1/brick-types',
    body: (_f, role) => sampleBrickType(`Brick ${role}`),
    expected: editors(201),
  },
  {
    method: 'put',
    path: (f) => `/api/v1/brick-types/${f.brickTypeId}`,
    body: () => sampleBrickType('Full', { version: 999 }),
    expected: editors(409),
  },
  { method: 'delete', path: () => '/api/v1/brick-types/00000000-0000-4000-8000-000000000000', expected: editors(404) },
  { method: 'get', path: (f) => `/api/v1/linesets/${f.linesetId}/arbor`, expected: all(200) },
  {
    method: 'put',
    path: (f) => `/api/v1/linesets/${f.linesetId}/arbor`,
    body: (f) => ({ version: 999, bricks: [{ brickTypeId: f.brickTypeId, count: 1 }] }),
    expected: editors(409),
  },
  {
    method: 'post',
    path: () => '/api/v1/linesets/00000000-0000-4000-8000-000000000000/lockout',
    body: () => ({ reason: 'Roles' }),
    expected: editors(404),
  },
  {
    method: 'delete',
    path: () => '/api/v1/linesets/00000000-0000-4000-8000-000000000000/lockout',
    body: () => ({ reason: 'Roles' }),
    expected: editors(404),
  },
  { method: 'get', path: () => '/api/v1/brick-stock', expected: all(200) },
  { method: 'get', path: (f) => `/api/v1/linesets/${f.linesetId}/attachments`, expected: all(200) },
  {
    method: 'post',
    path: (f) => `/api/v1/linesets/${f.linesetId}/attachments`,
    // A JSON body carries no file: a role let through meets the 400 naming the file, one stopped meets 403.
    body: () => ({ hangItemId: NO_TICKET }),
    expected: hangEditors(400),
  },
  { method: 'get', path: () => `/api/v1/attachments/${NO_TICKET}/content`, expected: all(404) },
  { method: 'get', path: () => `/api/v1/attachments/${NO_TICKET}/thumbnail`, expected: all(404) },
  { method: 'delete', path: () => `/api/v1/attachments/${NO_TICKET}`, expected: hangEditors(404) },
  { method: 'get', path: () => '/api/v1/item-types', expected: all(200) },
  {
    method: 'post',
    path: () => '/api/v1/item-types',
    body: (_f, role) => ({
      name: `Wash ${role}`,
      category: 'lighting',
      unitWeight: 11,
      allowancePerUnit: 1.5,
      unitSystem: 'imperial',
    }),
    expected: hangEditors(201),
  },
  {
    method: 'put',
    path: () => '/api/v1/item-types/00000000-0000-4000-8000-000000000000',
    body: () => ({
      name: 'Wash',
      category: 'lighting',
      unitWeight: 11,
      allowancePerUnit: 1.5,
      unitSystem: 'imperial',
      version: 0,
    }),
    expected: hangEditors(404),
  },
  {
    method: 'delete',
    path: () => '/api/v1/item-types/00000000-0000-4000-8000-000000000000',
    expected: hangEditors(404),
  },
  { method: 'get', path: () => '/api/v1/productions', expected: all(200) },
  {
    method: 'post',
    path: () => '/api/v1/productions',
    body: (_f, role) => ({
      name: `Show ${role}`,
      firstPerformance: '2026-11-20',
      lastPerformance: '2027-01-10',
      state: 'planning',
    }),
    expected: editors(201),
  },
  {
    method: 'put',
    path: () => '/api/v1/productions/00000000-0000-4000-8000-000000000000',
    body: () => ({
      name: 'Show',
      firstPerformance: '2026-11-20',
      lastPerformance: '2027-01-10',
      state: 'running',
      version: 0,
    }),
    expected: editors(404),
  },
  { method: 'get', path: () => '/api/v1/people', expected: adminOnly(200) },
  {
    method: 'post',
    path: () => '/api/v1/people',
    body: (_f, role) => ({
      email: `new-${role}@alpha.test`,
      name: 'New person',
      role: 'stage-manager',
    }),
    expected: adminOnly(201),
  },
  { method: 'get', path: () => '/api/v1/invitations', expected: adminOnly(200) },
  {
    method: 'delete',
    path: () => '/api/v1/invitations/00000000-0000-4000-8000-000000000000',
    expected: adminOnly(404),
  },
  {
    method: 'put',
    path: (f) => `/api/v1/people/${f.membershipIds['stage-manager']}`,
    body: () => ({ role: 'stage-manager', version: 999 }),
    expected: adminOnly(409),
  },
  { method: 'delete', path: () => '/api/v1/people/00000000-0000-4000-8000-000000000000', expected: adminOnly(404) },
  { method: 'get', path: () => '/api/v1/outbox', expected: adminOnly(200) },
  { method: 'get', path: () => '/api/v1/outbox/00000000-0000-4000-8000-000000000000', expected: adminOnly(404) },
  { method: 'get', path: () => '/api/v1/tickets', expected: all(200) },
  { method: 'get', path: () => `/api/v1/tickets/${NO_TICKET}`, expected: all(404) },
  {
    method: 'post',
    path: () => '/api/v1/tickets',
    body: () => ({ hangId: NO_TICKET }),
    expected: hangEditors(404),
  },
  {
    method: 'post',
    path: () => `/api/v1/tickets/${NO_TICKET}/approve`,
    body: () => ({ version: 0 }),
    expected: editors(404),
  },
  {
    method: 'post',
    path: () => `/api/v1/tickets/${NO_TICKET}/decline`,
    body: () => ({ version: 0, comment: 'Roles' }),
    expected: editors(404),
  },
  {
    method: 'post',
    path: () => `/api/v1/tickets/${NO_TICKET}/withdraw`,
    body: () => ({ version: 0 }),
    expected: hangEditors(404),
  },
  {
    method: 'post',
    path: () => `/api/v1/tickets/${NO_TICKET}/start-loading`,
    body: () => ({ version: 0 }),
    expected: hangEditors(404),
  },
  {
    method: 'post',
    path: () => `/api/v1/tickets/${NO_TICKET}/complete`,
    body: () => ({ version: 0, loaded: [], feltBalance: 'balanced' }),
    expected: hangEditors(404),
  },
  { method: 'post', path: () => '/api/v1/calculations', body: () => calculation, expected: all(200) },
  { method: 'get', path: () => '/api/v1/board', expected: all(200) },
  { method: 'get', path: () => '/api/v1/board/stream', expected: all(200), stream: true },
  { method: 'get', path: () => '/api/v1/pre-run-checks', expected: all(200) },
  { method: 'get', path: () => '/api/v1/pre-run-checks/latest', expected: all(200) },
  {
    method: 'post',
    path: () => '/api/v1/pre-run-checks',
    body: (_f, role) => ({ note: `Roles ${role}` }),
    expected: preRunCheckers(201),
  },
  { method: 'get', path: () => '/api/v1/schedule.csv', expected: all(200) },
  { method: 'get', path: (f) => `/api/v1/linesets/${f.linesetId}/events.csv`, expected: all(200) },
  {
    method: 'get',
    path: (f) => `/api/v1/linesets/${f.linesetId}/hangs/00000000-0000-4000-8000-000000000000/items.csv`,
    expected: all(404),
  },
  { method: 'get', path: () => '/api/v1/schedule.pdf', expected: all(200) },
  { method: 'get', path: (f) => `/api/v1/linesets/${f.linesetId}/rail-card.pdf`, expected: all(200) },
]

/**
 * Reads an event stream only until its first bytes arrive, then closes it (it would never end); any other
 * answer (a refusal's JSON) is read whole.
 */
const untilFirstBytes = (res: IncomingMessage, done: (error: Error | null, body: unknown) => void) => {
  if (!String(res.headers['content-type']).startsWith('text/event-stream')) {
    let text = ''
    res.setEncoding('utf8')
    res.on('data', (chunk: string) => (text += chunk))
    res.on('end', () => done(null, text ? JSON.parse(text) : {}))
    return
  }
  res.once('data', () => {
    done(null, {})
    res.destroy()
  })
}

let app: TestApp
let venue: VenueFixture
const clients = {} as Record<Role, Client>

beforeAll(async () => {
  app = await startTestApp()
  venue = await seedVenue(app.handle.context, 'alpha')
  for (const role of ROLES) clients[role] = await signedIn(app.url, venue.emails[role])
})
afterAll(() => app.stop())

const send = (client: Client, route: RouteCase, role: Role | null) => {
  const path = route.path(venue)
  const body = route.body?.(venue, role ?? 'administrator')
  if (route.stream)
    return client
      .get(path)
      .buffer(true)
      .parse((res, done) => untilFirstBytes(res as unknown as IncomingMessage, done))
  return route.method === 'get' ? client.get(path) : client[route.method](path, body)
}

// Placeholders so the test names read `/api/v1/linesets/:id`.
const named = {
  linesetId: ':id',
  brickTypeId: ':id',
  membershipIds: { 'stage-manager': ':id' },
} as unknown as VenueFixture

// Routes anyone may call (signing in, following an invitation link); their own tests cover them.
const OPEN_TO_ANYONE = [
  'GET /api/v1/session',
  'POST /api/v1/session',
  'DELETE /api/v1/session',
  'POST /api/v1/invitations/lookup',
  'POST /api/v1/invitations/accept',
]

const UUID = '[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}'

/** A row's route as the router declares it: ids written as `:id` (a hang within a lineset as `:hangId`). */
const labelOf = (route: RouteCase) =>
  `${route.method.toUpperCase()} ${route
    .path(named)
    .replace(new RegExp(`(/hangs/)${UUID}`), '$1:hangId')
    .replace(new RegExp(UUID, 'g'), ':id')}`

describe('role x route matrix', () => {
  it('when the app mounts its routes, then every one has a row in this table or is open to anyone, and no row names a route that is gone', () => {
    const covered = [...ROUTES.map(labelOf), ...OPEN_TO_ANYONE].sort()
    expect([...new Set(covered)]).toEqual([...new Set(app.handle.routes)].sort())
  })

  for (const route of ROUTES) {
    const label = labelOf(route)
    for (const role of ROLES) {
      it(`when a ${role} calls ${label}, then it answers ${route.expected[role]}`, async () => {
        const res = await send(clients[role], route, role)
        expect(res.status, JSON.stringify(res.body)).toBe(route.expected[role])
        if (res.status === 403) expect(res.body.error.code).toBe('forbidden')
      })
    }
    it(`when nobody is signed in and calls ${label}, then it answers 401`, async () => {
      const anonymous = new Client(app.url)
      await anonymous.refreshToken()
      const res = await send(anonymous, route, null)
      expect(res.status).toBe(401)
      expect(res.body.error.code).toBe('not_signed_in')
    })
  }

  it('when an unknown API route is called, then it answers a JSON 404', async () => {
    const res = await clients.administrator.get('/api/v1/no-such-thing')
    expect(res.status).toBe(404)
    expect(res.body.error.code).toBe('not_found')
  })
})
