import type { NotReadyLineset, PreRunCheck } from '../../../shared/schemas/board.js'
import type { TransactionContext } from '../../context.js'
import { notFound } from '../../http/errors.js'
import { rows } from '../brick-stock/stock-sql.js'

interface CheckRow {
  id: string
  productionId: string | null
  productionName: string | null
  byId: string | null
  byName: string | null
  at: Date
  note: string
  readyCount: number
  linesetCount: number
  notReady: NotReadyLineset[]
}

/** The venue's pre-run checks, newest first. */
export async function latestChecks(tx: TransactionContext, limit: number): Promise<PreRunCheck[]> {
  const found = await rows<CheckRow>(
    tx,
    `SELECT c.id::text, c.production_id AS "productionId", p.name AS "productionName", u.id AS "byId",
            u.name AS "byName", c.checked_at AS at, c.note, c.ready_count AS "readyCount",
            c.lineset_count AS "linesetCount", c.not_ready AS "notReady"
       FROM pre_run_checks c
       LEFT JOIN productions p ON p.id = c.production_id
       LEFT JOIN users u ON u.id = c.checked_by
      WHERE c.venue_id = $1 ORDER BY c.id DESC LIMIT $2`,
    [tx.actor.venueId, limit],
  )
  return found.map(checkFromRow)
}

export const checkFromRow = (row: CheckRow): PreRunCheck => ({
  id: row.id,
  productionId: row.productionId,
  productionName: row.productionName,
  by: row.byId ? { id: row.byId, name: row.byName ?? '' } : null,
  at: row.at.toISOString(),
  note: row.note,
  readyCount: row.readyCount,
  linesetCount: row.linesetCount,
  notReady: row.notReady,
})

/** The name of one of the venue's productions; 404 for any other id. */
export async function productionName(tx: TransactionContext, productionId: string) {
  const [production] = await rows<{ name: string }>(
    tx,
    'SELECT name FROM productions WHERE venue_id = $1 AND id = $2',
    [tx.actor.venueId, productionId],
  )
  if (!production) throw notFound('That production')
  return production.name
}
