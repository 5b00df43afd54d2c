import type { OutboxMessage, OutboxMessageSummary } from '../../../shared/schemas/outbox.js'
import type { OutboxModel } from './outbox.model.js'

export const outboxSummaryToApi = (row: OutboxModel): OutboxMessageSummary => ({
  id: row.id,
  to: row.recipients,
  subject: row.subject,
  createdAt: row.createdAt.toISOString(),
  state: row.state,
  attempts: row.attempts,
  lastError: row.lastError,
  sentAt: row.sentAt?.toISOString() ?? null,
})

export const outboxMessageToApi = (row: OutboxModel): OutboxMessage => ({
  ...outboxSummaryToApi(row),
  text: row.bodyText,
  nextAttemptAt: row.state === 'waiting' ? row.nextAttemptAt.toISOString() : null,
})
