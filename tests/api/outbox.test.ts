import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { seedVenue, type VenueFixture } from '../support/fixtures.js'
import { movableClock, queueMessages } from '../support/outbox.js'
import { signedIn, startTestApp, type Client, type TestApp } from '../support/test-app.js'

const clock = movableClock()
let app: TestApp
let alpha: VenueFixture
let beta: VenueFixture
let admin: Client

beforeAll(async () => {
  app = await startTestApp({ overrides: { clock } })
  alpha = await seedVenue(app.handle.context, 'alpha')
  beta = await seedVenue(app.handle.context, 'beta')
  admin = await signedIn(app.url, alpha.emails.administrator)
})
afterAll(() => app.stop())

describe('GET /api/v1/outbox', () => {
  it("when an administrator reads the outbox, then the venue's messages come newest first with where each stands, and no other venue's", async () => {
    await queueMessages(app.handle.context, beta.members.administrator, [
      { to: ['other@beta.test'], subject: 'Beta only', text: 'Not for alpha.' },
    ])
    const ids: string[] = []
    for (const n of [1, 2, 3]) {
      clock.advance(60)
      const mail = { to: [`crew${n}@alpha.test`, 'td@alpha.test'], subject: `Notice ${n}`, text: `Body ${n}` }
      ids.push(...(await queueMessages(app.handle.context, alpha.members.administrator, [mail])))
    }
    await app.handle.context.outbox.idle()
    const res = await admin.get('/api/v1/outbox').expect(200)
    expect(res.body.map((m: { subject: string }) => m.subject)).toEqual(['Notice 3', 'Notice 2', 'Notice 1'])
    expect(res.body[0]).toEqual({
      id: ids[2],
      to: ['crew3@alpha.test', 'td@alpha.test'],
      subject: 'Notice 3',
      createdAt: clock.now().toISOString(),
      state: 'sent',
      attempts: 1,
      lastError: null,
      sentAt: clock.now().toISOString(),
    })
  })

  it('when a page is asked for, then limit and before walk the list without gaps or repeats', async () => {
    const first = (await admin.get('/api/v1/outbox?limit=2').expect(200)).body
    expect(first.map((m: { subject: string }) => m.subject)).toEqual(['Notice 3', 'Notice 2'])
    const next = (await admin.get(`/api/v1/outbox?limit=2&before=${first[1].id}`).expect(200)).body
    expect(next.map((m: { subject: string }) => m.subject)).toEqual(['Notice 1'])
  })

  it('when the limit or the cursor is not valid, then it answers 400 naming the field', async () => {
    const tooMany = await admin.get('/api/v1/outbox?limit=1000').expect(400)
    expect(tooMany.body.error.fields).toEqual({ limit: 'Limit must be 100 or less' })
    const badCursor = await admin.get('/api/v1/outbox?before=yesterday').expect(400)
    expect(Object.keys(badCursor.body.error.fields)).toEqual(['before'])
  })

  it("when the cursor is another venue's message, then it answers 404", async () => {
    const betaAdmin = await signedIn(app.url, beta.emails.administrator)
    const betaMessage = (await betaAdmin.get('/api/v1/outbox').expect(200)).body[0]
    await admin.get(`/api/v1/outbox?before=${betaMessage.id}`).expect(404)
  })
})

describe('GET /api/v1/outbox/:id', () => {
  it('when an administrator opens a message, then it carries its text and, while waiting, when it is tried next', async () => {
    const list = (await admin.get('/api/v1/outbox').expect(200)).body
    const res = await admin.get(`/api/v1/outbox/${list[0].id}`).expect(200)
    expect(res.body).toMatchObject({ ...list[0], text: 'Body 3', nextAttemptAt: null })
  })

  it("when another venue's message is asked for, then it answers 404 as if it did not exist", async () => {
    const betaAdmin = await signedIn(app.url, beta.emails.administrator)
    const betaMessage = (await betaAdmin.get('/api/v1/outbox').expect(200)).body[0]
    expect(betaMessage.subject).toBe('Beta only')
    const res = await admin.get(`/api/v1/outbox/${betaMessage.id}`).expect(404)
    expect(res.body.error.code).toBe('not_found')
  })
})
