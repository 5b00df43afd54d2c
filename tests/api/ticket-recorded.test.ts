import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { VenueFixture } from '../support/fixtures.js'
import type { Client, TestApp } from '../support/test-app.js'
import { startTwoVenues } from '../support/venue-suite.js'
import { databaseFingerprint } from '../support/database-fingerprint.js'
import { hungLineset, operatingStatusOf } from '../support/tickets.js'

// The fixture's "Full" brick weighs 20 lb; a 200 lb drop on the sample set plans five of them, leaving 8.8 lb
// batten heavy (see tests/support/tickets.ts). This file adds a 10 lb "Half" type (invented test data).
let app: TestApp
let alpha: VenueFixture
let director: Client
let operator: Client
let halfId: string

beforeAll(async () => {
  const venues = await startTwoVenues()
  ;({ app, alpha } = venues)
  director = venues.atAlpha['technical-director']
  operator = venues.atAlpha['fly-operator']
  const half = await director
    .post('/api/v1/brick-types', {
      name: 'Half',
      material: 'Steel',
      unitWeight: 10,
      thickness: 1,
      quantityOwned: 40,
      unitSystem: 'imperial',
    })
    .expect(201)
  halfId = half.body.id
})
afterAll(() => app.stop())

let nextNumber = 700
const act = (id: string, step: string, body: object) => operator.post(`/api/v1/tickets/${id}/${step}`, body)

/** A ticket for a 200 lb drop, approved and being loaded (version 2). */
async function ticketBeingLoaded() {
  const { id: linesetId, hang } = await hungLineset(director, operator, nextNumber++, 200)
  const opened = (await operator.post('/api/v1/tickets', { hangId: hang.id }).expect(201)).body
  expect(opened.changes).toEqual([{ brickTypeId: alpha.brickTypeId, name: 'Full', count: 5 }])
  await director.post(`/api/v1/tickets/${opened.id}/approve`, { version: 0 }).expect(200)
  await act(opened.id, 'start-loading', { version: 1 }).expect(200)
  return { linesetId, id: opened.id as string }
}

const slip = () => ({
  version: 2,
  loaded: [
    { brickTypeId: alpha.brickTypeId, count: 5 },
    { brickTypeId: halfId, count: 12 },
  ],
  feltBalance: 'balanced',
})

describe('recording counts that differ from the plan', () => {
  it('when the counts differ and the body does not say so, then 422 names differsFromPlan and nothing changes', async () => {
    const { linesetId, id } = await ticketBeingLoaded()
    await app.handle.context.outbox.idle()
    const before = await databaseFingerprint(app.handle.db.sequelize)
    const res = await act(id, 'complete', slip())
    expect(res.status).toBe(422)
    expect(res.body.error.code).toBe('differs_from_plan')
    expect(res.body.error.fields).toHaveProperty('differsFromPlan')
    // 5 x 20 + 12 x 10 = 220 lb of bricks where the plan had 100: 8.8 - 120 = 111.2 lb arbor heavy.
    expect(res.body.error.message).toContain('12 × Half recorded, the plan was 0')
    expect(res.body.error.message).toContain('111.2 lb arbor heavy')
    expect(res.body.error.message).toContain('differsFromPlan: true')
    expect(await databaseFingerprint(app.handle.db.sequelize)).toBe(before)
    expect((await operator.get(`/api/v1/tickets/${id}`)).body).toMatchObject({ state: 'loading', version: 2 })
    expect(await operatingStatusOf(operator, linesetId)).toBe('loading')
  })

  it('when the body confirms the counts, then they are stored and the ticket shows the out of balance they give', async () => {
    const { linesetId, id } = await ticketBeingLoaded()
    const res = await act(id, 'complete', { ...slip(), differsFromPlan: true })
    expect(res.status).toBe(200)
    expect(res.body.state).toBe('loaded')
    expect(res.body.expectedOutOfBalance).toBeCloseTo(8.8, 6)
    expect(res.body.loadedOutOfBalance).toBeCloseTo(-111.2, 6)
    expect(res.body).toMatchObject({ purchaseRatio: 1, balanceTolerance: 10 })
    const read = (await operator.get(`/api/v1/tickets/${id}`).expect(200)).body
    expect(read.loadedOutOfBalance).toBeCloseTo(-111.2, 6)
    const arbor = (await operator.get(`/api/v1/linesets/${linesetId}/arbor`).expect(200)).body
    expect(arbor.bricks).toEqual(
      expect.arrayContaining([
        { brickTypeId: alpha.brickTypeId, name: 'Full', count: 5 },
        { brickTypeId: halfId, name: 'Half', count: 12 },
      ]),
    )
    expect(await operatingStatusOf(operator, linesetId)).toBe('out-of-balance')
    const events = (await operator.get(`/api/v1/linesets/${linesetId}/events`).expect(200)).body.events
    expect(events[0].summary).toContain('not the plan: 12 × Half recorded, the plan was 0')
  })

  it('when a planned type is miscounted, then that type is named; counts as planned need no flag and keep the expected figure', async () => {
    const first = await ticketBeingLoaded()
    const miscounted = await act(first.id, 'complete', {
      version: 2,
      loaded: [{ brickTypeId: alpha.brickTypeId, count: 6 }],
      feltBalance: 'arbor-heavy',
    })
    expect(miscounted.status).toBe(422)
    expect(miscounted.body.error.message).toContain('6 × Full recorded, the plan was 5')
    expect(miscounted.body.error.message).toContain('11.2 lb arbor heavy')
    const asPlanned = await act(first.id, 'complete', {
      version: 2,
      loaded: [
        { brickTypeId: alpha.brickTypeId, count: 5 },
        { brickTypeId: halfId, count: 0 },
      ],
      feltBalance: 'balanced',
    })
    expect(asPlanned.status).toBe(200)
    expect(asPlanned.body.loadedOutOfBalance).toBeCloseTo(8.8, 6)
    const second = await ticketBeingLoaded()
    const leftOut = await act(second.id, 'complete', { version: 2, loaded: [], feltBalance: 'balanced' })
    expect(leftOut.status).toBe(200)
    expect(leftOut.body.loadedOutOfBalance).toBeCloseTo(8.8, 6)
  })

  it('when differsFromPlan is not a boolean, then 400 names the field', async () => {
    const { id } = await ticketBeingLoaded()
    const res = await act(id, 'complete', { ...slip(), differsFromPlan: 'yes' })
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toHaveProperty('differsFromPlan')
  })
})
