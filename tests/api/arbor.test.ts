import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { BrickStockLine } from '../../shared/schemas/arbor.js'
import { databaseFingerprint } from '../support/database-fingerprint.js'
import { sampleLineset, type VenueFixture } from '../support/fixtures.js'
import { signedIn, type Client, type TestApp } from '../support/test-app.js'
import { startTwoVenues } from '../support/venue-suite.js'

// The fixture's brick type "Full" weighs 20 lb and the house owns 100 (invented test data).
let app: TestApp
let alpha: VenueFixture
let beta: VenueFixture
let director: Client
let operator: Client
let stageManager: Client
let otherVenue: Client

beforeAll(async () => {
  const venues = await startTwoVenues()
  ;({ app, alpha, beta } = venues)
  director = venues.atAlpha['technical-director']
  operator = venues.atAlpha['fly-operator']
  stageManager = venues.atAlpha['stage-manager']
  otherVenue = venues.atBeta.administrator
})
afterAll(() => app.stop())

let nextNumber = 300
const freshLineset = async (overrides = {}) =>
  (await director.post('/api/v1/linesets', sampleLineset(nextNumber++, overrides)).expect(201)).body.id as string
const arborOf = (id: string) => `/api/v1/linesets/${id}/arbor`
const stockOf = async (brickTypeId: string) =>
  ((await director.get('/api/v1/brick-stock').expect(200)).body as BrickStockLine[]).find(
    (line) => line.brickTypeId === brickTypeId,
  )!

describe('reading an arbor', () => {
  it('when nothing has been counted, then every brick type reads 0 at version 0, for every role', async () => {
    const id = await freshLineset()
    for (const client of [director, operator, stageManager]) {
      const res = await client.get(arborOf(id))
      expect(res.status).toBe(200)
      expect(res.body).toEqual({
        linesetId: id,
        bricks: [{ brickTypeId: alpha.brickTypeId, name: 'Full', count: 0 }],
        version: 0,
      })
    }
  })

  it('when the lineset is a hemp set, then it answers 409 saying it has no arbor', async () => {
    const id = await freshLineset({ kind: 'hemp-multi', arborEmptyWeight: null, arborCapacity: null })
    const res = await director.get(arborOf(id))
    expect(res.status).toBe(409)
    expect(res.body.error.code).toBe('not_counterweight')
    expect(res.body.error.message).toMatch(/multi-line hemp set: it has no arbor/)
    expect((await director.put(arborOf(id), { version: 0, bricks: [] })).status).toBe(409)
  })

  it('when another venue asks for the arbor, then it answers 404', async () => {
    const id = await freshLineset()
    expect((await otherVenue.get(arborOf(id))).status).toBe(404)
    expect((await otherVenue.put(arborOf(id), { version: 0, bricks: [] })).status).toBe(404)
  })
})

