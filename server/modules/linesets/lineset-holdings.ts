import { isCounterweightKind, type LinesetKind } from '../../../shared/schemas/lineset.js'
import type { TransactionContext } from '../../context.js'
import { AppError } from '../../http/errors.js'
import { rows } from '../brick-stock/stock-sql.js'

interface Holdings {
  number: number
  bricks: number
  openTickets: number
}

/**
 * Locks the lineset's row (as ticket moves and arbor counts do, so none of them can add bricks or open a
 * ticket meanwhile) and reads what it holds: bricks on its arbor and tickets still open.
 */
async function lockedHoldings(tx: TransactionContext, id: string): Promise<Holdings | undefined> {
  const [locked] = await rows<{ number: number }>(
    tx,
    `SELECT number FROM linesets WHERE id = $1 AND venue_id = $2 AND retired_at IS NULL FOR UPDATE`,
    [id, tx.actor.venueId],
  )
  if (!locked) return undefined
  const [held] = await rows<{ bricks: string; openTickets: string }>(
    tx,
    `SELECT (SELECT coalesce(sum(count), 0) FROM arbor_bricks WHERE lineset_id = $1) AS bricks,
            (SELECT count(*) FROM weight_change_tickets
              WHERE lineset_id = $1 AND state IN ('requested', 'approved', 'loading')) AS "openTickets"`,
    [id],
  )
  return { number: locked.number, bricks: Number(held!.bricks), openTickets: Number(held!.openTickets) }
}

/**
 * Bricks on an arbor are counted in the venue's stock under that lineset, and an open ticket may hold a
 * reservation: a lineset that still has either cannot leave the lists, or stop being a counterweight set,
 * without leaving bricks nobody can find. `becoming` is the kind a change would give it (absent: retiring).
 */
export async function refuseWhileHolding(tx: TransactionContext, id: string, becoming?: LinesetKind) {
  if (becoming && isCounterweightKind(becoming)) return
  const held = await lockedHoldings(tx, id)
  if (!held) return // gone or another venue's: the caller answers 404
  const doing = becoming ? 'stop being a counterweight set' : 'be retired'
  if (held.openTickets > 0)
    throw new AppError(
      409,
      'open_ticket',
      `Lineset ${held.number} has a change ticket still open: finish or withdraw it before it can ${doing}`,
    )
  if (held.bricks > 0)
    throw new AppError(
      409,
      'arbor_not_empty',
      `Lineset ${held.number} still has ${held.bricks} bricks on its arbor: unload them and record the count before it can ${doing}`,
    )
}
