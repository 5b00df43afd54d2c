import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { seedVenue, type VenueFixture } from '../support/fixtures.js'
import { Mailbox } from '../support/mailbox.js'
import { movableClock } from '../support/outbox.js'
import { TcpProxy } from '../support/tcp-proxy.js'
import { signedIn, startTestApp, type Client, type TestApp } from '../support/test-app.js'
import { hungLineset } from '../support/tickets.js'

// A mail server that is down while a ticket is opened and decided: the changes commit, their messages wait,
// and they are delivered once the server is back (a 200 lb drop on the sample set; invented test data).
describe('ticket mail while the mail server is down', () => {
  const clock = movableClock()
  let sink: Mailbox
  let proxy: TcpProxy
  let app: TestApp
  let venue: VenueFixture
  let director: Client
  let operator: Client
  beforeAll(async () => {
    sink = await Mailbox.open()
    proxy = new TcpProxy('127.0.0.1', sink.port)
    await proxy.open()
    app = await startTestApp({
      env: { SMTP_URL: `smtp://127.0.0.1:${proxy.port}?ignoreTLS=true`, MAIL_SWEEP_INTERVAL_MS: '20' },
      overrides: { clock },
    })
    sink.settle = () => app.handle.context.outbox.idle()
    venue = await seedVenue(app.handle.context, 'alpha')
    director = await signedIn(app.url, venue.emails['technical-director'])
    operator = await signedIn(app.url, venue.emails['fly-operator'])
  })
  afterAll(async () => {
    await app.stop()
    await proxy.cut()
    await sink.close()
  })

  it('when the mail server cannot be reached, then opening and approving still commit, and both messages arrive once it is back', async () => {
    const { hang } = await hungLineset(director, operator, 700)
    await proxy.cut()
    const opened = await operator.post('/api/v1/tickets', { hangId: hang.id })
    expect(opened.status).toBe(201)
    const approved = await director.post(`/api/v1/tickets/${opened.body.id}/approve`, { version: 0 })
    expect(approved.status).toBe(200)
    await app.handle.context.outbox.idle()
    const rows = await app.handle.db.models.Outbox.findAll({ where: { causeId: opened.body.id } })
    expect(rows.map((row) => row.state)).toEqual(['waiting', 'waiting'])
    expect(await sink.allTo(venue.emails['fly-operator'])).toEqual([])

    await proxy.open()
    // The first retry waits 30 s (MAIL_RETRY_FIRST_SECONDS' default); the sweep runs every 20 ms here.
    clock.advance(30)
    for (const row of rows)
      await expect.poll(async () => (await row.reload()).state, { timeout: 15_000, interval: 20 }).toBe('sent')
    const toDirector = await sink.latestTo(venue.emails['technical-director'])
    expect(toDirector.text).toContain(`/tickets/${opened.body.id}`)
    const toOpener = await sink.latestTo(venue.emails['fly-operator'])
    expect(toOpener.subject).toMatch(/approved/)
    expect(toOpener.text).toContain(`/tickets/${opened.body.id}`)
  })
})
