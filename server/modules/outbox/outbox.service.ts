import type { SessionUser } from '../../../shared/schemas/session.js'
import type { ServiceContext, TransactionContext } from '../../context.js'
import { AppError } from '../../http/errors.js'

/** An e-mail a change causes: to whom, what it says, and (optionally) which record caused it. */
export interface OutgoingMail {
  to: readonly string[]
  subject: string
  text: string
  /** The record the message is about, e.g. `{ kind: 'invitation', id }`. */
  cause?: { kind: string; id: string }
  /** The venue the message belongs to; the acting member's when not given. */
  venueId?: string
}

/**
 * Queues an e-mail in the transaction of the change that causes it: the message is kept exactly when the
 * change commits, and delivery starts once it has (`transaction.afterCommit`), with the sweep retrying
 * whatever that first attempt could not send. A mail outage therefore never blocks or loses the change.
 *
 * @returns the message's id in the outbox.
 */
export async function queueMail(tx: TransactionContext<SessionUser | null>, mail: OutgoingMail): Promise<string> {
  const { db, transaction, actor } = tx
  if (!transaction) throw new Error('queueMail must run in the transaction of the change that causes the mail')
  const venueId = mail.venueId ?? actor?.venueId
  if (!venueId) throw new Error('queueMail needs the venue the message belongs to')
  const recipients = [...new Set(mail.to.map((address) => address.trim().toLowerCase()))]
  if (recipients.length === 0) throw new Error('queueMail needs at least one recipient')
  const now = tx.clock.now()
  const row = await db.models.Outbox.create(
    {
      venueId,
      recipients,
      subject: mail.subject,
      bodyText: mail.text,
      nextAttemptAt: now,
      causeKind: mail.cause?.kind ?? null,
      causeId: mail.cause?.id ?? null,
      queuedBy: actor?.id ?? null,
      createdAt: now,
      updatedAt: now,
    },
    { transaction },
  )
  transaction.afterCommit(() => tx.outbox.deliverSoon([row.id]))
  return row.id
}

/**
 * For changes whose mail is the only way anyone learns of them (an invitation's link): refused with 503 on
 * a server that has no mail server at all, since such a message could never be delivered.
 */
export function requireMailServer(ctx: ServiceContext<SessionUser | null>) {
  if (!ctx.mail.configured)
    throw new AppError(
      503,
      'mail_unavailable',
      'This server has no mail server configured (SMTP_URL), so it cannot send e-mail',
    )
}
