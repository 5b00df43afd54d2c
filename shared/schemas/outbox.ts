import { z } from 'zod'

/**
 * Where an outgoing e-mail stands: `waiting` until the mail server has taken it (it may have been tried and
 * be waiting for its next attempt), `sent` once taken, `failed` once every attempt was used.
 */
export const OUTBOX_STATES = ['waiting', 'sent', 'failed'] as const
export type OutboxState = (typeof OUTBOX_STATES)[number]

/** Each state in plain words, as the outbox page shows it. */
export const OUTBOX_STATE_LABELS: Readonly<Record<OutboxState, string>> = {
  waiting: 'Waiting to be sent',
  sent: 'Sent',
  failed: 'Not delivered, gave up',
}

// Kept with the other role lists (role.ts has no zod, so the client's shell can read it without loading zod).
export { OUTBOX_READERS } from './role.js'

/** The most messages one page of the outbox holds. */
export const OUTBOX_PAGE_MAX = 100

/** `GET /api/v1/outbox?limit=&before=`: newest first; `before` is the id of the last message of a page. */
export const outboxQuerySchema = z.object({
  limit: z.coerce
    .number({ error: 'Limit must be a number' })
    .int('Limit must be a whole number')
    .min(1, 'Limit must be 1 or more')
    .max(OUTBOX_PAGE_MAX, `Limit must be ${OUTBOX_PAGE_MAX} or less`)
    .default(50),
  before: z.uuid('Before must be the id of a message in the outbox').optional(),
})
export type OutboxQuery = z.infer<typeof outboxQuerySchema>

/** One outgoing e-mail as the outbox list shows it. */
export interface OutboxMessageSummary {
  id: string
  to: string[]
  subject: string
  createdAt: string
  state: OutboxState
  /** How many times sending was tried. */
  attempts: number
  /** Why the latest attempt failed; null once sent or before any attempt failed. */
  lastError: string | null
  sentAt: string | null
}

/** One outgoing e-mail with its text and when it is tried next. */
export interface OutboxMessage extends OutboxMessageSummary {
  text: string
  /** When a waiting message is tried next; null once sent or given up. */
  nextAttemptAt: string | null
}
