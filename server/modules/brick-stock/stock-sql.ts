import { QueryTypes } from 'sequelize'
import type { TransactionContext } from '../../context.js'

/** Runs one statement in the caller's transaction and answers its rows (RETURNING included). */
export function rows<T extends object>(tx: TransactionContext, sql: string, bind: unknown[]): Promise<T[]> {
  return tx.db.sequelize.query<T>(sql, { bind, type: QueryTypes.SELECT, transaction: tx.transaction })
}

/** A brick type's place in the stock, as locked for a move. */
export interface LockedBrickType {
  id: string
  name: string
  retired: boolean
  onArbors: number
  reserved: number
  inStorage: number
}

/**
 * Locks the venue's brick types a move touches, always in id order, so two moves over the same types wait
 * for each other instead of deadlocking; every later write in the transaction finds them already held.
 */
export async function lockBrickTypes(tx: TransactionContext, ids: readonly string[]) {
  const locked = await rows<LockedBrickType>(
    tx,
    `SELECT id, name, retired_at IS NOT NULL AS retired, on_arbors AS "onArbors", reserved, in_storage AS "inStorage"
       FROM brick_types WHERE venue_id = $1 AND id = ANY($2::uuid[]) ORDER BY id FOR UPDATE`,
    [tx.actor.venueId, [...new Set(ids)]],
  )
  return new Map(locked.map((row) => [row.id, row]))
}
