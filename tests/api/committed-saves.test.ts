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
  // Test-only triggers (this file's own database): a save with this name retires the row as it is written,
  // so any read after the write would find nothing. Only an answer built from the row written can be right.
  await app.handle.db.sequelize.query(`
    CREATE FUNCTION vanish_on_save() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF NEW.name = 'Vanishing on save' THEN NEW.retired_at := now(); END IF;
      RETURN NEW;
    END $$;
    CREATE TRIGGER linesets_vanish BEFORE UPDATE ON linesets FOR EACH ROW EXECUTE FUNCTION vanish_on_save();
    CREATE TRIGGER brick_types_vanish BEFORE UPDATE ON brick_types FOR EACH ROW EXECUTE FUNCTION vanish_on_save();
  `)
})
afterAll(() => app.stop())

describe('a committed save answers from the row it wrote', () => {
  it('when a lineset save commits but the row can no longer be read back, then it still answers 200 with what was saved', async () => {
    const current = (await admin.get(`/api/v1/linesets/${venue.linesetId}`).expect(200)).body
    const res = await admin.put(`/api/v1/linesets/${venue.linesetId}`, { ...current, name: 'Vanishing on save' })
    expect(res.status, JSON.stringify(res.body)).toBe(200)
    expect(res.body).toMatchObject({ id: venue.linesetId, name: 'Vanishing on save', version: current.version + 1 })
    expect((await admin.get(`/api/v1/linesets/${venue.linesetId}`)).status).toBe(404) // a re-read would have failed
  })

  it('when a brick type save commits but the row can no longer be read back, then it still answers 200 with what was saved', async () => {
    const current = (await admin.get('/api/v1/brick-types').expect(200)).body[0]
    const res = await admin.put(`/api/v1/brick-types/${current.id}`, { ...current, name: 'Vanishing on save' })
    expect(res.status, JSON.stringify(res.body)).toBe(200)
    expect(res.body).toMatchObject({ id: current.id, name: 'Vanishing on save', version: current.version + 1 })
    expect((await admin.get('/api/v1/brick-types').expect(200)).body).toEqual([])
  })

  it('when saves race retirements of the same linesets, then every save answers 200, 404 or 409 and every 200 is in the ledger', async () => {
    const linesets = []
    for (let number = 30; number < 40; number++)
      linesets.push((await admin.post('/api/v1/linesets', sampleLineset(number)).expect(201)).body)
    const outcomes = await Promise.all(
      linesets.map(async (lineset) => {
        const [save, retire] = await Promise.all([
          admin.put(`/api/v1/linesets/${lineset.id}`, { ...lineset, name: `${lineset.name} renamed` }),
          admin.delete(`/api/v1/linesets/${lineset.id}`),
        ])
        const changes = await app.handle.db.models.LinesetEvent.count({
          where: { linesetId: lineset.id, eventType: 'lineset-changed' },
        })
        return { save: save.status, body: save.body, retire: retire.status, changes }
      }),
    )
    for (const outcome of outcomes) {
      expect([200, 404, 409], JSON.stringify(outcome)).toContain(outcome.save)
      expect(outcome.retire).toBe(204)
      expect(outcome.changes).toBe(outcome.save === 200 ? 1 : 0)
      if (outcome.save === 200) expect(outcome.body.name).toMatch(/renamed$/)
    }
  })
})
