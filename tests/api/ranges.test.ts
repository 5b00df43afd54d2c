import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { ErrorBody } from '../../shared/errors/fields.js'
import { PROBE_REQUEST } from '../support/bad-calculation-inputs.js'
import { sampleLineset, seedVenue, type VenueFixture } from '../support/fixtures.js'
import { signedIn, startTestApp, type Client, type TestApp } from '../support/test-app.js'

// The hostile probe's requests (issue 7, parts 1 and 2): each is refused with 400 on its field, never 500, and
// stores nothing.

let app: TestApp
let venue: VenueFixture
let metricVenue: VenueFixture
let td: Client
let admin: Client

beforeAll(async () => {
  app = await startTestApp()
  venue = await seedVenue(app.handle.context, 'alpha')
  metricVenue = await seedVenue(app.handle.context, 'beta', 'metric')
  td = await signedIn(app.url, venue.emails['technical-director'])
  admin = await signedIn(app.url, venue.emails.administrator)
})
afterAll(() => app.stop())

const snapshot = async () => ({
  linesets: (await td.get('/api/v1/linesets')).body,
  bricks: (await td.get('/api/v1/brick-types')).body,
  venue: (await td.get('/api/v1/venue')).body,
  people: (await admin.get('/api/v1/people')).body,
  events: await app.handle.db.models.LinesetEvent.count(),
})

async function expectRefused(
  send: () => PromiseLike<{ status: number; body: ErrorBody }>,
  fields: Record<string, string | RegExp>,
) {
  const before = await snapshot()
  const res = await send()
  expect(res.status, JSON.stringify(res.body)).toBe(400)
  expect(res.body.error.code).toBe('validation_failed')
  for (const [field, message] of Object.entries(fields)) expect(res.body.error.fields?.[field]).toMatch(message)
  expect(await snapshot()).toEqual(before)
}

const currentLineset = async () => {
  const { id: _id, updatedAt: _updatedAt, ...body } = (await td.get(`/api/v1/linesets/${venue.linesetId}`)).body
  return body
}

describe('figures outside their physical ranges', () => {
  it("when the probe's calculation (an item of 1e11 lb) is sent, then it is refused on the item's weight", async () => {
    const res = await td.post('/api/v1/calculations', PROBE_REQUEST)
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual({ 'items.0.weight': 'Item weight must be between 0 and 44,000 lb' })
  })

  it('when a lineset is added or saved with a pipe of 2.5e9 lb/ft, then it is refused on that field', async () => {
    const message = 'Pipe weight per length must be between 0 and 134 lb/ft'
    await expectRefused(() => td.post('/api/v1/linesets', sampleLineset(7, { pipeWeightPerLength: 2.5e9 })), {
      pipeWeightPerLength: message,
    })
    const body = await currentLineset()
    await expectRefused(() => td.put(`/api/v1/linesets/${venue.linesetId}`, { ...body, pipeWeightPerLength: 2.5e9 }), {
      pipeWeightPerLength: message,
    })
  })

  it('when figures would overflow a page or read back as 0, then they are refused on their fields', async () => {
    await expectRefused(
      () => td.post('/api/v1/linesets', sampleLineset(8, { ratedLoad: 1e21, battenLength: 1e-7, pickPoints: [0] })),
      { ratedLoad: 'Rated load must be between 2.21 and 110,000 lb', battenLength: /between 0.0329 and 131 ft/ },
    )
    await expectRefused(
      () =>
        td.post('/api/v1/brick-types', {
          name: 'Dust',
          material: 'Steel',
          unitWeight: 1e-308,
          thickness: 2,
          quantityOwned: 1,
        }),
      { unitWeight: 'Weight of one brick must be between 0.0221 and 220 lb' },
    )
  })

  it('when the venue is metric, then the ranges are the metric ones: 50 m is refused where 50 ft is not', async () => {
    const metricTd = await signedIn(app.url, metricVenue.emails['technical-director'])
    const res = await metricTd.post(
      '/api/v1/linesets',
      sampleLineset(2, { battenLength: 50, pickPoints: [0, 25, 50], unitSystem: 'metric' }),
    )
    expect(res.status).toBe(400)
    expect(res.body.error.fields.battenLength).toBe('Batten length must be between 0.01 and 40 m')
    const imperial = await td.post('/api/v1/linesets', sampleLineset(2, { battenLength: 50, pickPoints: [0, 25, 50] }))
    expect(imperial.status, JSON.stringify(imperial.body)).toBe(201)
  })

  it('when an update carries version 2147483647, then it is refused with 400 on the version, not 500', async () => {
    const body = await currentLineset()
    await expectRefused(() => td.put(`/api/v1/linesets/${venue.linesetId}`, { ...body, version: 2147483647 }), {
      version: 'Version must be a whole number between 0 and 2,147,483,646',
    })
    const brick = (await td.get('/api/v1/brick-types')).body[0]
    const { id: brickId, ...brickBody } = brick
    await expectRefused(() => td.put(`/api/v1/brick-types/${brickId}`, { ...brickBody, version: 2147483647 }), {
      version: /between 0 and 2,147,483,646/,
    })
    const { id: _venueId, ...settings } = (await admin.get('/api/v1/venue')).body
    await expectRefused(() => admin.put('/api/v1/venue', { ...settings, version: 2147483647 }), {
      version: /between 0 and 2,147,483,646/,
    })
    await expectRefused(
      () =>
        admin.put(`/api/v1/people/${venue.membershipIds['fly-operator']}`, {
          role: 'fly-operator',
          version: 2147483647,
        }),
      { version: /between 0 and 2,147,483,646/ },
    )
  })
})

