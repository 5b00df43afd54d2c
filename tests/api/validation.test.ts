import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { sampleLineset, seedVenue, type VenueFixture } from '../support/fixtures.js'
import { signedIn, startTestApp, type Client, type TestApp } from '../support/test-app.js'

let app: TestApp
let venue: VenueFixture
let td: Client

beforeAll(async () => {
  app = await startTestApp()
  venue = await seedVenue(app.handle.context, 'alpha')
  td = await signedIn(app.url, venue.emails['technical-director'])
})
afterAll(() => app.stop())

const snapshot = async () => ({
  linesets: (await td.get('/api/v1/linesets')).body,
  bricks: (await td.get('/api/v1/brick-types')).body,
  events: await app.handle.db.models.LinesetEvent.count(),
})

describe('validation errors change nothing', () => {
  it('when a new lineset has bad figures, then it answers 400 naming each field and stores nothing', async () => {
    const before = await snapshot()
    const res = await td.post('/api/v1/linesets', {
      ...sampleLineset(7),
      battenLength: -4,
      pickPoints: [0, 20, 10],
      kind: 'flying-carpet',
      name: '',
    })
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('validation_failed')
    expect(res.body.error.fields).toMatchObject({
      battenLength: 'Batten length must be between 0.0329 and 131 ft',
      kind: 'Choose a kind of lineset',
      name: 'Name must not be empty',
    })
    expect(await snapshot()).toEqual(before)
  })

  it('when a lift line lies beyond the batten or out of order, then the message names that position', async () => {
    const res = await td.post('/api/v1/linesets', sampleLineset(8, { pickPoints: [0, 30, 20, 45] }))
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual({
      'pickPoints.2': 'Pick points must be in order from one end: 20 comes after 30',
      'pickPoints.3': "Pick point at 45 is beyond the batten's length of 40",
    })
  })

  it('when a counterweight set has no arbor figures, then both are named', async () => {
    const res = await td.post('/api/v1/linesets', sampleLineset(9, { arborEmptyWeight: null, arborCapacity: null }))
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields)).toEqual(['arborEmptyWeight', 'arborCapacity'])
  })

  it('when an update is invalid, then the stored lineset and its ledger stay as they were', async () => {
    const before = await snapshot()
    const res = await td.put(`/api/v1/linesets/${venue.linesetId}`, { ...sampleLineset(1), number: 'one', version: 0 })
    expect(res.status).toBe(400)
    expect(res.body.error.fields.number).toBe('Lineset number must be a number')
    expect(await snapshot()).toEqual(before)
  })

  it('when the body is not JSON, then it answers 400 with the error shape', async () => {
    const res = await td.agent
      .post('/api/v1/linesets')
      .set('X-CSRF-Token', td.csrfToken)
      .set('content-type', 'application/json')
      .send('{"number": 1,')
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('malformed_json')
  })

  it('when the body is in a charset the server does not read, then it answers 415 in the error shape, not 500', async () => {
    const res = await td.agent
      .post('/api/v1/linesets')
      .set('X-CSRF-Token', td.csrfToken)
      .set('content-type', 'application/json; charset=iso-8859-1')
      .send('{}')
    expect(res.status, JSON.stringify(res.body)).toBe(415)
    expect(res.body.error.code).toBe('unreadable_request')
  })

  it('when a brick type has a fractional count, then it answers 400 and stores nothing', async () => {
    const before = await snapshot()
    const res = await td.post('/api/v1/brick-types', {
      name: 'Odd',
      material: 'Steel',
      unitWeight: 0,
      thickness: 2,
      quantityOwned: 2.5,
      unitSystem: 'imperial',
    })
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual({
      unitWeight: 'Weight of one brick must be between 0.0221 and 220 lb',
      quantityOwned: 'Bricks owned must be a whole number between 0 and 100,000',
    })
    expect(await snapshot()).toEqual(before)
  })
})

describe('stale updates are refused', () => {
  it('when two people edit the same lineset, then the second save answers 409 and the first one stands', async () => {
    const current = (await td.get(`/api/v1/linesets/${venue.linesetId}`).expect(200)).body
    const first = await td.put(`/api/v1/linesets/${venue.linesetId}`, {
      ...sampleLineset(1, { name: 'First edit' }),
      version: current.version,
    })
    expect(first.status).toBe(200)
    expect(first.body.version).toBe(current.version + 1)
    const second = await td.put(`/api/v1/linesets/${venue.linesetId}`, {
      ...sampleLineset(1, { name: 'Second edit' }),
      version: current.version,
    })
    expect(second.status).toBe(409)
    expect(second.body.error.code).toBe('stale_version')
    expect((await td.get(`/api/v1/linesets/${venue.linesetId}`)).body.name).toBe('First edit')
  })

  it('when a number is already taken, then it answers 409 naming the number field', async () => {
    const res = await td.post('/api/v1/linesets', sampleLineset(1))
    expect(res.status).toBe(409)
    expect(res.body.error.fields).toEqual({ number: 'Already in use' })
  })
})

describe('every problem is named at once', () => {
  it('when one figure is unreadable and a lift line lies beyond the batten, then both fields are named', async () => {
    const res = await td.post('/api/v1/linesets', {
      ...sampleLineset(10),
      travel: 'abc',
      battenLength: 48,
      pickPoints: [4, 14, 60],
    })
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual({
      travel: 'Travel must be a number',
      'pickPoints.2': "Pick point at 60 is beyond the batten's length of 48",
    })
  })
})

describe('an edit typed in units the venue has since left', () => {
  it('when the venue switches units while a lineset or brick is open, then saving it answers 409 and nothing is stored in the wrong units', async () => {
    const admin = await signedIn(app.url, venue.emails.administrator)
    const lineset = (await td.get(`/api/v1/linesets/${venue.linesetId}`).expect(200)).body
    const brick = (await td.get('/api/v1/brick-types').expect(200)).body[0]
    const settings = (await admin.get('/api/v1/venue').expect(200)).body
    await admin
      .put('/api/v1/venue', { ...settings, unitSystem: 'metric', balanceTolerance: 5, ropeLockHolding: 23 })
      .expect(200)

    const { id: _id, updatedAt: _updatedAt, ...body } = lineset
    const staleLineset = await td.put(`/api/v1/linesets/${venue.linesetId}`, { ...body, battenLength: 40 })
    expect(staleLineset.status).toBe(409)
    const { id: brickId, ...brickBody } = brick
    expect((await td.put(`/api/v1/brick-types/${brickId}`, brickBody)).status).toBe(409)

    const metric = (await td.get(`/api/v1/linesets/${venue.linesetId}`).expect(200)).body
    expect(metric.battenLength).toBe(Number((lineset.battenLength * 0.3048).toFixed(6))) // ft -> m, NIST SP 811
    const back = (await admin.get('/api/v1/venue').expect(200)).body
    await admin
      .put('/api/v1/venue', { ...back, unitSystem: 'imperial', balanceTolerance: 10, ropeLockHolding: 50 })
      .expect(200)
  })
})
