import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { seedDemoIfEmpty } from '../../server/db/seeders/demo.js'
import { DEMO_LINESETS, HEMP_LINE } from '../../server/db/seeders/demo-linesets.js'
import { workingLoadLimit } from '../../shared/engine/capacity-checks.js'
import { DEMO_PASSWORD } from '../../server/db/seeders/demo-people.js'
import { signedIn, startTestApp, type TestApp } from '../support/test-app.js'

let app: TestApp

beforeAll(async () => {
  app = await startTestApp()
  expect(await seedDemoIfEmpty(app.handle.context)).toBe(true)
})
afterAll(() => app.stop())

describe('the demo venue', () => {
  it('when the demo is seeded, then every lineset has exactly one lineset-added ledger entry, by its administrator', async () => {
    const { Lineset, LinesetEvent, User } = app.handle.db.models
    const linesets = await Lineset.findAll({ attributes: ['id'] })
    expect(linesets).toHaveLength(DEMO_LINESETS.length)
    const administrator = await User.findOne({ where: { email: 'admin@demo.test' } })
    for (const { id } of linesets) {
      const entries = await LinesetEvent.findAll({ where: { linesetId: id, eventType: 'lineset-added' } })
      expect(entries.map((entry) => entry.actorId)).toEqual([administrator!.id])
    }
  })

  it('when the demo is read through the API, then its history shows the addition and the saved hang in plain words', async () => {
    const reader = await signedIn(app.url, 'sm@demo.test', DEMO_PASSWORD)
    const first = (await reader.get('/api/v1/linesets').expect(200)).body[0]
    const history = (await reader.get(`/api/v1/linesets/${first.id}/events`).expect(200)).body
    expect(history.events.map((e: { summary: string }) => e.summary)).toEqual([
      expect.stringMatching(/^Counted the arbor at the rail: .+ 0 → \d+/),
      expect.stringMatching(/^Saved hang revision 1, “Main valance”: 1 item, [\d,.]+ lb in all$/),
      `Added as lineset 1, ${first.name}`,
    ])
  })

  it('when the demo is seeded, then a running production has hangs on at least 15 linesets, some with several revisions', async () => {
    const reader = await signedIn(app.url, 'sm@demo.test', DEMO_PASSWORD)
    const [show] = (await reader.get('/api/v1/productions').expect(200)).body
    expect(show.state).toBe('running')
    const linesets = (await reader.get('/api/v1/linesets').expect(200)).body as {
      id: string
      currentHang: { revision: number } | null
    }[]
    const hung = linesets.filter((lineset) => lineset.currentHang)
    expect(hung.length).toBeGreaterThanOrEqual(15)
    expect(hung.filter((lineset) => lineset.currentHang!.revision >= 2).length).toBeGreaterThanOrEqual(3)
    const revisions = (await reader.get(`/api/v1/linesets/${hung[0]!.id}/hangs`).expect(200)).body
    expect(revisions[0].productionId).toBe(show.id)
    const library = (await reader.get('/api/v1/item-types').expect(200)).body as { notes: string }[]
    expect(library.length).toBeGreaterThan(5)
    for (const item of library) expect(item.notes).toMatch(/^Demo data/)
  })

  it('when a hemp set is read, then it carries the fibre rope’s figures, not the wire rope’s, and still holds its rated load', async () => {
    const reader = await signedIn(app.url, 'sm@demo.test', DEMO_PASSWORD)
    const linesets = (await reader.get('/api/v1/linesets').expect(200)).body as { id: string; kind: string }[]
    const hemp = linesets.filter((lineset) => lineset.kind.startsWith('hemp-'))
    expect(hemp.map((lineset) => lineset.kind).sort()).toEqual(['hemp-multi', 'hemp-multi', 'hemp-single'])
    for (const { id } of hemp) {
      const set = (await reader.get(`/api/v1/linesets/${id}`).expect(200)).body
      expect(set, set.name).toMatchObject(HEMP_LINE)
      // The demo venue's design factor is 8 (seeded); 1,400 lb / 8 = 175 lb, not a 1/4 in wire rope's 875 lb.
      expect(workingLoadLimit(set.liftLineBreakingStrength, 8).toNumber(), set.name).toBe(175)
      // Its rated load fits what its lines hold together (the single line alone for the chandelier).
      expect(set.ratedLoad, set.name).toBeLessThanOrEqual(175 * set.pickPoints.length)
    }
    const chandelier = DEMO_LINESETS.find((lineset) => lineset.name === 'Chandelier line')!
    expect(chandelier).toMatchObject({ kind: 'hemp-single', ...HEMP_LINE })
    // The house's wire rope stays on the counterweight sets and the spot lines.
    for (const lineset of DEMO_LINESETS.filter((l) => !l.kind.startsWith('hemp-')))
      expect(lineset.liftLineBreakingStrength, lineset.name).toBe(7000)
  })

  it('when seeding is asked again, then it leaves the venue as it was', async () => {
    expect(await seedDemoIfEmpty(app.handle.context)).toBe(false)
    expect(await app.handle.db.models.Venue.count()).toBe(1)
  })
})

describe('the demo arbors and brick stock', () => {
  it('when the demo is seeded, then every hung counterweight set holds bricks and reads ready, and one spare is locked out', async () => {
    const reader = await signedIn(app.url, 'sm@demo.test', DEMO_PASSWORD)
    const linesets = (await reader.get('/api/v1/linesets').expect(200)).body as {
      id: string
      number: number
      kind: string
      status: string
      operatingStatus: string
      currentHang: object | null
    }[]
    const hungCounterweight = linesets.filter((l) => l.kind.startsWith('counterweight-') && l.currentHang)
    expect(hungCounterweight.length).toBeGreaterThanOrEqual(10)
    let loaded = 0
    for (const lineset of hungCounterweight) {
      const arbor = (await reader.get(`/api/v1/linesets/${lineset.id}/arbor`).expect(200)).body
      if (arbor.bricks.some((brick: { count: number }) => brick.count > 0)) loaded++
      if (lineset.status === 'in-service') expect(lineset.operatingStatus, `lineset ${lineset.number}`).toBe('ready')
    }
    expect(loaded).toBe(hungCounterweight.length)
    expect(linesets.find((l) => l.number === 11)).toMatchObject({
      operatingStatus: 'locked-out',
      lockout: { reason: expect.stringMatching(/inspection booked/) },
    })
  })

  it('when the demo stock is read, then each type owns more than is on arbors and the counts add up', async () => {
    const reader = await signedIn(app.url, 'sm@demo.test', DEMO_PASSWORD)
    const stock = (await reader.get('/api/v1/brick-stock').expect(200)).body as {
      owned: number
      onArbors: number
      reserved: number
      inStorage: number
      byLineset: { count: number }[]
    }[]
    expect(stock.some((line) => line.onArbors > 0)).toBe(true)
    for (const line of stock) {
      expect(line.owned).toBeGreaterThan(line.onArbors)
      expect(line.onArbors + line.reserved + line.inStorage).toBe(line.owned)
      expect(line.byLineset.reduce((sum, l) => sum + l.count, 0)).toBe(line.onArbors)
    }
  })
})
