import { afterAll, beforeAll } from 'vitest'
import type { SessionUser } from '../../shared/schemas/session.js'
import type { Clock } from '../../server/clock.js'
import type { AppContext } from '../../server/context.js'
import { queueMail, type OutgoingMail } from '../../server/modules/outbox/outbox.service.js'
import { seedVenue, type VenueFixture } from './fixtures.js'
import { Mailbox } from './mailbox.js'
import { TcpProxy } from './tcp-proxy.js'
import { startTestApp, type TestApp } from './test-app.js'

/** A clock a test moves forward by hand (no timers involved). */
export function movableClock(start = new Date('2031-03-14T18:00:00.000Z')) {
  let now = start.getTime()
  return {
    now: () => new Date(now),
    advance(seconds: number) {
      now += seconds * 1000
    },
  }
}

/**
 * Queues messages through the service in one committed transaction, as `actor`; with `deliver: false` the
 * after-commit delivery is left out, so only a sweep sends them.
 */
export async function queueMessages(
  app: AppContext,
  actor: SessionUser,
  mails: OutgoingMail[],
  { deliver = true } = {},
): Promise<string[]> {
  const outbox = deliver ? app.outbox : { ...app.outbox, deliverSoon: () => {} }
  return app.db.sequelize.transaction(async (transaction) => {
    const tx = { ...app, outbox, actor, transaction }
    const ids: string[] = []
    for (const mail of mails) ids.push(await queueMail(tx, mail))
    return ids
  })
}

/** The outbox rows, as stored, by id. */
export async function outboxRows(app: AppContext, ids: readonly string[]) {
  const rows = await app.db.models.Outbox.findAll({ where: { id: [...ids] } })
  return ids.map((id) => rows.find((row) => row.id === id)!)
}

/** The real server whose mail server the test can take down and bring back, and one venue on it. */
export interface MailOutageSuite {
  app: TestApp
  venue: VenueFixture
  /** What reached the mail server. */
  sink: Mailbox
  /** The road to the mail server: `cut()` takes it down, `open()` brings it back on the same port. */
  proxy: TcpProxy
}

/**
 * For a describe block about mail while the mail server is down: the real server sending through a proxy to a
 * sink of its own, sweeping the outbox every 20 ms on `clock`, and venue alpha seeded. Read the fields inside
 * tests (they exist after beforeAll).
 */
export function mailOutageSuite(clock: Clock) {
  const suite = {} as MailOutageSuite
  beforeAll(async () => {
    suite.sink = await Mailbox.open()
    suite.proxy = new TcpProxy('127.0.0.1', suite.sink.port)
    await suite.proxy.open()
    suite.app = await startTestApp({
      env: { SMTP_URL: `smtp://127.0.0.1:${suite.proxy.port}?ignoreTLS=true`, MAIL_SWEEP_INTERVAL_MS: '20' },
      overrides: { clock },
    })
    suite.sink.settle = () => suite.app.handle.context.outbox.idle()
    suite.venue = await seedVenue(suite.app.handle.context, 'alpha')
  })
  afterAll(async () => {
    await suite.app.stop()
    await suite.proxy.cut()
    await suite.sink.close()
  })
  return suite
}
