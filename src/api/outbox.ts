import type { OutboxMessage, OutboxMessageSummary, OutboxQuery } from '../../shared/schemas/index.js'
import { api } from './client'

export const outboxApi = {
  /** The venue's outgoing mail, newest first; `before` continues after that message (administrators only). */
  list: (query: Partial<OutboxQuery> = {}) =>
    api.get<OutboxMessageSummary[]>('/outbox', { params: query }).then((r) => r.data),
  /** One message with its text. */
  get: (id: string) => api.get<OutboxMessage>(`/outbox/${encodeURIComponent(id)}`).then((r) => r.data),
}
