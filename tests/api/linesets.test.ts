import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { sampleLineset, seedVenue, type VenueFixture } from '../support/fixtures.js'
import { signedIn, startTestApp, type Client, type TestApp } from '../support/test-app.js'

let app: TestApp
let venue: VenueFixture
let admin: Client

beforeAll(async () => {
  app = await startTestApp()
  venue = await seedVenue(app.handle.context, 'alpha')
  admin = await signedIn(app.url, venue.emails.administrator)
})
afterAll(() => app.stop())

const stored = (id: string) => app.handle.db.models.Lineset.findByPk(id, { raw: true })

describe('lineset figures are stored exactly in SI', () => {
  it('when an imperial venue saves pounds and feet, then storage holds the exact SI values (NIST SP 811: 1 lb = 0.45359237 kg, 1 ft = 0.3048 m)', async () => {
    const res = await admin.post(
      '/api/v1/linesets',
      sampleLineset(2, { ratedLoad: 1000, battenLength: 40, arborStackLength: 60 }),
    )
    expect(res.status).toBe(201)
    const row = await stored(res.body.id)
    expect(row!.ratedLoad).toBe('453.59237')
    expect(row!.battenLength).toBe('12.192')
    expect(row!.arborStackLength).toBe('1.524') // 60 in x 0.0254 m
    expect(row!.pickPoints).toEqual(['0', '3.048', '6.096', '9.144', '12.192'])
  })

  it('when a figure is read back and saved unchanged, then storage does not drift', async () => {
    const created = (await admin.post('/api/v1/linesets', sampleLineset(3, { pipeWeightPerLength: 2.72 })).expect(201))
      .body
    const before = await stored(created.id)
    const { id, updatedAt, ...body } = created
    expect(body.pipeWeightPerLength).toBe(2.72)
    const saved = await admin.put(`/api/v1/linesets/${id}`, body)
    expect(saved.status).toBe(200)
    expect((await stored(id))!.pipeWeightPerLength).toBe(before!.pipeWeightPerLength)
    void updatedAt
  })

  it('when the venue switches to metric, then the same lineset reads in kilograms and metres', async () => {
    const created = (
      await admin.post('/api/v1/linesets', sampleLineset(4, { ratedLoad: 1000, battenLength: 40 })).expect(201)
    ).body
    const settings = (await admin.get('/api/v1/venue')).body
    await admin
      .put('/api/v1/venue', { ...settings, unitSystem: 'metric', balanceTolerance: 5, ropeLockHolding: 23 })
      .expect(200)
    const metric = (await admin.get(`/api/v1/linesets/${created.id}`)).body
    expect(metric.ratedLoad).toBe(453.59237)
    expect(metric.battenLength).toBe(12.192)
    expect(metric.arborStackLength).toBe(1524) // mm
    const venueNow = (await admin.get('/api/v1/venue')).body
    expect(venueNow).toMatchObject({ unitSystem: 'metric', balanceTolerance: 5, ropeLockHolding: 23 })
    await admin
      .put('/api/v1/venue', { ...venueNow, unitSystem: 'imperial', balanceTolerance: 10, ropeLockHolding: 50 })
      .expect(200)
  })
})

describe('the lineset list', () => {
  it('when the list is read, then every lineset in it reads exactly as its own page does, figure for figure', async () => {
    await admin
      .post('/api/v1/linesets', sampleLineset(61, { ratedLoad: 1234.567891, pipeWeightPerLength: 2.72 }))
      .expect(201)
    const list = (await admin.get('/api/v1/linesets').expect(200)).body as { id: string; currentHang: unknown }[]
    expect(list.length).toBeGreaterThan(1)
    for (const { currentHang, ...item } of list) {
      expect(item).toEqual((await admin.get(`/api/v1/linesets/${item.id}`).expect(200)).body)
      void currentHang
    }
  })
})

describe('lineset history', () => {
  it('when a lineset is added, changed and retired, then its ledger holds one entry for each, in order', async () => {
    const created = (await admin.post('/api/v1/linesets', sampleLineset(5)).expect(201)).body
    await admin
      .put(`/api/v1/linesets/${created.id}`, { ...sampleLineset(5, { name: 'Renamed' }), version: created.version })
      .expect(200)
    await admin.delete(`/api/v1/linesets/${created.id}`).expect(204)
    const events = await app.handle.db.models.LinesetEvent.findAll({
      where: { linesetId: created.id },
      order: [['id', 'ASC']],
    })
    expect(events.map((e) => e.eventType)).toEqual(['lineset-added', 'lineset-changed', 'lineset-retired'])
    expect(await admin.get(`/api/v1/linesets/${created.id}`).then((r) => r.status)).toBe(404)
  })

  it('when anyone tries to rewrite the ledger, then the database refuses', async () => {
    await expect(
      app.handle.db.sequelize.query('UPDATE lineset_events SET event_type = $1', { bind: ['forged'] }),
    ).rejects.toThrow(/append-only/)
    await expect(app.handle.db.sequelize.query('DELETE FROM lineset_events')).rejects.toThrow(/append-only/)
  })
})
