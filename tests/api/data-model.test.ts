import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { seedVenue, type VenueFixture } from '../support/fixtures.js'
import { startTestApp, type TestApp } from '../support/test-app.js'

let app: TestApp
let alpha: VenueFixture
let beta: VenueFixture

beforeAll(async () => {
  app = await startTestApp()
  alpha = await seedVenue(app.handle.context, 'alpha')
  beta = await seedVenue(app.handle.context, 'beta')
})
afterAll(() => app.stop())

describe('the tables the workflow fills', () => {
  it('when a hang with items and a ticket are written, then they read back through the models', async () => {
    const { Hang, HangItem, WeightChangeTicket } = app.handle.db.models
    const hang = await Hang.create({
      venueId: alpha.venueId,
      linesetId: alpha.linesetId,
      title: 'Act one drop',
      unitSystem: 'imperial',
      createdBy: null,
      calculationInput: null,
      calculationResult: null,
    })
    await HangItem.create({
      hangId: hang.id,
      position: 0,
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
      createdBy: null,
      calculationInput: null,
      calculationResult: null,
    })
    await expect(attempt).rejects.toThrow(/foreign key/)
  })

  it('when a hang item is neither a point nor a spread load, then the database refuses it', async () => {
    const hang = await app.handle.db.models.Hang.create({
      venueId: alpha.venueId,
      linesetId: alpha.linesetId,
      title: 'Bad item',
      unitSystem: 'imperial',
      createdBy: null,
      calculationInput: null,
      calculationResult: null,
    })
    const attempt = app.handle.db.models.HangItem.create({
      hangId: hang.id,
      position: 0,
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
