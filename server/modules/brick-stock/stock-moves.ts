import type { TransactionContext } from '../../context.js'
import { shortOf, type BrickMove } from './stock-errors.js'
import { lockBrickTypes, rows, type LockedBrickType } from './stock-sql.js'

// Every write below is conditional on the count it takes from (… WHERE in_storage >= n), so no count can go
// below zero however many moves run at once; the database's CHECKs and its deferred on-arbors trigger stand
// behind the code. Callers lock the brick types first (lockBrickTypes), in id order.

async function heldInStorage(tx: TransactionContext, id: string) {
  const [row] = await rows<{ n: number }>(tx, 'SELECT in_storage AS n FROM brick_types WHERE id = $1', [id])
  return row?.n ?? 0
}

/** Moves `count` bricks of one type from storage to reserved (or back, with `back`). */
export async function shiftReservation(tx: TransactionContext, move: BrickMove, type: LockedBrickType, back = false) {
  const [from, to] = back ? ['reserved', 'in_storage'] : ['in_storage', 'reserved']
  const moved = await rows(
    tx,
    `UPDATE brick_types SET ${from} = ${from} - $2, ${to} = ${to} + $2 WHERE id = $1 AND ${from} >= $2 RETURNING id`,
    [move.brickTypeId, move.count],
  )
  if (moved.length) return
  const [row] = await rows<{ n: number }>(tx, `SELECT ${from} AS n FROM brick_types WHERE id = $1`, [move.brickTypeId])
  throw shortOf(move, type.name, back ? 'reserved' : 'in storage', row?.n ?? 0)
}

/** Puts `count` bricks of one type from storage onto a lineset's arbor. */
async function ontoArbor(tx: TransactionContext, linesetId: string, move: BrickMove, type: LockedBrickType) {
  const taken = await rows(
    tx,
    `UPDATE brick_types SET in_storage = in_storage - $2, on_arbors = on_arbors + $2
      WHERE id = $1 AND in_storage >= $2 RETURNING id`,
    [move.brickTypeId, move.count],
  )
  if (!taken.length) throw shortOf(move, type.name, 'in storage', await heldInStorage(tx, move.brickTypeId))
  await rows(
    tx,
    `INSERT INTO arbor_bricks (venue_id, lineset_id, brick_type_id, count) VALUES ($1, $2, $3, $4)
       ON CONFLICT (lineset_id, brick_type_id) DO UPDATE SET count = arbor_bricks.count + EXCLUDED.count
       RETURNING count`,
    [tx.actor.venueId, linesetId, move.brickTypeId, move.count],
  )
}

/** Takes `count` bricks of one type off a lineset's arbor back into storage. */
async function offArbor(tx: TransactionContext, linesetId: string, move: BrickMove, type: LockedBrickType) {
  const off = await rows(
    tx,
    `UPDATE arbor_bricks SET count = count - $3
      WHERE venue_id = $1 AND lineset_id = $2 AND brick_type_id = $4 AND count >= $3 RETURNING count`,
    [tx.actor.venueId, linesetId, move.count, move.brickTypeId],
  )
  if (!off.length) {
    const [row] = await rows<{ n: number }>(
      tx,
      'SELECT count AS n FROM arbor_bricks WHERE lineset_id = $1 AND brick_type_id = $2',
      [linesetId, move.brickTypeId],
    )
    throw shortOf(move, type.name, 'on the arbor', row?.n ?? 0)
  }
  await rows(
    tx,
    `UPDATE brick_types SET on_arbors = on_arbors - $2, in_storage = in_storage + $2 WHERE id = $1 RETURNING id`,
    [move.brickTypeId, move.count],
  )
  await rows(
    tx,
    'DELETE FROM arbor_bricks WHERE lineset_id = $1 AND brick_type_id = $2 AND count = 0 RETURNING count',
    [linesetId, move.brickTypeId],
  )
}

/** Signed moves between storage and one arbor: a positive count goes on, a negative one comes off. */
export async function moveOnArbor(
  tx: TransactionContext,
  linesetId: string,
  moves: readonly BrickMove[],
  locked: Map<string, LockedBrickType>,
) {
  for (const move of moves) {
    if (move.count === 0) continue
    const type = locked.get(move.brickTypeId)!
    if (move.count > 0) await ontoArbor(tx, linesetId, move, type)
    else await offArbor(tx, linesetId, { ...move, count: -move.count }, type)
  }
}

export { lockBrickTypes }
