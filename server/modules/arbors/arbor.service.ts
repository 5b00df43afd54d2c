import type { ArborContents, ArborCount } from '../../../shared/schemas/arbor.js'
import { inTransaction, type ServiceContext, type TransactionContext } from '../../context.js'
import { staleVersion } from '../../http/errors.js'
import { moveArborBricks, type BrickMove } from '../brick-stock/brick-stock.service.js'
import { rows } from '../brick-stock/stock-sql.js'
import { recordLinesetChange } from '../linesets/lineset-history.js'
import { arborLineset } from './arbor-lineset.js'

type ArborBrick = ArborContents['bricks'][number]

/** Every brick type in use (none of it aboard reads 0), and any retired type still aboard, by name. */
function arborBricks(tx: TransactionContext, linesetId: string) {
  return rows<ArborBrick>(
    tx,
    `SELECT b.id AS "brickTypeId", b.name, coalesce(a.count, 0) AS count
       FROM brick_types b LEFT JOIN arbor_bricks a ON a.brick_type_id = b.id AND a.lineset_id = $2
      WHERE b.venue_id = $1 AND (b.retired_at IS NULL OR a.count > 0)
      ORDER BY b.name, b.id`,
    [tx.actor.venueId, linesetId],
  )
}

/** What a counterweight lineset's arbor holds now, per brick type, and the arbor's version. */
export function getArbor(ctx: ServiceContext, linesetId: string): Promise<ArborContents> {
  return inTransaction(ctx, async (tx) => {
    const lineset = await arborLineset(tx, linesetId)
    return { linesetId, bricks: await arborBricks(tx, linesetId), version: lineset.arborVersion }
  })
}

/**
 * Records a count taken at the rail: each type's difference moves between storage and this arbor (a type
 * left out holds none), conditional on the arbor version it was read at (409 when stale) and on storage
 * holding enough (409 naming the type and how many are missing). The ledger keeps what changed; a felt
 * balance from before no longer stands once the arbor has been counted.
 */
export function countArbor(ctx: ServiceContext, linesetId: string, body: ArborCount): Promise<ArborContents> {
  return inTransaction(ctx, async (tx) => {
    const lineset = await arborLineset(tx, linesetId, true)
    if (lineset.arborVersion !== body.version) throw staleVersion(`The arbor of lineset ${lineset.number}`)
    const before = await arborBricks(tx, linesetId)
    const counted = new Map(body.bricks.map((brick, index) => [brick.brickTypeId, { ...brick, index }]))
    const moves: BrickMove[] = body.bricks.map((brick, index) => ({
      brickTypeId: brick.brickTypeId,
      count: brick.count - (before.find((held) => held.brickTypeId === brick.brickTypeId)?.count ?? 0),
      field: `bricks.${index}.count`,
    }))
    for (const held of before)
      if (!counted.has(held.brickTypeId) && held.count > 0)
        moves.push({ brickTypeId: held.brickTypeId, count: -held.count })
    await moveArborBricks(tx, linesetId, moves)
    await rows(
      tx,
      `UPDATE linesets SET arbor_version = arbor_version + 1, arbor_felt_balance = NULL
        WHERE id = $1 AND arbor_version = $2 RETURNING id`,
      [linesetId, body.version],
    )
    const after = await arborBricks(tx, linesetId)
    const changed = after
      .map((brick) => ({ ...brick, before: before.find((held) => held.brickTypeId === brick.brickTypeId)?.count ?? 0 }))
      .filter((brick) => brick.before !== brick.count)
      .map(({ brickTypeId, name, before: was, count }) => ({ brickTypeId, name, before: was, after: count }))
    await recordLinesetChange(tx, 'arbor-counted', linesetId, { bricks: changed, note: body.note ?? '' })
    return { linesetId, bricks: after, version: body.version + 1 }
  })
}
