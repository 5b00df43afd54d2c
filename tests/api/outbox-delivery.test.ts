import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { queueMail } from '../../server/modules/outbox/outbox.service.js'
import { seedVenue, type VenueFixture } from '../support/fixtures.js'
import { Mailbox } from '../support/mailbox.js'
import { mailOutageSuite, movableClock, outboxRows, queueMessages } from '../support/outbox.js'
import { signedIn, startTestApp, type TestApp } from '../support/test-app.js'

const invite = (email: string) => ({ email, name: 'New hand', role: 'fly-operator' })

describe('mail written with the change that causes it', () => {
  let app: TestApp
  let venue: VenueFixture
  beforeAll(async () => {
    app = await startTestApp()
    venue = await seedVenue(app.handle.context, 'alpha')
  })
  afterAll(() => app.stop())

  it('when the change rolls back after queueing its message, then no message is kept and none is sent', async () => {
    const { context } = app.handle
    const rolledBack = context.db.sequelize.transaction(async (transaction) => {
      await queueMail(
        { ...context, actor: venue.members.administrator, transaction },
        {
          to: ['nobody@alpha.test'],
          subject: 'Never sent',
          text: 'This change is undone.',
        },
      )
      throw new Error('the change failed after its mail was queued')
    })
    await expect(rolledBack).rejects.toThrow('the change failed')
    expect(await context.db.models.Outbox.count({ where: { subject: 'Never sent' } })).toBe(0)
    expect(await app.mailbox.allTo('nobody@alpha.test')).toEqual([])
  })

  it('when queueMail is called outside a transaction, then it refuses', async () => {
    const outside = { ...app.handle.context, actor: venue.members.administrator } as never
    await expect(queueMail(outside, { to: ['a@alpha.test'], subject: 'S', text: 'T' })).rejects.toThrow(/transaction/)
  })

  it('when an invitation commits, then its message reaches the mail server after commit, to the invited address only, and reads as sent', async () => {
    const admin = await signedIn(app.url, venue.emails.administrator)
    const sent = await admin.post('/api/v1/people', invite('Rowan@Alpha.test')).expect(201)
    const mail = await app.mailbox.latestTo('rowan@alpha.test')
    expect(mail.to).toEqual(['rowan@alpha.test'])
    expect(mail.subject).toBe('Join Venue alpha on Loftledger')
    const [row] = await app.handle.db.models.Outbox.findAll({ where: { causeId: sent.body.id } })
    expect(row).toMatchObject({ state: 'sent', attempts: 1, lastError: null, causeKind: 'invitation' })
    expect(row!.recipients).toEqual(['rowan@alpha.test'])
    expect(row!.queuedBy).toBe(venue.members.administrator.id)
    expect(row!.bodyText).toBe(mail.text)
  })

  it('when one message names several recipients, then one e-mail goes to each of them', async () => {
    const to = ['td.one@alpha.test', 'td.two@alpha.test']
    const [id] = await queueMessages(app.handle.context, venue.members.administrator, [
      { to, subject: 'A ticket to decide', text: 'Please decide.' },
    ])
    for (const address of to) expect((await app.mailbox.latestTo(address)).to).toEqual(to)
    expect((await outboxRows(app.handle.context, [id!]))[0]!.state).toBe('sent')
  })
})

describe('a mail server that is down', () => {
  const clock = movableClock()
  const outage = mailOutageSuite(clock)

  it('when the mail server cannot be reached, then the invitation still commits, its message waits with the error, and it is delivered once the server is back', async () => {
    const admin = await signedIn(outage.app.url, outage.venue.emails.administrator)
    await outage.proxy.cut()
    const sent = await admin.post('/api/v1/people', invite('outage@alpha.test'))
    expect(sent.status).toBe(201)
    expect(await outage.app.handle.db.models.Invitation.count({ where: { id: sent.body.id } })).toBe(1)
    await outage.app.handle.context.outbox.idle()
    const [row] = await outage.app.handle.db.models.Outbox.findAll({ where: { causeId: sent.body.id } })
    expect(row).toMatchObject({ state: 'waiting', attempts: 1 })
    expect(row!.lastError).toMatch(/ECONNREFUSED/)
    // The first retry waits 30 s (MAIL_RETRY_FIRST_SECONDS' default) from the failed attempt.
    expect(row!.nextAttemptAt.getTime() - clock.now().getTime()).toBe(30_000)
    expect(await outage.sink.allTo('outage@alpha.test')).toEqual([])

    await outage.proxy.open()
    clock.advance(30)
    // The sweep (every 20 ms here) finds the message due: wait for its state, not for a time.
    await expect.poll(async () => (await row!.reload()).state, { timeout: 15_000, interval: 20 }).toBe('sent')
    expect(row).toMatchObject({ attempts: 2, lastError: null })
    const delivered = await outage.sink.latestTo('outage@alpha.test')
    expect(delivered.text).toMatch(/\/invitation\/[A-Za-z0-9_-]+/)
    expect(await outage.sink.allTo('outage@alpha.test')).toHaveLength(1)
  })
})

