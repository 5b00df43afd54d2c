import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Board, BoardLineset } from '../../shared/schemas/board.js'
import { cookieHeader, cookiesSet } from '../support/cookies.js'
import { openEventStream, sessionCookie, type EventStream } from '../support/event-stream.js'
import { seedVenue, type VenueFixture } from '../support/fixtures.js'
import { Client, signedIn, startTestApp, type TestApp } from '../support/test-app.js'
import { hungLineset } from '../support/tickets.js'

// Two app processes on one database, as behind a load balancer: changes made through one reach the board
// streams the other serves. The second has a short keep-alive so a test can hear it.
let first: TestApp
let second: TestApp
let alpha: VenueFixture
let beta: VenueFixture
let director: Client
let operator: Client
let stageManager: Client
let betaDirector: Client
const streams: EventStream[] = []

beforeAll(async () => {
  first = await startTestApp()
  second = await startTestApp({ databaseUrl: first.databaseUrl, env: { BOARD_KEEPALIVE_MS: '50' } })
  alpha = await seedVenue(first.handle.context, 'alpha')
  beta = await seedVenue(first.handle.context, 'beta')
  director = await signedIn(first.url, alpha.emails['technical-director'])
  operator = await signedIn(first.url, alpha.emails['fly-operator'])
  stageManager = await signedIn(first.url, alpha.emails['stage-manager'])
  betaDirector = await signedIn(first.url, beta.emails['technical-director'])
})
afterAll(async () => {
  for (const stream of streams) stream.close()
  await second.stop()
  await first.stop()
})

const stream = async (app: TestApp, email: string, lastEventId?: string) => {
  const opened = await openEventStream(
    `${app.url}/api/v1/board/stream`,
    await sessionCookie(app.url, email),
    lastEventId,
  )
  streams.push(opened)
  return opened
}
const board = async (client: Client, query = '') =>
  (await client.get(`/api/v1/board${query}`).expect(200)).body as Board
const row = (found: Board, id: string) => found.linesets.find((lineset) => lineset.id === id) as BoardLineset
let nextNumber = 600
/** The event id of a stream id (`<id>.<horizon>`). */
const eventIdOf = (wire: string) => BigInt(wire.split('.')[0]!)

describe('the board', () => {
  it('when a set is hung and another locked out, then the board says so in number order, in the venue units, with who did it', async () => {
    const { id: hungId } = await hungLineset(director, operator, nextNumber++, 200)
    const { id: lockedId } = await hungLineset(director, operator, nextNumber++, 150)
    await director.post(`/api/v1/linesets/${lockedId}/lockout`, { reason: 'Frayed lift line' }).expect(201)

    const found = await board(stageManager)
    expect(found.unitSystem).toBe('imperial')
    const numbers = found.linesets.map((lineset) => lineset.number)
    expect(numbers).toEqual([...numbers].sort((a, b) => a - b))
    expect(row(found, hungId).hang).toMatchObject({ title: 'Drop of 200 lb', revision: 1 })
    const locked = row(found, lockedId)
    expect(locked.operatingStatus).toBe('locked-out')
    expect(locked.lockout).toMatchObject({ reason: 'Frayed lift line' })
    expect(locked.lastChange).toMatchObject({ type: 'lineset-locked-out', by: { name: expect.any(String) } })
    expect(locked.lastChange!.by!.id).toBe(alpha.members['technical-director'].id)
  })

  it('when the board and the lineset list are read, then every lineset has the same operating status and total load in both', async () => {
    const list = (await stageManager.get('/api/v1/linesets').expect(200)).body as {
      id: string
      operatingStatus: string
      currentHang: { totalLoad: number } | null
    }[]
    const found = await board(stageManager)
    expect(found.linesets).toHaveLength(list.length)
    for (const lineset of list) {
      expect(row(found, lineset.id).operatingStatus).toBe(lineset.operatingStatus)
      expect(row(found, lineset.id).hang?.totalLoad ?? null).toBe(lineset.currentHang?.totalLoad ?? null)
    }
  })

  it('when a weight change is completed, then its last change names the technical director who approved it', async () => {
    const { id: linesetId, hang } = await hungLineset(director, operator, nextNumber++, 200)
    const ticket = (await operator.post('/api/v1/tickets', { hangId: hang.id }).expect(201)).body
    const admin = await signedIn(first.url, alpha.emails.administrator)
    await admin.post(`/api/v1/tickets/${ticket.id}/approve`, { version: 0 }).expect(200)
    await operator.post(`/api/v1/tickets/${ticket.id}/start-loading`, { version: 1 }).expect(200)
    await operator
      .post(`/api/v1/tickets/${ticket.id}/complete`, { version: 2, loaded: [], feltBalance: 'balanced' })
      .expect(200)
    const change = row(await board(stageManager), linesetId).lastChange!
    expect(change.type).toBe('ticket-loaded')
    expect(change.by!.id).toBe(alpha.members.administrator.id)
  })

  it('when another venue reads the board, then none of this venue linesets is on it, and this venue production is a 404', async () => {
    const theirs = await board(betaDirector)
    expect(theirs.linesets.map((lineset) => lineset.id)).not.toContain(alpha.linesetId)
    const production = (
      await director
        .post('/api/v1/productions', {
          name: 'Winter Lanterns',
          firstPerformance: '2026-12-01',
          lastPerformance: '2027-01-10',
          state: 'running',
        })
        .expect(201)
    ).body
    const res = await betaDirector.get(`/api/v1/board?productionId=${production.id}`)
    expect(res.status).toBe(404)
    const mine = await board(director, `?productionId=${production.id}`)
    expect(mine.linesets).toEqual([])
  })

  it('when the production filter is not an id, then it answers 400 naming the field', async () => {
    const res = await stageManager.get('/api/v1/board?productionId=nope')
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toHaveProperty('productionId')
  })
})

