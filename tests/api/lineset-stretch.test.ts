import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { sampleLineset, seedVenue, type VenueFixture } from '../support/fixtures.js'
import { signedIn, startTestApp, type Client, type TestApp } from '../support/test-app.js'

let app: TestApp
let venue: VenueFixture
let admin: Client

beforeAll(async () => {
  app = await startTestApp()
  venue = await seedVenue(app.handle.context, 'stretch')
  admin = await signedIn(app.url, venue.emails.administrator)
})
afterAll(() => app.stop())

const STRETCH = {
  pipeSize: 'nps-1-1/2-sch40',
  liftLineLengths: [52, 62, 72, 82, 92],
  liftLineRope: '7x19-galvanized-1/4',
  liftLineAxialStiffness: null,
}

describe('a lineset says how its lift lines stretch', () => {
  it('when lengths and a rope are saved, then they read back and are stored exactly in SI (1 ft = 0.3048 m, NIST SP 811)', async () => {
    const created = (await admin.post('/api/v1/linesets', sampleLineset(71, STRETCH)).expect(201)).body
    expect(created).toMatchObject({ liftLineLengths: [52, 62, 72, 82, 92], liftLineRope: '7x19-galvanized-1/4' })
    const read = (await admin.get(`/api/v1/linesets/${created.id}`).expect(200)).body
    expect(read).toMatchObject({ liftLineLengths: [52, 62, 72, 82, 92], liftLineAxialStiffness: null })
    const row = await app.handle.db.models.Lineset.findByPk(created.id, { raw: true })
    expect(row!.liftLineLengths).toEqual(['15.8496', '18.8976', '21.9456', '24.9936', '28.0416'])
  })

  it('when an entered stiffness replaces the rope and a stale version saves after, then the second answers 409', async () => {
    const created = (await admin.post('/api/v1/linesets', sampleLineset(72, STRETCH)).expect(201)).body
    const { id, updatedAt: _at, operatingStatus: _s, lockout: _l, ...body } = created
    const saved = (
      await admin
        .put(`/api/v1/linesets/${id}`, { ...body, liftLineRope: null, liftLineAxialStiffness: 250000 })
        .expect(200)
    ).body
    expect(saved).toMatchObject({ liftLineRope: null, liftLineAxialStiffness: 250000, version: body.version + 1 })
    const stale = await admin.put(`/api/v1/linesets/${id}`, { ...body, liftLineLengths: null })
    expect(stale.status).toBe(409)
    const after = (await admin.get(`/api/v1/linesets/${id}`).expect(200)).body
    expect(after.liftLineLengths).toEqual([52, 62, 72, 82, 92])
  })

  it('when a figure is out of range or the count is wrong, then the answer names the field', async () => {
    const short = await admin.post('/api/v1/linesets', sampleLineset(73, { ...STRETCH, liftLineLengths: [52, 62] }))
    expect(short.status).toBe(400)
    expect(short.body.error.fields.liftLineLengths).toMatch(/one lift line length for each/)
    const tiny = await admin.post(
      '/api/v1/linesets',
      sampleLineset(73, { ...STRETCH, liftLineLengths: [52, 62, 0, 82, 92] }),
    )
    expect(tiny.status).toBe(400)
    expect(tiny.body.error.fields['liftLineLengths.2']).toMatch(/Lift line length must be between/)
    const soft = await admin.post('/api/v1/linesets', sampleLineset(73, { ...STRETCH, liftLineAxialStiffness: 5 }))
    expect(soft.body.error.fields.liftLineAxialStiffness).toMatch(/Rope stiffness \(EA\) must be between/)
    const rope = await admin.post('/api/v1/linesets', sampleLineset(73, { ...STRETCH, liftLineRope: 'string' }))
    expect(rope.body.error.fields.liftLineRope).toBe('Choose a rope from the table')
  })
})
