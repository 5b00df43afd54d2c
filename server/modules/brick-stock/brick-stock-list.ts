import type { BrickStockLine } from '../../../shared/schemas/arbor.js'
import { inTransaction, type ServiceContext } from '../../context.js'
import { rows } from './stock-sql.js'

/**
 * Every brick type of the venue by where its bricks are, and by lineset where they sit on arbors. A retired
 * type is listed while any of its bricks are still on an arbor or reserved.
 */
export function listBrickStock(ctx: ServiceContext): Promise<BrickStockLine[]> {
  return inTransaction(ctx, async (tx) => {
    const venue = [tx.actor.venueId]
    const types = await rows<Omit<BrickStockLine, 'byLineset'> & { retired: boolean }>(
      tx,
      `SELECT id AS "brickTypeId", name, quantity_owned AS owned, on_arbors AS "onArbors", reserved,
              in_storage AS "inStorage", retired_at IS NOT NULL AS retired
         FROM brick_types WHERE venue_id = $1 AND (retired_at IS NULL OR on_arbors + reserved > 0)
        ORDER BY name, id`,
      venue,
    )
    const placed = await rows<{ brickTypeId: string; linesetId: string; number: number; name: string; count: number }>(
      tx,
      `SELECT a.brick_type_id AS "brickTypeId", a.lineset_id AS "linesetId", l.number, l.name, a.count
         FROM arbor_bricks a JOIN linesets l ON l.id = a.lineset_id
        WHERE a.venue_id = $1 AND a.count > 0 ORDER BY l.number, l.id`,
      venue,
    )
    return types.map((type) => ({
      ...type,
      byLineset: placed
        .filter((row) => row.brickTypeId === type.brickTypeId)
        .map(({ brickTypeId: _type, ...lineset }) => lineset),
    }))
  })
}
