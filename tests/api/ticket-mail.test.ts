import { beforeAll, describe, expect, it } from 'vitest'
import { mailOutageSuite, movableClock } from '../support/outbox.js'
import { signedIn, type Client } from '../support/test-app.js'
import { hungLineset } from '../support/tickets.js'

// A mail server that is down while a ticket is opened and decided: the changes commit, their messages wait,
// and they are delivered once the server is back (a 200 lb drop on the sample set; invented test data).
describe('ticket mail while the mail server is down', () => {
  const clock = movableClock()
  const outage = mailOutageSuite(clock)
  let director: Client
  let operator: Client
  beforeAll(async () => {
    director = await signedIn(outage.app.url, outage.venue.emails['technical-director'])
    operator = await signedIn(outage.app.url, outage.venue.emails['fly-operator'])
  })

  it('when the mail server cannot be reached, then opening and approving still commit, and both messages arrive once it is back', async () => {
    const { hang } = await hungLineset(director, operator, 700)
    await outage.proxy.cut()
    const opened = await operator.post('/api/v1/tickets', { hangId: hang.id })
    expect(opened.status).toBe(201)
    const approved = await director.post(`/api/v1/tickets/${opened.body.id}/approve`, { version: 0 })
    expect(approved.status).toBe(200)
    await outage.app.handle.context.outbox.idle()
    const rows = await outage.app.handle.db.models.Outbox.findAll({ where: { causeId: opened.body.id } })
    expect(rows.map((row) => row.state)).toEqual(['waiting', 'waiting'])
    expect(await outage.sink.allTo(outage.venue.emails['fly-operator'])).toEqual([])

    await outage.proxy.open()
    // The first retry waits 30 s (MAIL_RETRY_FIRST_SECONDS' default); the sweep runs every 20 ms here.
    clock.advance(30)
    for (const row of rows)
      await expect.poll(async () => (await row.reload()).state, { timeout: 15_000, interval: 20 }).toBe('sent')
    const toDirector = await outage.sink.latestTo(outage.venue.emails['technical-director'])
    expect(toDirector.text).toContain(`/tickets/${opened.body.id}`)
    const toOpener = await outage.sink.latestTo(outage.venue.emails['fly-operator'])
    expect(toOpener.subject).toMatch(/approved/)
    expect(toOpener.text).toContain(`/tickets/${opened.body.id}`)
  })
})
