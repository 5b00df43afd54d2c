import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { sampleLineset, seedVenue, type VenueFixture } from '../support/fixtures.js'
import { signedIn, startTestApp, type Client, type TestApp } from '../support/test-app.js'

let app: TestApp
let venue: VenueFixture
let admin: Client
let reader: Client

beforeAll(async () => {
  app = await startTestApp()
  venue = await seedVenue(app.handle.context, 'alpha')
  admin = await signedIn(app.url, venue.emails.administrator)
  reader = await signedIn(app.url, venue.emails['stage-manager'])
})
afterAll(() => app.stop())

const events = (client: Client, id: string, query = '') => client.get(`/api/v1/linesets/${id}/events${query}`)

async function switchUnits(unitSystem: 'imperial' | 'metric') {
  const settings = (await admin.get('/api/v1/venue').expect(200)).body
  const policies =
    unitSystem === 'metric'
      ? { balanceTolerance: 5, ropeLockHolding: 23 }
      : { balanceTolerance: 10, ropeLockHolding: 50 }
  await admin.put('/api/v1/venue', { ...settings, unitSystem, ...policies }).expect(200)
}

describe("a lineset's history", () => {
  it('when a lineset is added, changed and retired, then its history reads newest first, in plain words, by whom', async () => {
    const created = (await admin.post('/api/v1/linesets', sampleLineset(2, { name: 'Border 1' })).expect(201)).body
    await admin.put(`/api/v1/linesets/${created.id}`, { ...created, name: 'Border one', battenLength: 42 }).expect(200)
    await admin.delete(`/api/v1/linesets/${created.id}`).expect(204)

    const page = (await events(reader, created.id).expect(200)).body
    expect(page.next).toBeNull()
    expect(page.events.map((e: { type: string }) => e.type)).toEqual([
      'lineset-retired',
      'lineset-changed',
      'lineset-added',
    ])
    expect(page.events.map((e: { summary: string }) => e.summary)).toEqual([
      'Retired: taken out of the lists, its history kept',
      'Changed the name and batten length',
      'Added as lineset 2, Border 1',
    ])
    for (const event of page.events) {
      expect(Object.keys(event).sort()).toEqual(['actor', 'id', 'occurredAt', 'payload', 'summary', 'type'])
      expect(event.actor).toEqual({ id: venue.members.administrator.id, name: venue.members.administrator.name })
      expect(Number.isNaN(Date.parse(event.occurredAt))).toBe(false)
    }
    expect(page.events[1].payload.changed).toEqual(['name', 'battenLength'])
  })

  it('when the ledger stores figures, then they are SI, and they read in whatever units the venue uses now (NIST SP 811: 1 ft = 0.3048 m, 1 lb = 0.45359237 kg)', async () => {
    const created = (
      await admin.post('/api/v1/linesets', sampleLineset(3, { battenLength: 40, ratedLoad: 1000 })).expect(201)
    ).body
    const stored = await app.handle.db.models.LinesetEvent.findOne({ where: { linesetId: created.id } })
    const lineset = stored!.payload.lineset as Record<string, unknown>
    expect(lineset).toMatchObject({ battenLength: '12.192', ratedLoad: '453.59237', arborStackLength: '1.524' })
    expect(stored!.payload).not.toHaveProperty('unitSystem')

    const imperial = (await events(reader, created.id).expect(200)).body.events[0].payload.lineset
    expect(imperial).toMatchObject({ battenLength: 40, ratedLoad: 1000, arborStackLength: 60, unitSystem: 'imperial' })
    await switchUnits('metric')
    try {
      const metric = (await events(reader, created.id).expect(200)).body.events[0].payload.lineset
      expect(metric).toMatchObject({
        battenLength: 12.192,
        ratedLoad: 453.59237,
        arborStackLength: 1524,
        unitSystem: 'metric',
      })
    } finally {
      await switchUnits('imperial')
    }
  })

  it('when an entry was written before the ledger kept SI, then its figures still read in the venue units', async () => {
    // The first entries kept the body as typed, with the units it was typed in; the ledger is never rewritten.
    const { unitSystem: _typedIn, ...typed } = sampleLineset(1, { battenLength: 20 })
    await app.handle.db.models.LinesetEvent.create({
      venueId: venue.venueId,
      linesetId: venue.linesetId,
      actorId: null,
      eventType: 'lineset-changed',
      payload: { unitSystem: 'imperial', lineset: typed },
    })
    await switchUnits('metric')
    try {
      const latest = (await events(reader, venue.linesetId).expect(200)).body.events[0]
      expect(latest).toMatchObject({ actor: null, summary: 'Changed' })
      expect(latest.payload.lineset).toMatchObject({ battenLength: 6.096, unitSystem: 'metric' }) // 20 ft
      expect(latest.payload).not.toHaveProperty('unitSystem')
    } finally {
      await switchUnits('imperial')
    }
  })

  it('when the history is read a page at a time, then the pages follow on without gaps or repeats', async () => {
    const created = (await admin.post('/api/v1/linesets', sampleLineset(4)).expect(201)).body
    let current = created
    for (const name of ['A', 'B', 'C', 'D'])
      current = (await admin.put(`/api/v1/linesets/${created.id}`, { ...current, name }).expect(200)).body
    const seen: string[] = []
    let before: string | null = null
    let pages = 0
    do {
      const query: string = `?limit=2${before ? `&before=${before}` : ''}`
      const page = (await events(reader, created.id, query).expect(200)).body
      seen.push(...page.events.map((e: { id: string }) => e.id))
      before = page.next
      pages += 1
    } while (before)
    expect(pages).toBe(3)
    expect(seen).toHaveLength(5)
    expect(new Set(seen).size).toBe(5)
    expect([...seen].sort((a, b) => Number(b) - Number(a))).toEqual(seen)
  })

  it('when the limit or cursor is out of bounds, then it answers 400 naming the field', async () => {
    for (const [query, field] of [
      ['?limit=0', 'limit'],
      ['?limit=101', 'limit'],
      ['?limit=ten', 'limit'],
      ['?before=-1', 'before'],
      ['?before=abc', 'before'],
    ]) {
      const res = await events(reader, venue.linesetId, query)
      expect(res.status, query).toBe(400)
      expect(Object.keys(res.body.error.fields), query).toEqual([field])
    }
    expect((await events(reader, venue.linesetId, '?limit=100')).status).toBe(200)
  })

  it('when a lineset does not exist, then its history is a 404', async () => {
    expect((await events(reader, '00000000-0000-4000-8000-000000000000')).status).toBe(404)
  })
})
