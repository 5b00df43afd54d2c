import type { TransactionContext } from '../../context.js'
import type { LiveEvent } from '../../live/live-publisher.js'
import { recordLinesetChange } from '../linesets/lineset-history.js'

/** The ledger entries a ticket writes on its lineset, one per step. */
export type TicketEventType = Extract<
  LiveEvent['type'],
  'ticket-opened' | 'ticket-approved' | 'ticket-declined' | 'ticket-withdrawn' | 'ticket-loading' | 'ticket-loaded'
>

/** What every ticket entry carries, so its summary reads without looking anything else up. */
export interface TicketEventPayload {
  ticket: { id: string; hangRevision: number; hangTitle: string }
  changes?: { name: string; count: number }[]
  comment?: string
  loaded?: { name: string; before: number; after: number }[]
  feltBalance?: string
  note?: string
}

/** Appends a ticket step to its lineset's ledger (and the live event) in the step's own transaction. */
export function recordTicketStep(
  tx: TransactionContext,
  type: TicketEventType,
  linesetId: string,
  payload: TicketEventPayload,
) {
  return recordLinesetChange(tx, type, linesetId, payload as unknown as Record<string, unknown>)
}
