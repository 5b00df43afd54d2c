import type { FeltBalance } from '../../../shared/schemas/operating-status.js'
import { inTransaction, type ServiceContext, type TransactionContext } from '../../context.js'
import { AppError, notFound } from '../../http/errors.js'
import { unknownBrickType, type BrickMove } from './stock-errors.js'
import { lockBrickTypes, moveOnArbor, shiftReservation } from './stock-moves.js'
import { rows } from './stock-sql.js'

export type { BrickMove } from './stock-errors.js'

/**
 * Locks the brick types of `moves` (in id order) and refuses, by field, any the venue does not have, or has
 * retired where bricks would be added. Moves come back in id order too, so later writes keep the lock order.
 */
async function lockedMoves(tx: TransactionContext, moves: readonly BrickMove[]) {
  const locked = await lockBrickTypes(
    tx,
    moves.map((move) => move.brickTypeId),
  )
  for (const move of moves) {
    const type = locked.get(move.brickTypeId)
    if (!type) throw unknownBrickType(move)
    if (type.retired && move.count > 0) throw unknownBrickType(move, true)
  }
  const ordered = [...moves].sort((a, b) =>
    a.brickTypeId < b.brickTypeId ? -1 : a.brickTypeId > b.brickTypeId ? 1 : 0,
  )
  return { locked, ordered }
}

function refuseNegative(moves: readonly BrickMove[]) {
  const negative = moves.find((move) => move.count < 0 || !Number.isInteger(move.count))
  if (negative)
    throw new AppError(400, 'validation_failed', 'Counts to reserve are whole numbers, not below zero', {
      [negative.field ?? negative.brickTypeId]: 'A whole number, not below zero',
    })
}

/**
 * Holds bricks for a change about to be loaded: each count moves from storage to reserved, or the whole call
 * is refused with 409 naming the type and how many are missing. Runs in the caller's transaction when there is one.
 */
export function reserveBricks(ctx: ServiceContext, moves: readonly BrickMove[]): Promise<void> {
  refuseNegative(moves)
  return inTransaction(ctx, async (tx) => {
    const { locked, ordered } = await lockedMoves(tx, moves)
    for (const move of ordered) if (move.count > 0) await shiftReservation(tx, move, locked.get(move.brickTypeId)!)
  })
}

/** Gives reserved bricks back to storage (a change declined, withdrawn or loaded). */
export function releaseReservation(ctx: ServiceContext, moves: readonly BrickMove[]): Promise<void> {
  refuseNegative(moves)
  return inTransaction(ctx, async (tx) => {
    const { locked, ordered } = await lockedMoves(
      tx,
      moves.map((move) => ({ ...move, count: -move.count })),
    )
    for (const move of ordered)
      if (move.count < 0)
        await shiftReservation(tx, { ...move, count: -move.count }, locked.get(move.brickTypeId)!, true)
  })
}

/**
 * Signed moves between storage and one counterweight lineset's arbor (+ on, − off), refused with 409 when
 * storage or the arbor does not hold enough. The caller answers for the lineset (its venue, its kind, its
 * version) and for the ledger.
 */
export function moveArborBricks(ctx: ServiceContext, linesetId: string, moves: readonly BrickMove[]): Promise<void> {
  return inTransaction(ctx, async (tx) => {
    const { locked, ordered } = await lockedMoves(tx, moves)
    await moveOnArbor(tx, linesetId, ordered, locked)
  })
}

/**
 * What completing a change does to the stock, in one go: the change's reservation goes back to storage,
 * the bricks actually loaded (signed, per type; they may differ from the plan) move between storage and
 * the arbor, and the lineset keeps the balance felt at the rail and a new arbor version.
 */
export function loadBricks(
  ctx: ServiceContext,
  linesetId: string,
  change: { reserved: readonly BrickMove[]; loaded: readonly BrickMove[]; feltBalance: FeltBalance },
): Promise<void> {
  return inTransaction(ctx, async (tx) => {
    const [lineset] = await rows(
      tx,
      `UPDATE linesets SET arbor_version = arbor_version + 1, arbor_felt_balance = $3
        WHERE id = $1 AND venue_id = $2 AND retired_at IS NULL AND kind LIKE 'counterweight-%' RETURNING id`,
      [linesetId, tx.actor.venueId, change.feltBalance],
    )
    if (!lineset) throw notFound('That counterweight lineset')
    // Every type either half touches, locked at once in id order, so two completions cannot deadlock.
    await lockBrickTypes(
      tx,
      [...change.reserved, ...change.loaded].map((move) => move.brickTypeId),
    )
    await releaseReservation(tx, change.reserved)
    await moveArborBricks(tx, linesetId, change.loaded)
  })
}
