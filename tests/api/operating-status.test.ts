import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { loadBricks } from '../../server/modules/brick-stock/brick-stock.service.js'
import { sampleLineset, seedVenue, type VenueFixture } from '../support/fixtures.js'
import { signedIn, startTestApp, type Client, type TestApp } from '../support/test-app.js'

// The sample lineset (40 ft batten at 2.72 lb/ft, arbor 90 lb empty with 110 lb of pipe weight aboard) and the
// fixture's 20 lb bricks: a 200 lb drop needs about 109 lb of bricks, so five (100 lb) leave 8.8 lb batten
// heavy, within the venue's 10 lb tolerance (invented test data).
let app: TestApp
let alpha: VenueFixture
let director: Client
let operator: Client

beforeAll(async () => {
  app = await startTestApp()
  alpha = await seedVenue(app.handle.context, 'alpha')
  director = await signedIn(app.url, alpha.emails['technical-director'])
  operator = await signedIn(app.url, alpha.emails['fly-operator'])
})
afterAll(() => app.stop())

let nextNumber = 800
async function hungLineset(overrides = {}) {
  const id = (await director.post('/api/v1/linesets', sampleLineset(nextNumber++, overrides)).expect(201)).body.id
  const hang = await operator
    .post(`/api/v1/linesets/${id}/hangs`, {
      title: 'Drop',
      basedOnRevision: null,
      items: [{ label: 'Drop', category: 'scenery', weight: 200, at: 20 }],
      unitSystem: 'imperial',
    })
    .expect(201)
  return { id: id as string, hang: hang.body }
}
const statusOf = async (id: string) =>
  ((await operator.get('/api/v1/linesets').expect(200)).body as { id: string; operatingStatus: string }[]).find(
    (lineset) => lineset.id === id,
  )!.operatingStatus
const count = (id: string, bricks: number, version = 0) =>
  director
    .put(`/api/v1/linesets/${id}/arbor`, { version, bricks: [{ brickTypeId: alpha.brickTypeId, count: bricks }] })
    .expect(200)

describe('operating status in the lineset list', () => {
  it('when the current hang says stop, then the list, the lineset and the board all read unsafe hang', async () => {
    // 200 lb drop + 108.8 lb of batten = 308.8 lb against a rated load of 250 lb (invented test data).
    const { id, hang } = await hungLineset({ ratedLoad: 250 })
    expect(hang.result.checks).toContainEqual(expect.objectContaining({ code: 'over-rated-load', level: 'danger' }))
    await count(id, 5)
    expect(await statusOf(id)).toBe('unsafe-hang')
    expect((await operator.get(`/api/v1/linesets/${id}`)).body.operatingStatus).toBe('unsafe-hang')
    const board = (await operator.get('/api/v1/board').expect(200)).body.linesets as { id: string }[]
    expect(board.find((row) => row.id === id)).toMatchObject({ operatingStatus: 'unsafe-hang' })
    // Only a new revision whose figures are clear ends it: 120 + 108.8 = 228.8 lb, within the 250 lb rating and
    // above the 200 lb of arbor frame and pipe weight.
    await operator
      .post(`/api/v1/linesets/${id}/hangs`, {
        title: 'A lighter drop',
        basedOnRevision: 1,
        items: [{ label: 'Drop', category: 'scenery', weight: 120, at: 20 }],
        unitSystem: 'imperial',
      })
      .expect(201)
    expect(await statusOf(id)).not.toBe('unsafe-hang')
  })

  it('when the arbor holds the engine’s plan for the current hang, then the set is ready', async () => {
    const { id, hang } = await hungLineset()
    expect(hang.result.counterweight.bricks).toEqual([expect.objectContaining({ name: 'Full', count: 5 })])
    await count(id, 5)
    expect(await statusOf(id)).toBe('ready')
    expect((await operator.get(`/api/v1/linesets/${id}`)).body.operatingStatus).toBe('ready')
  })

  it('when the arbor is short of the current hang beyond the tolerance, then the set is out of balance', async () => {
    const { id } = await hungLineset()
    expect(await statusOf(id)).toBe('out-of-balance')
    await count(id, 4) // 28.8 lb batten heavy
    expect(await statusOf(id)).toBe('out-of-balance')
    await count(id, 6, 1) // 11.2 lb arbor heavy
    expect(await statusOf(id)).toBe('out-of-balance')
  })

  it('when a double-purchase arbor carries twice the batten side, then it is ready', async () => {
    const { id, hang } = await hungLineset({ kind: 'counterweight-double' })
    const planned = hang.result.counterweight.bricks[0].count as number
    expect(hang.result.counterweight.outOfBalance).toBeLessThanOrEqual(10)
    await count(id, planned)
    expect(await statusOf(id)).toBe('ready')
  })

  it('when a change ticket is requested or being loaded, then the figures speak first, then loading', async () => {
    const { id, hang } = await hungLineset()
    const ticket = await app.handle.db.models.WeightChangeTicket.create({
      venueId: alpha.venueId,
      linesetId: id,
      hangId: hang.id,
      requestedBy: alpha.members['fly-operator'].id,
      decidedBy: null,
      decidedAt: null,
      requiredWeight: null,
      loadedWeight: null,
    })
    // The arbor is empty: the hang is out of balance, and says so while its change waits for a decision.
    expect(await statusOf(id)).toBe('out-of-balance')
    await count(id, 5) // 8.8 lb batten heavy, within the 10 lb tolerance
    expect(await statusOf(id)).toBe('awaiting-approval')
    await ticket.update({ state: 'loading' })
    expect(await statusOf(id)).toBe('loading')
    await ticket.update({ state: 'loaded' })
    expect(await statusOf(id)).toBe('ready')
  })

  it('when the last completion was felt batten heavy, then the set is out of balance until the arbor is counted again', async () => {
    const { id } = await hungLineset()
    const asDirector = { ...app.handle.context, actor: alpha.members['technical-director'] }
    const brick = (n: number) => [{ brickTypeId: alpha.brickTypeId, count: n }]
    await loadBricks(asDirector, id, { reserved: [], loaded: brick(5), feltBalance: 'batten-heavy' })
    expect(await statusOf(id)).toBe('out-of-balance')
    await count(id, 5, 1)
    expect(await statusOf(id)).toBe('ready')
  })

  it('when a set is out of service, then that outranks everything else', async () => {
    const { id } = await hungLineset({ status: 'out-of-service' })
    await director.post(`/api/v1/linesets/${id}/lockout`, { reason: 'Both' }).expect(201)
    expect(await statusOf(id)).toBe('out-of-service')
  })

  it('when a set is a hemp set with a hang, then it is ready (its balance is the operator’s haul, not an arbor)', async () => {
    const { id } = await hungLineset({ kind: 'hemp-multi', arborEmptyWeight: null, arborCapacity: null })
    expect(await statusOf(id)).toBe('ready')
  })
})
