import type { Transaction } from 'sequelize'
import type { Database } from '../../db/models.js'

export interface LedgerEntry {
  venueId: string
  linesetId: string
  actorId: string | null
  eventType: string
  payload?: Record<string, unknown>
}

/** Appends to a lineset's ledger inside the caller's transaction, so the change and its record land together. */
export async function appendLinesetEvent(db: Database, entry: LedgerEntry, transaction: Transaction) {
  await db.models.LinesetEvent.create({ ...entry, payload: entry.payload ?? {} }, { transaction })
}
