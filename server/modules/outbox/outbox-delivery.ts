import { QueryTypes } from 'sequelize'
import type { Clock } from '../../clock.js'
import type { Database } from '../../db/models.js'
import type { MailSender } from '../../mail/mail-sender.js'
import { CLAIM_SECONDS, retryDelaySeconds, type OutboxPolicy } from './outbox-policy.js'

/** What delivering needs: the database, the mail server, the clock and the policy. */
export interface DeliveryParts {
  db: Database
  mail: MailSender
  clock: Clock
  policy: OutboxPolicy
}

interface ClaimedMessage {
  id: string
  recipients: string[]
  subject: string
  text: string
  /** The attempt this claim is; the outcome is written only while the row is still at it. */
  attempts: number
}

/** What one look at the outbox did. */
export interface DeliveryReport {
  sent: number
  retrying: number
  failed: number
}

const later = (now: Date, seconds: number) => new Date(now.getTime() + seconds * 1000)

/**
 * Claims waiting messages that are due (only those in `ids` when given), at most `limit`: each gets its next
 * attempt counted and its next_attempt_at moved past the time a send can take, in one statement. Rows another
 * process holds are skipped (`FOR UPDATE SKIP LOCKED`), and a row it has claimed is no longer due, so two
 * processes never claim one message at once. The choice is a materialized CTE: a LIMIT ... SKIP LOCKED
 * subquery inside `WHERE id IN (...)` may be run more than once by the planner and claim more than the limit.
 */
async function claim(parts: DeliveryParts, limit: number, ids?: readonly string[]): Promise<ClaimedMessage[]> {
  const now = parts.clock.now()
  const only = ids ? 'AND id IN (:ids)' : ''
  return parts.db.sequelize.query<ClaimedMessage>(
    `WITH due AS MATERIALIZED (
       SELECT id FROM mail_outbox WHERE state = 'waiting' AND next_attempt_at <= :now ${only}
        ORDER BY next_attempt_at, id LIMIT :limit FOR UPDATE SKIP LOCKED)
     UPDATE mail_outbox SET attempts = attempts + 1, next_attempt_at = :claimedUntil, updated_at = :now
       FROM due WHERE mail_outbox.id = due.id AND state = 'waiting' AND next_attempt_at <= :now
      RETURNING mail_outbox.id, recipients, subject, body_text AS text, attempts`,
    { replacements: { now, claimedUntil: later(now, CLAIM_SECONDS), limit, ids: ids ?? [] }, type: QueryTypes.SELECT },
  )
}

/** Marks a claimed message sent, only while it is still at the attempt that sent it. */
async function markSent(parts: DeliveryParts, message: ClaimedMessage) {
  await parts.db.sequelize.query(
    `UPDATE mail_outbox SET state = 'sent', sent_at = :now, last_error = NULL, updated_at = :now
      WHERE id = :id AND state = 'waiting' AND attempts = :attempts`,
    { replacements: { now: parts.clock.now(), id: message.id, attempts: message.attempts } },
  )
}

/** Records why an attempt failed and when to try again, or gives the message up once its attempts are used. */
async function markFailed(parts: DeliveryParts, message: ClaimedMessage, error: unknown): Promise<boolean> {
  const now = parts.clock.now()
  const givenUp = message.attempts >= parts.policy.maxAttempts
  const reason = (error instanceof Error ? error.message : String(error)).slice(0, 1000)
  await parts.db.sequelize.query(
    `UPDATE mail_outbox SET state = :state, last_error = :reason, next_attempt_at = :next, updated_at = :now
      WHERE id = :id AND state = 'waiting' AND attempts = :attempts`,
    {
      replacements: {
        state: givenUp ? 'failed' : 'waiting',
        reason,
        next: givenUp ? now : later(now, retryDelaySeconds(parts.policy, message.attempts)),
        now,
        id: message.id,
        attempts: message.attempts,
      },
    },
  )
  return givenUp
}

async function attempt(parts: DeliveryParts, message: ClaimedMessage, report: DeliveryReport) {
  try {
    await parts.mail.send({ to: message.recipients, subject: message.subject, text: message.text })
  } catch (error) {
    if (await markFailed(parts, message, error)) report.failed += 1
    else report.retrying += 1
    return
  }
  await markSent(parts, message)
  report.sent += 1
}

/**
 * Sends what is due, at most one batch, all of the batch at once; with `ids`, only those messages (the
 * ones a change has just committed). A mail server that is down only records the error and the next try.
 */
export async function deliverDue(parts: DeliveryParts, ids?: readonly string[]): Promise<DeliveryReport> {
  const report: DeliveryReport = { sent: 0, retrying: 0, failed: 0 }
  if (ids && ids.length === 0) return report
  const claimed = await claim(parts, ids ? Math.min(ids.length, parts.policy.batchSize) : parts.policy.batchSize, ids)
  await Promise.all(claimed.map((message) => attempt(parts, message, report)))
  return report
}
