import type { SessionUser } from '../../shared/schemas/session.js'
import type { AppContext } from '../../server/context.js'
import { queueMail, type OutgoingMail } from '../../server/modules/outbox/outbox.service.js'

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
