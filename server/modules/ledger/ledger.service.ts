import type { SessionUser } from '../../../shared/schemas/session.js'
import type { TransactionContext } from '../../context.js'

export interface LedgerEntry {
  venueId: string
  linesetId: string
  actorId: string | null
  eventType: string
  /** Quantities as SI decimal strings, like every table. */
  payload?: Record<string, unknown>
}

/**
 * Appends to a lineset's ledger inside the caller's transaction, so the change and its record land together.
 * Answers the entry's id.
 */
export async function appendLinesetEvent(tx: TransactionContext<SessionUser | null>, entry: LedgerEntry) {
  const row = await tx.db.models.LinesetEvent.create(
    { ...entry, occurredAt: tx.clock.now(), payload: entry.payload ?? {} },
    { transaction: tx.transaction },
  )
  return String(row.id)
}
