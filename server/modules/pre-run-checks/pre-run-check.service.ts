import {
  CHANGES_SINCE_CHECK_MAX,
  type ChangeSinceCheck,
  type LatestPreRunCheck,
  type PreRunCheck,
  type PreRunCheckInput,
  type PreRunChecksQuery,
} from '../../../shared/schemas/board.js'
import { inTransaction, type ServiceContext } from '../../context.js'
import { rows } from '../brick-stock/stock-sql.js'
import { boardOperatingStatus } from '../board/board-linesets.js'
import { boardRows, venueBoardPolicy } from '../board/board-rows.js'
import { payloadInUnits } from '../linesets/lineset-event-payload.js'
import { summarizeLinesetEvent } from '../linesets/lineset-event-summary.js'
import { checkFromRow, latestChecks, productionName } from './pre-run-check-rows.js'

/**
 * Records a pre-run check: which linesets (of the production, or all) are ready now, decided on the server
 * from the current operating statuses, and which are not, as they are at this moment. A record, not a state
 * change, so two checks at once are simply two checks. Publishes a live event with the check's id.
 */
export function recordPreRunCheck(ctx: ServiceContext, body: PreRunCheckInput): Promise<PreRunCheck> {
  return inTransaction(ctx, async (tx) => {
    const productionId = body.productionId ?? null
    const production = productionId ? await productionName(tx, productionId) : null
    const policy = await venueBoardPolicy(tx)
    const linesets = (await boardRows(tx, { productionId })).map((row) => ({
      id: row.id,
      number: row.number,
      name: row.name,
      operatingStatus: boardOperatingStatus(row, policy.tolerance),
    }))
    const notReady = linesets.filter((lineset) => lineset.operatingStatus !== 'ready')
    const [written] = await rows<Parameters<typeof checkFromRow>[0]>(
      tx,
      `INSERT INTO pre_run_checks (venue_id, production_id, checked_by, checked_at, note, ready_count, lineset_count,
                                   not_ready)
       VALUES ($1, $2, $3, $4, $5, $6, $7, $8::jsonb)
       RETURNING id::text, production_id AS "productionId", NULL AS "productionName", checked_by AS "byId",
                 NULL AS "byName", checked_at AS at, note, ready_count AS "readyCount",
                 lineset_count AS "linesetCount", not_ready AS "notReady"`,
      [
        tx.actor.venueId,
        productionId,
        tx.actor.id,
        tx.clock.now(),
        body.note ?? '',
        linesets.length - notReady.length,
        linesets.length,
        JSON.stringify(notReady),
      ],
    )
    await tx.live.publish(
      { type: 'pre-run-check', venueId: tx.actor.venueId, linesetId: null, eventId: written!.id },
      tx.transaction,
    )
    return checkFromRow({ ...written!, productionName: production, byName: tx.actor.name })
  })
}

/** The venue's pre-run checks, newest first. */
export function listPreRunChecks(ctx: ServiceContext, query: PreRunChecksQuery): Promise<PreRunCheck[]> {
  return inTransaction(ctx, (tx) => latestChecks(tx, query.limit))
}

interface ChangeRow {
  id: string
  type: string
  at: Date
  linesetId: string
  linesetNumber: number
  linesetName: string
  actorId: string | null
  actorName: string | null
  payload: Record<string, unknown>
}

/**
 * The last pre-run check and every ledger entry written after it (one sequence numbers both, so "after" is
 * "a greater id"), newest first, at most `CHANGES_SINCE_CHECK_MAX`; without any check, no changes.
 */
export function latestPreRunCheck(ctx: ServiceContext): Promise<LatestPreRunCheck> {
  return inTransaction(ctx, async (tx) => {
    const [check] = await latestChecks(tx, 1)
    if (!check) return { check: null, changesSince: [], moreChanges: false }
    const { unitSystem } = await venueBoardPolicy(tx)
    const found = await rows<ChangeRow>(
      tx,
      `SELECT e.id::text, e.event_type AS type, e.occurred_at AS at, l.id AS "linesetId", l.number AS "linesetNumber",
              l.name AS "linesetName", u.id AS "actorId", u.name AS "actorName", e.payload
         FROM lineset_events e
         JOIN linesets l ON l.id = e.lineset_id
         LEFT JOIN users u ON u.id = e.actor_id
        WHERE e.venue_id = $1 AND e.id > $2::bigint
        ORDER BY e.id DESC LIMIT $3`,
      [tx.actor.venueId, check.id, CHANGES_SINCE_CHECK_MAX + 1],
    )
    const changesSince: ChangeSinceCheck[] = found.slice(0, CHANGES_SINCE_CHECK_MAX).map((row) => ({
      id: row.id,
      type: row.type,
      at: row.at.toISOString(),
      linesetId: row.linesetId,
      linesetNumber: row.linesetNumber,
      linesetName: row.linesetName,
      actor: row.actorId ? { id: row.actorId, name: row.actorName ?? '' } : null,
      summary: summarizeLinesetEvent(row.type, payloadInUnits(row.payload, unitSystem), unitSystem),
    }))
    return { check, changesSince, moreChanges: found.length > CHANGES_SINCE_CHECK_MAX }
  })
}
