import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Client, TestApp } from '../support/test-app.js'
import { startTwoVenues } from '../support/venue-suite.js'

let app: TestApp
let director: Client
let operator: Client
let stageManager: Client
let otherVenue: Client

beforeAll(async () => {
  const venues = await startTwoVenues()
  app = venues.app
  director = venues.atAlpha['technical-director']
  operator = venues.atAlpha['fly-operator']
  stageManager = venues.atAlpha['stage-manager']
  otherVenue = venues.atBeta.administrator
})
afterAll(() => app.stop())

const show = (overrides: object = {}) => ({
  name: 'A test show',
  firstPerformance: '2026-11-20',
  lastPerformance: '2027-01-10',
  state: 'planning',
  ...overrides,
})

describe('productions', () => {
  it('when a technical director adds a production, then every role reads it with its days as typed', async () => {
    const created = (await director.post('/api/v1/productions', show()).expect(201)).body
    expect(created).toMatchObject({ ...show(), version: 0 })
    for (const reader of [operator, stageManager]) {
      const list = (await reader.get('/api/v1/productions').expect(200)).body
      expect(list).toContainEqual(created)
    }
  })

  it('when a production moves from planning to running and on to closed, then each save takes the version it read', async () => {
    const created = (await director.post('/api/v1/productions', show({ name: 'Moves on' })).expect(201)).body
    const { id, ...body } = created
    const running = (await director.put(`/api/v1/productions/${id}`, { ...body, state: 'running' }).expect(200)).body
    expect(running).toMatchObject({ state: 'running', version: 1 })
    const stale = await director.put(`/api/v1/productions/${id}`, { ...body, state: 'closed' })
    expect(stale.status).toBe(409)
    expect(stale.body.error.code).toBe('stale_version')
    await director.put(`/api/v1/productions/${id}`, { ...body, state: 'closed', version: 1 }).expect(200)
  })

  it('when a fly operator or a stage manager adds or changes a production, then it answers 403', async () => {
    const created = (await director.post('/api/v1/productions', show({ name: 'Guarded' })).expect(201)).body
    for (const writer of [operator, stageManager]) {
      expect((await writer.post('/api/v1/productions', show({ name: 'Not mine' }))).status).toBe(403)
      expect((await writer.put(`/api/v1/productions/${created.id}`, { ...created, name: 'Not mine' })).status).toBe(403)
    }
    expect(await app.handle.db.models.Production.count({ where: { name: 'Not mine' } })).toBe(0)
  })

  it('when the last performance is before the first, the state is unknown or a day is not a date, then it answers 400 naming each field', async () => {
    const res = await director.post('/api/v1/productions', {
      name: ' ',
      firstPerformance: '2026-02-30',
      lastPerformance: '2026-01-01',
      state: 'previews',
    })
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['firstPerformance', 'name', 'state'])
    const reversed = await director.post('/api/v1/productions', show({ lastPerformance: '2026-11-19' }))
    expect(reversed.status).toBe(400)
    expect(reversed.body.error.fields).toEqual({ lastPerformance: 'Must not be before the first performance' })
  })

  it('when another venue lists or changes this venue production, then it never sees it and gets 404', async () => {
    const created = (await director.post('/api/v1/productions', show({ name: 'Private show' })).expect(201)).body
    const theirs = (await otherVenue.get('/api/v1/productions').expect(200)).body as { id: string }[]
    expect(theirs.map((production) => production.id)).not.toContain(created.id)
    const { id, ...body } = created
    expect((await otherVenue.put(`/api/v1/productions/${id}`, body)).status).toBe(404)
  })
})
