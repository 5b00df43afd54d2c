import type { LiveEvent } from '../../live/live-publisher.js'
import type { ServiceContext } from '../../context.js'
import { inTransaction } from '../../context.js'
import { rows } from '../brick-stock/stock-sql.js'

/** The most missed events a reconnecting board is sent one by one; beyond it, it reads the whole board again. */
export const REPLAY_MAX = 500

/**
 * What the venue's boards were sent after `afterId`: its ledger entries and pre-run checks (one sequence
 * numbers both), oldest first; `tooMany` when more than `REPLAY_MAX` were missed.
 */
export function missedEvents(ctx: ServiceContext, afterId: string) {
  return inTransaction(ctx, async (tx) => {
    const found = await rows<{ eventId: string; type: LiveEvent['type']; linesetId: string | null }>(
      tx,
      `(SELECT id AS sort, id::text AS "eventId", event_type AS type, lineset_id AS "linesetId"
          FROM lineset_events WHERE venue_id = $1 AND id > $2::bigint ORDER BY sort LIMIT $3)
       UNION ALL
       (SELECT id AS sort, id::text AS "eventId", 'pre-run-check' AS type, NULL::uuid AS "linesetId"
          FROM pre_run_checks WHERE venue_id = $1 AND id > $2::bigint ORDER BY sort LIMIT $3)
       ORDER BY sort LIMIT $3`,
      [tx.actor.venueId, afterId, REPLAY_MAX + 1],
    )
    return { events: found.slice(0, REPLAY_MAX), tooMany: found.length > REPLAY_MAX }
  })
}

/** The newest id the venue's boards could have been sent: where a fresh stream starts counting. */
export function newestEventId(ctx: ServiceContext) {
  return inTransaction(ctx, async (tx) => {
    const [newest] = await rows<{ id: string | null }>(
      tx,
      `SELECT greatest((SELECT max(id) FROM lineset_events WHERE venue_id = $1),
                       (SELECT max(id) FROM pre_run_checks WHERE venue_id = $1))::text AS id`,
      [tx.actor.venueId],
    )
    return newest?.id ?? null
  })
}