describe('the board stream', () => {
  it('when nobody is signed in, then the stream answers 401', async () => {
    const anonymous = await openEventStream(`${second.url}/api/v1/board/stream`, null)
    streams.push(anonymous)
    expect(anonymous.status).toBe(401)
  })

  it('when a lock-out is made through one app process, then a board streamed by the other hears it, and another venue hears nothing of it', async () => {
    const mine = await stream(second, alpha.emails['stage-manager'])
    const theirs = await stream(second, beta.emails['stage-manager'])
    await mine.next((event) => event.event === 'ready')
    await theirs.next((event) => event.event === 'ready')

    await director.post(`/api/v1/linesets/${alpha.linesetId}/lockout`, { reason: 'Rope lock slipping' }).expect(201)
    const heard = await mine.next((event) => event.event === 'lockout')
    expect(heard.data).toMatchObject({ linesetId: alpha.linesetId, type: 'lineset-locked-out' })
    // The id on the wire is the event's, then the horizon a reconnect resumes from.
    expect(heard.id).toMatch(new RegExp(`^${heard.data!.id}\\.\\d+$`))

    // The other venue's own change arrives, and it is the only thing it heard.
    await betaDirector.post(`/api/v1/linesets/${beta.linesetId}/lockout`, { reason: 'Inspection' }).expect(201)
    await theirs.next((event) => event.event === 'lockout')
    const linesetIds = theirs.heard.flatMap((event) => (event.data?.linesetId ? [event.data.linesetId] : []))
    expect(linesetIds).toEqual([beta.linesetId])
    await director.delete(`/api/v1/linesets/${alpha.linesetId}/lockout`, { reason: 'Checked and cleared' }).expect(204)
    await betaDirector
      .delete(`/api/v1/linesets/${beta.linesetId}/lockout`, { reason: 'Checked and cleared' })
      .expect(204)
  })

  it('when a board reconnects with Last-Event-ID, then it first hears every change it missed, in order', async () => {
    const before = await stream(second, alpha.emails['stage-manager'])
    const ready = await before.next((event) => event.event === 'ready')
    before.close()

    const { id: linesetId } = await hungLineset(director, operator, nextNumber++, 120)
    await director.post(`/api/v1/linesets/${linesetId}/lockout`, { reason: 'Batten bent' }).expect(201)

    const after = await stream(second, alpha.emails['stage-manager'], ready.id!)
    await after.next((event) => event.event === 'lockout')
    const missed = after.heard.filter((event) => event.data?.linesetId === linesetId)
    expect(missed.map((event) => event.event)).toEqual(['lineset', 'hang', 'lockout'])
    const ids = missed.map((event) => eventIdOf(event.id!))
    expect(ids).toEqual([...ids].sort((a, b) => (a < b ? -1 : 1)))
    expect(ids[0]! > eventIdOf(ready.id!)).toBe(true)
  })

  it('when a change with a smaller id commits after a board heard a later one and went away, then its reconnect still hears it', async () => {
    const { db, live } = first.handle.context
    const before = await stream(second, alpha.emails['stage-manager'])
    await before.next((event) => event.event === 'ready')

    // A slow change takes its id first and holds its transaction open while a quicker one commits.
    let finish = () => {}
    const held = new Promise<void>((resolve) => (finish = resolve))
    let slowId = ''
    const slow = db.sequelize.transaction(async (transaction) => {
      const [[row]] = (await db.sequelize.query(
        `INSERT INTO lineset_events (venue_id, lineset_id, actor_id, event_type, payload)
         VALUES ($1, $2, NULL, 'lineset-changed', '{}') RETURNING id::text AS id`,
        { bind: [alpha.venueId, alpha.linesetId], transaction },
      )) as [[{ id: string }], unknown]
      slowId = row.id
      await live.publish(
        { type: 'lineset-changed', venueId: alpha.venueId, linesetId: alpha.linesetId, eventId: slowId },
        transaction,
      )
      await held
    })
    await expect.poll(() => slowId).not.toBe('')
    await director.post(`/api/v1/linesets/${alpha.linesetId}/lockout`, { reason: 'Quick one' }).expect(201)
    const quick = await before.next((event) => event.event === 'lockout')
    expect(eventIdOf(quick.id!) > BigInt(slowId)).toBe(true)
    before.close()

    finish()
    await slow // committed while no board of this member was listening
    const after = await stream(second, alpha.emails['stage-manager'], quick.id!)
    const caught = await after.next((event) => event.data?.id === slowId)
    expect(caught).toMatchObject({ event: 'lineset', data: { linesetId: alpha.linesetId, type: 'lineset-changed' } })
    await director.delete(`/api/v1/linesets/${alpha.linesetId}/lockout`, { reason: 'Checked and cleared' }).expect(204)
  })

  it('when a board stays open, then it hears a keep-alive comment line at the configured interval', async () => {
    const open = await stream(second, alpha.emails['stage-manager'])
    await open.next((event) => event.event === 'comment' && event.comment === 'keep-alive')
  })

  it('when the member signs out, then the board stream they opened ends at the next keep-alive', async () => {
    const member = new Client(second.url)
    const signIn = await member.signIn(alpha.emails['stage-manager'])
    const open = await openEventStream(`${second.url}/api/v1/board/stream`, cookieHeader(cookiesSet(signIn)))
    streams.push(open)
    await open.next((event) => event.event === 'comment' && event.comment === 'keep-alive')
    expect(open.ended).toBe(false)

    await member.delete('/api/v1/session').expect(204)
    await expect.poll(() => open.ended, { timeout: 5000, interval: 10 }).toBe(true)
  })

  it('when a member leaves the venue, then the board stream they opened ends at the next keep-alive', async () => {
    const open = await stream(second, beta.emails['fly-operator'])
    await open.next((event) => event.event === 'comment' && event.comment === 'keep-alive')
    await second.handle.db.sequelize.query(
      `DELETE FROM memberships WHERE venue_id = $1 AND user_id = (SELECT id FROM users WHERE email = $2)`,
      { bind: [beta.venueId, beta.emails['fly-operator']] },
    )
    await expect.poll(() => open.ended, { timeout: 5000, interval: 10 }).toBe(true)
  })

  it('when boards disconnect, then the app process holds no subscriber for them', async () => {
    const open = await stream(second, alpha.emails['stage-manager'])
    await open.next((event) => event.event === 'ready')
    expect(second.handle.liveHub.size()).toBeGreaterThan(0)
    for (const each of streams) each.close()
    await expect.poll(() => second.handle.liveHub.size(), { timeout: 5000, interval: 10 }).toBe(0)
  })
})