describe('counting an arbor at the rail', () => {
  it('when a technical director records 12 bricks, then they move from storage to the arbor, with a ledger entry in words', async () => {
    const id = await freshLineset()
    const before = await stockOf(alpha.brickTypeId)
    const res = await director.put(arborOf(id), {
      version: 0,
      bricks: [{ brickTypeId: alpha.brickTypeId, count: 12 }],
      note: 'counted after the fit-up',
    })
    expect(res.status, res.text).toBe(200)
    expect(res.body).toMatchObject({ version: 1, bricks: [{ brickTypeId: alpha.brickTypeId, count: 12 }] })
    expect((await director.get(arborOf(id))).body.version).toBe(1)
    const after = await stockOf(alpha.brickTypeId)
    expect(after).toMatchObject({
      owned: 100,
      onArbors: before.onArbors + 12,
      inStorage: before.inStorage - 12,
    })
    expect(after.byLineset).toContainEqual(
      expect.objectContaining({ linesetId: id, number: nextNumber - 1, count: 12 }),
    )
    const events = (await stageManager.get(`/api/v1/linesets/${id}/events`).expect(200)).body.events
    expect(events[0]).toMatchObject({
      type: 'arbor-counted',
      summary: 'Counted the arbor at the rail: Full 0 → 12 (counted after the fit-up)',
    })
  })

  it('when a brick type is left out of a count, then its bricks go back to storage', async () => {
    const id = await freshLineset()
    await director.put(arborOf(id), { version: 0, bricks: [{ brickTypeId: alpha.brickTypeId, count: 4 }] }).expect(200)
    const storage = await stockOf(alpha.brickTypeId)
    const res = await director.put(arborOf(id), { version: 1, bricks: [] })
    expect(res.status).toBe(200)
    expect(res.body.bricks).toEqual([{ brickTypeId: alpha.brickTypeId, name: 'Full', count: 0 }])
    expect((await stockOf(alpha.brickTypeId)).inStorage).toBe(storage.inStorage + 4)
  })

  it('when the count is based on an older arbor version, then it answers 409 and moves nothing', async () => {
    const id = await freshLineset()
    await director.put(arborOf(id), { version: 0, bricks: [{ brickTypeId: alpha.brickTypeId, count: 2 }] }).expect(200)
    const fingerprint = await databaseFingerprint(app.handle.db.sequelize)
    const stale = await director.put(arborOf(id), {
      version: 0,
      bricks: [{ brickTypeId: alpha.brickTypeId, count: 3 }],
    })
    expect(stale.status).toBe(409)
    expect(stale.body.error.code).toBe('stale_version')
    expect(await databaseFingerprint(app.handle.db.sequelize)).toBe(fingerprint)
    expect((await director.get(arborOf(id))).body.bricks[0].count).toBe(2)
  })

  it('when ten counts based on the same version race, then exactly one is recorded and the rest answer 409', async () => {
    const id = await freshLineset()
    const before = await stockOf(alpha.brickTypeId)
    const answers = await Promise.all(
      Array.from({ length: 10 }, (_, i) =>
        director.put(arborOf(id), { version: 0, bricks: [{ brickTypeId: alpha.brickTypeId, count: i + 1 }] }),
      ),
    )
    const recorded = answers.filter((res) => res.status === 200)
    expect(recorded).toHaveLength(1)
    expect(answers.filter((res) => res.status === 409 && res.body.error.code === 'stale_version')).toHaveLength(9)
    const count = recorded[0]!.body.bricks[0].count as number
    expect((await stockOf(alpha.brickTypeId)).onArbors).toBe(before.onArbors + count)
  })

  it('when storage holds fewer bricks than the count needs, then it answers 409 naming the type and how many are missing, and moves nothing', async () => {
    const id = await freshLineset()
    const { inStorage } = await stockOf(alpha.brickTypeId)
    const fingerprint = await databaseFingerprint(app.handle.db.sequelize)
    const res = await director.put(arborOf(id), {
      version: 0,
      bricks: [{ brickTypeId: alpha.brickTypeId, count: inStorage + 7 }],
    })
    expect(res.status).toBe(409)
    expect(res.body.error.code).toBe('not_enough_bricks')
    expect(res.body.error.message).toBe(
      `Not enough "Full" in storage: ${inStorage + 7} bricks needed, ${inStorage} there, 7 missing`,
    )
    expect(Object.keys(res.body.error.fields)).toEqual(['bricks.0.count'])
    expect(await databaseFingerprint(app.handle.db.sequelize)).toBe(fingerprint)
    expect((await stockOf(alpha.brickTypeId)).inStorage).toBe(inStorage)
  })

  it.each([
    { what: 'a negative count', brick: { brickTypeId: 'own', count: -1 }, field: 'bricks.0.count' },
    { what: 'a fractional count', brick: { brickTypeId: 'own', count: 1.5 }, field: 'bricks.0.count' },
    {
      what: 'an unknown brick type',
      brick: { brickTypeId: '00000000-0000-4000-8000-000000000000', count: 1 },
      field: 'bricks.0.brickTypeId',
    },
    { what: 'another venue’s brick type', brick: { brickTypeId: 'beta', count: 1 }, field: 'bricks.0.brickTypeId' },
  ])('when a count has $what, then it answers 400 naming $field and writes nothing', async ({ brick, field }) => {
    const id = await freshLineset()
    const brickTypeId =
      brick.brickTypeId === 'own'
        ? alpha.brickTypeId
        : brick.brickTypeId === 'beta'
          ? beta.brickTypeId
          : brick.brickTypeId
    const fingerprint = await databaseFingerprint(app.handle.db.sequelize)
    const res = await director.put(arborOf(id), { version: 0, bricks: [{ ...brick, brickTypeId }] })
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields)).toEqual([field])
    expect(await databaseFingerprint(app.handle.db.sequelize)).toBe(fingerprint)
  })

  it('when a fly operator or a stage manager records a count, then it answers 403', async () => {
    const id = await freshLineset()
    for (const client of [operator, stageManager])
      expect((await client.put(arborOf(id), { version: 0, bricks: [] })).status).toBe(403)
  })
})

describe('a lineset whose arbor holds bricks', () => {
  it('when it is retired or made a hemp set with bricks aboard, then 409 says to unload first; once counted empty, both go', async () => {
    const administrator = await signedIn(app.url, alpha.emails.administrator)
    const number = nextNumber++
    const id = (await director.post('/api/v1/linesets', sampleLineset(number)).expect(201)).body.id as string
    await director.put(arborOf(id), { version: 0, bricks: [{ brickTypeId: alpha.brickTypeId, count: 4 }] }).expect(200)
    const before = await databaseFingerprint(app.handle.db.sequelize)

    const retire = await administrator.delete(`/api/v1/linesets/${id}`)
    expect(retire.status).toBe(409)
    expect(retire.body.error.code).toBe('arbor_not_empty')
    expect(retire.body.error.message).toMatch(/4 bricks on its arbor/)
    const { version } = (await director.get(`/api/v1/linesets/${id}`).expect(200)).body
    const asHemp = { ...sampleLineset(number, { kind: 'hemp-multi', arborEmptyWeight: null, arborCapacity: null }) }
    const rekind = await director.put(`/api/v1/linesets/${id}`, { ...asHemp, version })
    expect(rekind.status).toBe(409)
    expect(rekind.body.error.code).toBe('arbor_not_empty')
    expect(await databaseFingerprint(app.handle.db.sequelize)).toBe(before)

    await director.put(arborOf(id), { version: 1, bricks: [] }).expect(200)
    await director.put(`/api/v1/linesets/${id}`, { ...asHemp, version }).expect(200)
    expect((await administrator.delete(`/api/v1/linesets/${id}`)).status).toBe(204)
  })
})