describe('a mail server that never comes back', () => {
  const clock = movableClock()
  let app: TestApp
  let venue: VenueFixture
  beforeAll(async () => {
    const closed = await Mailbox.open()
    const port = closed.port
    await closed.close() // nothing listens there any more
    app = await startTestApp({
      env: { SMTP_URL: `smtp://127.0.0.1:${port}?ignoreTLS=true`, MAIL_MAX_ATTEMPTS: '3' },
      overrides: { clock },
    })
    venue = await seedVenue(app.handle.context, 'alpha')
  })
  afterAll(() => app.stop())

  it('when every attempt fails, then the waits double and the message is given up as failed after the last attempt', async () => {
    const { context } = app.handle
    const [id] = await queueMessages(context, venue.members.administrator, [
      { to: ['lost@alpha.test'], subject: 'Never arrives', text: 'The server is gone.' },
    ])
    await context.outbox.idle()
    const row = (await outboxRows(context, [id!]))[0]!
    expect(row).toMatchObject({ state: 'waiting', attempts: 1 })
    expect(row.nextAttemptAt.getTime() - clock.now().getTime()).toBe(30_000)

    // Not due yet: a sweep leaves it alone.
    expect(await context.outbox.sweep()).toEqual({ sent: 0, retrying: 0, failed: 0 })
    clock.advance(30)
    expect(await context.outbox.sweep()).toEqual({ sent: 0, retrying: 1, failed: 0 })
    await row.reload()
    expect(row.attempts).toBe(2)
    expect(row.nextAttemptAt.getTime() - clock.now().getTime()).toBe(60_000)

    clock.advance(60)
    expect(await context.outbox.sweep()).toEqual({ sent: 0, retrying: 0, failed: 1 })
    await row.reload()
    expect(row).toMatchObject({ state: 'failed', attempts: 3, sentAt: null })
    expect(row.lastError).toMatch(/ECONNREFUSED/)

    clock.advance(24 * 60 * 60)
    expect(await context.outbox.sweep()).toEqual({ sent: 0, retrying: 0, failed: 0 })
    expect((await row.reload()).attempts).toBe(3)
  })
})

describe('two app processes sweeping one outbox', () => {
  let sink: Mailbox
  const apps: TestApp[] = []
  let venue: VenueFixture
  beforeAll(async () => {
    sink = await Mailbox.open()
    // A small batch, so the sweeps take turns claiming; a long interval, so only these sweeps run.
    const env = { SMTP_URL: sink.url, MAIL_BATCH_SIZE: '3', MAIL_SWEEP_INTERVAL_MS: '3600000' }
    apps.push(await startTestApp({ env }))
    apps.push(await startTestApp({ env, databaseUrl: apps[0]!.databaseUrl }))
    venue = await seedVenue(apps[0]!.handle.context, 'alpha')
  })
  afterAll(async () => {
    for (const app of apps) await app.stop()
    await sink.close()
  })

  it('when both sweep the same waiting messages at once, then each message is sent exactly once', async () => {
    const mails = Array.from({ length: 30 }, (_, n) => ({
      to: [`crew${n}@alpha.test`],
      subject: `Message ${n}`,
      text: `Body ${n}`,
    }))
    const ids = await queueMessages(apps[0]!.handle.context, venue.members.administrator, mails, { deliver: false })
    // Four sweepers, two in each process, each sweeping until it finds nothing due (bounded by the count).
    let largest = 0
    const sweeper = async (app: TestApp) => {
      let sent = 0
      for (let round = 0; round < mails.length; round += 1) {
        const report = await app.handle.context.outbox.sweep()
        const claimed = report.sent + report.retrying + report.failed
        largest = Math.max(largest, claimed)
        if (claimed === 0) break
        sent += report.sent
      }
      return sent
    }
    const counts = await Promise.all([...apps, ...apps].map(sweeper))
    expect(counts.reduce((a, b) => a + b, 0)).toBe(30)
    expect(counts.filter((count) => count > 0).length).toBeGreaterThan(1)
    expect(largest).toBe(3) // no look claims more than its batch
    const subjects = sink.messages.map((mail) => mail.subject).sort()
    expect(subjects).toEqual(mails.map((mail) => mail.subject).sort())
    const rows = await outboxRows(apps[0]!.handle.context, ids)
    expect(rows.every((row) => row.state === 'sent' && row.attempts === 1)).toBe(true)
  })
})
