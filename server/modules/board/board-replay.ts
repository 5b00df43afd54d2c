import { QueryTypes } from 'sequelize'
import type { LiveEvent } from '../../live/live-publisher.js'
import type { ServiceContext } from '../../context.js'
import { inTransaction } from '../../context.js'
import { rows } from '../brick-stock/stock-sql.js'

/** The most missed events a reconnecting board is sent one by one; beyond it, it reads the whole board again. */
export const REPLAY_MAX = 500

/** Where a board stands: the newest id it was sent and its horizon (see `LiveEvent.horizon`), or no horizon. */
export interface StreamPosition {
  id: string
  horizon: string | null
}

// A row's inserting transaction (its `xmin`, 32 bits) is at or after the horizon (64 bits), compared on the
// 32-bit circle as PostgreSQL compares transaction numbers: right for any row younger than 2^31 transactions.
// Older rows can only be taken for newer, which sends a board a change twice, never misses one.
const AT_OR_AFTER_HORIZON = `($4::bigint IS NOT NULL
  AND (xmin::text::bigint - $4::bigint % 4294967296 + 4294967296) % 4294967296 < 2147483648)`

/**
 * What the venue's boards were sent after `from`: its ledger entries and pre-run checks (one sequence numbers
 * both), oldest first; `tooMany` when more than `REPLAY_MAX` were missed. Besides every greater id, it takes
 * every entry written by a transaction at or after the horizon: one that committed after the board's last
 * event despite a smaller id. A board may hear such an entry twice; it reads that lineset again, no harm done.
 */
export function missedEvents(ctx: ServiceContext, from: StreamPosition) {
  return inTransaction(ctx, async (tx) => {
    const found = await rows<{ eventId: string; type: LiveEvent['type']; linesetId: string | null }>(
      tx,
      `(SELECT id AS sort, id::text AS "eventId", event_type AS type, lineset_id AS "linesetId"
          FROM lineset_events WHERE venue_id = $1 AND (id > $2::bigint OR ${AT_OR_AFTER_HORIZON})
         ORDER BY sort LIMIT $3)
       UNION ALL
       (SELECT id AS sort, id::text AS "eventId", 'pre-run-check' AS type, NULL::uuid AS "linesetId"
          FROM pre_run_checks WHERE venue_id = $1 AND (id > $2::bigint OR ${AT_OR_AFTER_HORIZON})
         ORDER BY sort LIMIT $3)
       ORDER BY sort LIMIT $3`,
      [tx.actor.venueId, from.id, REPLAY_MAX + 1, from.horizon],
    )
    return { events: found.slice(0, REPLAY_MAX), tooMany: found.length > REPLAY_MAX }
  })
}

/** The oldest transaction running now: taken before a stream listens, it covers whatever commits after. */
export async function currentHorizon(ctx: ServiceContext) {
  const [now] = await ctx.db.sequelize.query<{ horizon: string }>(
    'SELECT pg_snapshot_xmin(pg_current_snapshot())::text AS horizon',
    { type: QueryTypes.SELECT },
  )
  return now!.horizon
}

/**
 * The newest id the venue's boards could have been sent (where a fresh stream starts counting), and the
 * horizon of the same moment: whatever commits after it is at or after that horizon.
 */
export function newestEventId(ctx: ServiceContext) {
  return inTransaction(ctx, async (tx) => {
    const [newest] = await rows<{ id: string | null; horizon: string }>(
      tx,
      `SELECT greatest((SELECT max(id) FROM lineset_events WHERE venue_id = $1),
                       (SELECT max(id) FROM pre_run_checks WHERE venue_id = $1))::text AS id,
              pg_snapshot_xmin(pg_current_snapshot())::text AS horizon`,
      [tx.actor.venueId],
    )
    return { id: newest?.id ?? null, horizon: newest!.horizon }
  })
}
