import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { seedVenue, type VenueFixture } from '../support/fixtures.js'
import { signedIn, startTestApp, type TestApp } from '../support/test-app.js'

let app: TestApp
let alpha: VenueFixture
let beta: VenueFixture

beforeAll(async () => {
  app = await startTestApp()
  alpha = await seedVenue(app.handle.context, 'alpha')
  beta = await seedVenue(app.handle.context, 'beta')
})
afterAll(() => app.stop())

// Hangs written straight through the model take the next revision of this file's own count (one per lineset).
let nextRevision = 1
const revision = () => nextRevision++

describe('the tables the workflow fills', () => {
  it('when a hang with items and a ticket are written, then they read back through the models', async () => {
    const { Hang, HangItem, WeightChangeTicket } = app.handle.db.models
    const hang = await Hang.create({
      venueId: alpha.venueId,
      linesetId: alpha.linesetId,
      title: 'Act one drop',
      unitSystem: 'imperial',
      revision: revision(),
      createdBy: null,
      calculationInput: null,
      calculationResult: null,
    })
    await HangItem.create({
      venueId: alpha.venueId,
      hangId: hang.id,
      position: 0,
      entryKind: 'point',
      label: 'Drop',
      weight: '45.359237',
      at: '6.096',
      fromPosition: null,
      toPosition: null,
      weightPerLength: null,
    })
    await WeightChangeTicket.create({
      venueId: alpha.venueId,
      linesetId: alpha.linesetId,
      hangId: hang.id,
      requestedBy: null,
      decidedBy: null,
      decidedAt: null,
      requiredWeight: '45.359237',
      loadedWeight: null,
    })
    const items = await HangItem.findAll({ where: { hangId: hang.id }, raw: true })
    expect(items).toMatchObject([{ label: 'Drop', weight: '45.359237' }])
    expect(await WeightChangeTicket.count({ where: { hangId: hang.id, state: 'requested' } })).toBe(1)
  })

  it("when a hang names another venue's lineset, then the database refuses it", async () => {
    const attempt = app.handle.db.models.Hang.create({
      venueId: alpha.venueId,
      linesetId: beta.linesetId,
      title: 'Cross-venue',
      unitSystem: 'imperial',
      revision: revision(),
      createdBy: null,
      calculationInput: null,
      calculationResult: null,
    })
    await expect(attempt).rejects.toThrow(/foreign key/)
  })

  it('when a hang item lacks what its shape needs (a point load without its position), then the database refuses it', async () => {
    const hang = await app.handle.db.models.Hang.create({
      venueId: alpha.venueId,
      linesetId: alpha.linesetId,
      title: 'Bad item',
      unitSystem: 'imperial',
      revision: revision(),
      createdBy: null,
      calculationInput: null,
      calculationResult: null,
    })
    const attempt = app.handle.db.models.HangItem.create({
      venueId: alpha.venueId,
      hangId: hang.id,
      position: 0,
      entryKind: 'point',
      label: 'Nothing',
      weight: '1',
      at: null,
      fromPosition: null,
      toPosition: null,
      weightPerLength: null,
    })
    await expect(attempt).rejects.toThrow(/check constraint/)
  })
})

describe('tickets stay within their venue', () => {
  const hangFor = (fixture: VenueFixture) =>
    app.handle.db.models.Hang.create({
      venueId: fixture.venueId,
      linesetId: fixture.linesetId,
      title: 'A hang',
      unitSystem: 'imperial',
      revision: revision(),
      createdBy: null,
      calculationInput: null,
      calculationResult: null,
    })
  const ticket = (venueId: string, linesetId: string, hangId: string) =>
    app.handle.db.models.WeightChangeTicket.create({
      venueId,
      linesetId,
      hangId,
      // A closed ticket: the lineset already has an open one, and a lineset holds one open ticket at a time.
      state: 'withdrawn',
      requestedBy: null,
      decidedBy: null,
      decidedAt: null,
      requiredWeight: '10',
      loadedWeight: null,
    })

  it("when a ticket names another venue's hang, then the database refuses it", async () => {
    const betaHang = await hangFor(beta)
    await expect(ticket(alpha.venueId, alpha.linesetId, betaHang.id)).rejects.toThrow(
      /weight_change_tickets_hang_in_venue/,
    )
    const alphaHang = await hangFor(alpha)
    await expect(ticket(alpha.venueId, alpha.linesetId, alphaHang.id)).resolves.toBeDefined()
  })
})

describe('brick types something refers to are retired, never deleted', () => {
  it('when a brick type in use is deleted, then it leaves the list but its row stays, and its name can be used again', async () => {
    // Stands in for the tables that will name a brick type: the same reference they must use.
    await app.handle.db.sequelize.query(`
      CREATE TABLE test_brick_uses (
        venue_id uuid NOT NULL,
        brick_type_id uuid NOT NULL,
        FOREIGN KEY (venue_id, brick_type_id) REFERENCES brick_types (venue_id, id) ON DELETE RESTRICT
      )`)
    await app.handle.db.sequelize.query('INSERT INTO test_brick_uses VALUES (:venueId, :brickTypeId)', {
      replacements: { venueId: alpha.venueId, brickTypeId: alpha.brickTypeId },
    })
    const td = await signedIn(app.url, alpha.emails['technical-director'])
    const before = (await td.get('/api/v1/brick-types').expect(200)).body
    await td.delete(`/api/v1/brick-types/${alpha.brickTypeId}`).expect(204)
    expect((await td.get('/api/v1/brick-types').expect(200)).body).toEqual([])
    const kept = await app.handle.db.models.BrickType.findByPk(alpha.brickTypeId)
    expect(kept?.retiredAt).toBeInstanceOf(Date)
    expect((await td.delete(`/api/v1/brick-types/${alpha.brickTypeId}`)).status).toBe(404)
    expect((await td.put(`/api/v1/brick-types/${alpha.brickTypeId}`, before[0])).status).toBe(404)

    const { id: _id, version: _version, ...again } = before[0]
    const reused = await td.post('/api/v1/brick-types', again)
    expect(reused.status).toBe(201)
    expect(reused.body.name).toBe(before[0].name)
  })

  it('when a brick type nothing refers to is deleted, then its row is gone', async () => {
    const td = await signedIn(app.url, alpha.emails['technical-director'])
    const created = (
      await td
        .post('/api/v1/brick-types', {
          name: 'Unused',
          material: 'Steel',
          unitWeight: 10,
          thickness: 1,
          quantityOwned: 0,
          unitSystem: 'imperial',
        })
        .expect(201)
    ).body
    await td.delete(`/api/v1/brick-types/${created.id}`).expect(204)
    expect(await app.handle.db.models.BrickType.findByPk(created.id)).toBeNull()
  })
})
