import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { sampleLineset, seedVenue, type VenueFixture } from '../support/fixtures.js'
import { signedIn, startTestApp, type Client, type TestApp } from '../support/test-app.js'

let app: TestApp
let alpha: VenueFixture
let beta: VenueFixture
let alphaAdmin: Client

beforeAll(async () => {
  app = await startTestApp()
  alpha = await seedVenue(app.handle.context, 'alpha')
  beta = await seedVenue(app.handle.context, 'beta')
  alphaAdmin = await signedIn(app.url, alpha.emails.administrator)
})
afterAll(() => app.stop())

describe('venue isolation', () => {
  it("when a member lists linesets, bricks and people, then none of another venue's records appear", async () => {
    const linesets = await alphaAdmin.get('/api/v1/linesets').expect(200)
    expect(linesets.body.map((l: { id: string }) => l.id)).toEqual([alpha.linesetId])
    const bricks = await alphaAdmin.get('/api/v1/brick-types').expect(200)
    expect(bricks.body.map((b: { id: string }) => b.id)).toEqual([alpha.brickTypeId])
    const people = await alphaAdmin.get('/api/v1/people').expect(200)
    expect(people.body.every((p: { email: string }) => p.email.endsWith('@alpha.test'))).toBe(true)
  })

  it("when a member reaches for another venue's records by id, then every route answers 404 and nothing changes", async () => {
    const attempts = [
      alphaAdmin.get(`/api/v1/linesets/${beta.linesetId}`),
      alphaAdmin.get(`/api/v1/linesets/${beta.linesetId}/events`),
      alphaAdmin.put(`/api/v1/linesets/${beta.linesetId}`, { ...sampleLineset(1, { name: 'Hijacked' }), version: 0 }),
      alphaAdmin.delete(`/api/v1/linesets/${beta.linesetId}`),
      alphaAdmin.put(`/api/v1/brick-types/${beta.brickTypeId}`, {
        name: 'Hijacked',
        material: 'Steel',
        unitWeight: 1,
        thickness: 1,
        quantityOwned: 0,
        unitSystem: 'imperial',
        version: 0,
      }),
      alphaAdmin.delete(`/api/v1/brick-types/${beta.brickTypeId}`),
      alphaAdmin.put(`/api/v1/people/${beta.membershipIds['stage-manager']}`, { role: 'administrator', version: 0 }),
      alphaAdmin.delete(`/api/v1/people/${beta.membershipIds['stage-manager']}`),
    ]
    for (const [index, res] of (await Promise.all(attempts)).entries()) {
      expect(res.status, `attempt ${index}`).toBe(404)
      expect(res.body.error.code).toBe('not_found')
    }
    const betaAdmin = await signedIn(app.url, beta.emails.administrator)
    const lineset = await betaAdmin.get(`/api/v1/linesets/${beta.linesetId}`).expect(200)
    expect(lineset.body).toMatchObject({ name: 'Test set 1', version: 0 })
    const bricks = await betaAdmin.get('/api/v1/brick-types').expect(200)
    expect(bricks.body).toMatchObject([{ name: 'Full', version: 0 }])
    const people = await betaAdmin.get('/api/v1/people').expect(200)
    expect(people.body.find((p: { id: string }) => p.id === beta.membershipIds['stage-manager']).role).toBe(
      'stage-manager',
    )
  })

  it('when an id is not a UUID, then it is a 404, not a 500', async () => {
    const res = await alphaAdmin.get('/api/v1/linesets/not-an-id')
    expect(res.status).toBe(404)
  })
})