describe('text that cannot be stored as typed', () => {
  it('when a lineset name, notes or pipe size holds a NUL or a lone surrogate, then each is refused by field', async () => {
    const fields = {
      name: 'Name cannot hold control characters',
      notes: 'Notes holds a broken character (a lone surrogate)',
      pipeSize: 'Pipe size cannot hold control characters',
    }
    const bad = { name: 'Border\u0000', notes: 'Check \uD800 weekly', pipeSize: 'custom\u0000' }
    await expectRefused(() => td.post('/api/v1/linesets', sampleLineset(9, bad)), fields)
    const body = await currentLineset()
    await expectRefused(() => td.put(`/api/v1/linesets/${venue.linesetId}`, { ...body, ...bad }), fields)
  })

  it('when venue, brick or person text holds a NUL or a lone surrogate, then it is refused, never stored changed', async () => {
    const { id: _id, ...settings } = (await admin.get('/api/v1/venue')).body
    await expectRefused(() => admin.put('/api/v1/venue', { ...settings, name: 'Hall\u0000' }), {
      name: 'Venue name cannot hold control characters',
    })
    await expectRefused(
      () =>
        td.post('/api/v1/brick-types', {
          name: 'Full \uDC00',
          material: 'Steel\u0000',
          unitWeight: 19.5,
          thickness: 2,
          quantityOwned: 10,
        }),
      { name: /lone surrogate/, material: /control characters/ },
    )
    await expectRefused(
      () => admin.post('/api/v1/people', { email: 'new@alpha.test', name: 'Ann\u0000', role: 'stage-manager' }),
      { name: 'Name cannot hold control characters' },
    )
  })

  it('when an e-mail address is longer than 254 characters, then adding the person or signing in answers 400', async () => {
    const long = `${'a'.repeat(250)}@alpha.test`
    await expectRefused(() => admin.post('/api/v1/people', { email: long, name: 'Ann', role: 'stage-manager' }), {
      email: 'An e-mail address has 254 characters at most',
    })
    const res = await td.agent
      .post('/api/v1/session')
      .set('X-CSRF-Token', td.csrfToken)
      .send({ email: long, password: 'whatever-it-is' })
    expect(res.status).toBe(400)
    expect(res.body.error.fields.email).toBe('An e-mail address has 254 characters at most')
  })
})
