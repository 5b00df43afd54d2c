import type { TransactionContext } from '../../context.js'
import { rows } from '../brick-stock/stock-sql.js'

/** One row of a ticket's bricks, with the type's name. */
export interface TicketBrick {
  brickTypeId: string
  name: string
  planned: number
  reserved: number
  arborAfter: number | null
}

/** A ticket's bricks per type, in brick-type id order (the order stock moves lock in). */
export function ticketBricks(tx: TransactionContext, ticketId: string) {
  return rows<TicketBrick>(
    tx,
    `SELECT tb.brick_type_id AS "brickTypeId", b.name, tb.planned, tb.reserved, tb.arbor_after AS "arborAfter"
       FROM ticket_bricks tb JOIN brick_types b ON b.id = tb.brick_type_id
      WHERE tb.ticket_id = $1 ORDER BY tb.brick_type_id`,
    [ticketId],
  )
}

/** The signed changes of a plan, by name, for mail and the ledger. */
export const changesOf = (bricks: readonly TicketBrick[]) =>
  bricks.filter((brick) => brick.planned !== 0).map((brick) => ({ name: brick.name, count: brick.planned }))

/** Sets how many of each type the ticket holds in reserve (0 clears them all). */
export async function markReserved(tx: TransactionContext, ticketId: string, held: boolean) {
  await rows(
    tx,
    `UPDATE ticket_bricks SET reserved = CASE WHEN $2 AND planned > 0 THEN planned ELSE 0 END
      WHERE ticket_id = $1 RETURNING ticket_id`,
    [ticketId, held],
  )
}
