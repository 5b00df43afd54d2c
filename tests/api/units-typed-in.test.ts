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
  // The venue switches to metric while the technical director's forms still show imperial figures.
  const settings = (await td.get('/api/v1/venue').expect(200)).body
  await td
    .put('/api/v1/venue', { ...settings, unitSystem: 'metric', balanceTolerance: 5, ropeLockHolding: 23 })
    .expect(200)
})
afterAll(() => app.stop())

const stored = async () => ({
  linesets: await app.handle.db.models.Lineset.count(),
  events: await app.handle.db.models.LinesetEvent.count(),
  bricks: await app.handle.db.models.BrickType.count(),
})

const brick = { name: 'Half', material: 'Steel', unitWeight: 10, thickness: 1, quantityOwned: 20 }

describe('figures typed in units the venue has left', () => {
  it('when a lineset typed in imperial is created after the switch to metric, then it answers 409 and stores nothing', async () => {
    const before = await stored()
    const res = await td.post('/api/v1/linesets', sampleLineset(5, { unitSystem: 'imperial' }))
    expect(res.status, JSON.stringify(res.body)).toBe(409)
    expect(res.body.error.code).toBe('units_changed')
    expect(res.body.error.message).toMatch(/metric.*imperial.*reload/i)
    expect(await stored()).toEqual(before)
  })

  it('when a brick type typed in imperial is created or changed after the switch, then both answer 409 and store nothing', async () => {
    const before = await stored()
    const created = await td.post('/api/v1/brick-types', { ...brick, unitSystem: 'imperial' })
    expect(created.status, JSON.stringify(created.body)).toBe(409)
    expect(created.body.error.code).toBe('units_changed')
    const current = (await td.get('/api/v1/brick-types').expect(200)).body[0]
    // The form was filled in before the switch: its figures are imperial ones.
    const changed = await td.put(`/api/v1/brick-types/${current.id}`, {
      ...current,
      unitWeight: 30,
      thickness: 2,
      unitSystem: 'imperial',
    })
    expect(changed.status).toBe(409)
    expect(changed.body.error.code).toBe('units_changed')
    expect((await td.get('/api/v1/brick-types').expect(200)).body[0]).toEqual(current)
    expect(await stored()).toEqual(before)
  })

  it('when a lineset change typed in imperial arrives with a current version, then it still answers 409 units_changed', async () => {
    const current = (await td.get(`/api/v1/linesets/${venue.linesetId}`).expect(200)).body
    // Figures from a form filled in before the switch, carrying the lineset's current version.
    const res = await td.put(`/api/v1/linesets/${venue.linesetId}`, {
      ...sampleLineset(1),
      version: current.version,
      unitSystem: 'imperial',
    })
    expect(res.status, JSON.stringify(res.body)).toBe(409)
    expect(res.body.error.code).toBe('units_changed')
    expect((await td.get(`/api/v1/linesets/${venue.linesetId}`).expect(200)).body).toEqual(current)
  })

  it('when the same figures say metric, then they are taken, in metres and kilograms', async () => {
    const res = await td.post(
      '/api/v1/linesets',
      sampleLineset(6, { battenLength: 12, pickPoints: [0, 3, 6, 9, 12], unitSystem: 'metric' }),
    )
    expect(res.status).toBe(201)
    expect(res.body).toMatchObject({ battenLength: 12, unitSystem: 'metric' })
    expect((await td.post('/api/v1/brick-types', { ...brick, unitSystem: 'metric' })).status).toBe(201)
  })

  it('when a write does not say its units, then it answers 400 naming the field', async () => {
    const { unitSystem: _omitted, ...body } = sampleLineset(9)
    const res = await td.post('/api/v1/linesets', body)
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual({ unitSystem: 'Say which units the figures were typed in' })
  })
})
