import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { databaseFingerprint } from '../support/database-fingerprint.js'
import { sampleLineset, type VenueFixture } from '../support/fixtures.js'
import type { Client, TestApp } from '../support/test-app.js'
import { startTwoVenues } from '../support/venue-suite.js'

let app: TestApp
let alpha: VenueFixture
let director: Client
let administrator: Client
let operator: Client
let stageManager: Client
let otherVenue: Client

beforeAll(async () => {
  const venues = await startTwoVenues()
  ;({ app, alpha } = venues)
  director = venues.atAlpha['technical-director']
  administrator = venues.atAlpha.administrator
  operator = venues.atAlpha['fly-operator']
  stageManager = venues.atAlpha['stage-manager']
  otherVenue = venues.atBeta.administrator
})
afterAll(() => app.stop())

let nextNumber = 500
const freshLineset = async () =>
  (await director.post('/api/v1/linesets', sampleLineset(nextNumber++)).expect(201)).body.id as string
const lockoutOf = (id: string) => `/api/v1/linesets/${id}/lockout`

describe('locking a lineset out', () => {
  it('when a technical director locks a set out, then every list shows it locked out with the reason, who and when', async () => {
    const id = await freshLineset()
    const res = await director.post(lockoutOf(id), { reason: 'Lift line frayed at the head block' })
    expect(res.status, res.text).toBe(201)
    expect(res.body).toEqual({
      reason: 'Lift line frayed at the head block',
      at: expect.any(String),
      by: { id: alpha.members['technical-director'].id, name: alpha.members['technical-director'].name },
    })
    const listed = (await stageManager.get('/api/v1/linesets').expect(200)).body.find(
      (l: { id: string }) => l.id === id,
    )
    expect(listed).toMatchObject({ operatingStatus: 'locked-out', lockout: res.body })
    expect((await stageManager.get(`/api/v1/linesets/${id}`).expect(200)).body).toMatchObject({
      operatingStatus: 'locked-out',
      lockout: res.body,
    })
  })

  it('when a locked-out set is locked again, then it answers 409 and writes nothing', async () => {
    const id = await freshLineset()
    await director.post(lockoutOf(id), { reason: 'Arbor rail bent' }).expect(201)
    const fingerprint = await databaseFingerprint(app.handle.db.sequelize)
    const again = await administrator.post(lockoutOf(id), { reason: 'Something else' })
    expect(again.status).toBe(409)
    expect(again.body.error).toMatchObject({
      code: 'already_locked_out',
      message: expect.stringMatching(/Arbor rail bent/),
    })
    expect(await databaseFingerprint(app.handle.db.sequelize)).toBe(fingerprint)
  })

  it('when ten lock-outs of one set race, then exactly one takes effect and one ledger entry is written', async () => {
    const id = await freshLineset()
    const answers = await Promise.all(
      Array.from({ length: 10 }, (_, i) => director.post(lockoutOf(id), { reason: `Reason ${i}` })),
    )
    expect(answers.filter((res) => res.status === 201)).toHaveLength(1)
    expect(answers.filter((res) => res.status === 409)).toHaveLength(9)
    const events = (await director.get(`/api/v1/linesets/${id}/events`).expect(200)).body.events
    expect(events.filter((e: { type: string }) => e.type === 'lineset-locked-out')).toHaveLength(1)
  })

  it('when the lock-out is released, then the set is ready again and the history says both in words', async () => {
    const id = await freshLineset()
    await director.post(lockoutOf(id), { reason: 'Inspection due' }).expect(201)
    await administrator.delete(lockoutOf(id), { reason: 'Lift lines inspected, no wear' }).expect(204)
    expect((await director.get(`/api/v1/linesets/${id}`)).body).toMatchObject({
      operatingStatus: 'ready',
      lockout: null,
    })
    const events = (await stageManager.get(`/api/v1/linesets/${id}/events`).expect(200)).body.events
    expect(events.slice(0, 2).map((e: { summary: string }) => e.summary)).toEqual([
      'Lock-out released: Lift lines inspected, no wear (it was: Inspection due)',
      'Locked out: Inspection due',
    ])
    const again = await director.delete(lockoutOf(id), { reason: 'Again' })
    expect(again.status).toBe(409)
    expect(again.body.error.code).toBe('not_locked_out')
  })

  it('when the reason is missing or blank, then it answers 400 naming reason', async () => {
    const id = await freshLineset()
    for (const body of [{}, { reason: '   ' }, { reason: 'a\u0000b' }]) {
      const res = await director.post(lockoutOf(id), body)
      expect(res.status).toBe(400)
      expect(Object.keys(res.body.error.fields)).toEqual(['reason'])
    }
  })

  it('when a fly operator or stage manager locks or releases, then it answers 403; another venue gets 404', async () => {
    const id = await freshLineset()
    for (const client of [operator, stageManager]) {
      expect((await client.post(lockoutOf(id), { reason: 'No' })).status).toBe(403)
      expect((await client.delete(lockoutOf(id), { reason: 'No' })).status).toBe(403)
    }
    expect((await otherVenue.post(lockoutOf(id), { reason: 'No' })).status).toBe(404)
    expect((await otherVenue.delete(lockoutOf(id), { reason: 'No' })).status).toBe(404)
  })

  it('when a release says nothing of what was checked or fixed, then it answers 400 naming reason and the set stays locked out', async () => {
    const id = await freshLineset()
    await director.post(lockoutOf(id), { reason: 'Head block noisy' }).expect(201)
    const fingerprint = await databaseFingerprint(app.handle.db.sequelize)
    for (const body of [undefined, {}, { reason: '   ' }, { reason: 'a\u0000b' }, { reason: 'x'.repeat(201) }]) {
      const res = await director.delete(lockoutOf(id), body)
      expect(res.status, JSON.stringify(body)).toBe(400)
      expect(Object.keys(res.body.error.fields)).toEqual(['reason'])
      expect(res.body.error.fields.reason).toMatch(/^What was checked or fixed /)
    }
    expect(await databaseFingerprint(app.handle.db.sequelize)).toBe(fingerprint)
    expect((await director.get(`/api/v1/linesets/${id}`)).body.operatingStatus).toBe('locked-out')
  })

  it('when a lock-out is released, then the ledger entry keeps both the lock reason and what was checked', async () => {
    const id = await freshLineset()
    await director.post(lockoutOf(id), { reason: 'Rope lock slips' }).expect(201)
    await director.delete(lockoutOf(id), { reason: '  Rope lock shoe replaced and tested  ' }).expect(204)
    const events = (await director.get(`/api/v1/linesets/${id}/events`).expect(200)).body.events
    const released = events.find((e: { type: string }) => e.type === 'lineset-released')
    expect(released.summary).toBe('Lock-out released: Rope lock shoe replaced and tested (it was: Rope lock slips)')
  })
})
