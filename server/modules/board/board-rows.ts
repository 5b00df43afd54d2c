import type { LinesetKind, LinesetStatus } from '../../../shared/schemas/lineset.js'
import type { FeltBalance } from '../../../shared/schemas/operating-status.js'
import type { TicketState } from '../../../shared/schemas/workflow-states.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import { QueryTypes } from 'sequelize'
import type { ServiceContext } from '../../context.js'
import { stopCountSql } from '../hangs/hang-stops.js'

// Reads that need no transaction of their own: in the caller's when there is one, else each on its own.
const rows = <T extends object>(ctx: ServiceContext, sql: string, bind: unknown[]) =>
  ctx.db.sequelize.query<T>(sql, { bind, type: QueryTypes.SELECT, transaction: ctx.transaction })

/** One lineset with everything the board shows and its operating status is decided from, in SI. */
export interface BoardRow {
  id: string
  number: number
  name: string
  kind: LinesetKind
  status: LinesetStatus
  feltBalance: FeltBalance | null
  /** Frame + pipe weight aboard + counted bricks, kg, as exact decimal text; null without an arbor. */
  arborSide: string | null
  lockoutReason: string | null
  lockedOutAt: Date | null
  lockedOutBy: string | null
  lockedOutByName: string | null
  openTicket: TicketState | null
  hangId: string | null
  hangTitle: string | null
  hangRevision: number | null
  /** kg, as a plain number (display only). */
  hangTotalLoad: number | null
  /** kg, as exact decimal text (for the lineset list's figures, rounded as every stored figure is). */
  hangTotalLoadExact: string | null
  hangProductionId: string | null
  hangUnits: UnitSystem | null
  /** The engine's batten side, in the hang's units. */
  battenSide: number | null
  /** How many of the current hang's saved findings say stop. */
  hangStops: number
  changeId: string | null
  changeType: string | null
  changeAt: Date | null
  changeById: string | null
  changeByName: string | null
}

const LAST_CHANGE_COLUMNS = `e.id::text AS "changeId", e.event_type AS "changeType", e.occurred_at AS "changeAt",
            eu.id AS "changeById", eu.name AS "changeByName"`
const NO_LAST_CHANGE = `NULL AS "changeId", NULL AS "changeType", NULL AS "changeAt", NULL AS "changeById",
            NULL AS "changeByName"`
// The approving ticket is found by its key (the ledger entry names it), not by comparing every ticket's id as text.
const LAST_CHANGE_JOINS = `LEFT JOIN LATERAL (
         SELECT id, event_type, occurred_at, actor_id, payload
           FROM lineset_events WHERE lineset_id = l.id ORDER BY id DESC LIMIT 1) e ON true
       LEFT JOIN weight_change_tickets approved
         ON approved.venue_id = l.venue_id
        AND approved.id = (CASE WHEN e.event_type = 'ticket-loaded' THEN e.payload -> 'ticket' ->> 'id' END)::uuid
       LEFT JOIN users eu ON eu.id = coalesce(approved.decided_by, e.actor_id)`

/**
 * The whole board in one statement: each lineset with its latest hang, its furthest-along open ticket, its
 * arbor's weight and its latest ledger entry, each found through an index (never a query per lineset).
 * For a completed weight change, "by" is whoever approved the ticket; for anything else, who did it.
 * `lastChange: false` leaves the ledger out (its change fields null) for readers that do not show it.
 */
export function boardRows(
  tx: ServiceContext,
  filter: { productionId?: string | null; linesetId?: string | null } = {},
  { lastChange = true } = {},
): Promise<BoardRow[]> {
  return rows<BoardRow>(
    tx,
    `SELECT l.id, l.number, l.name, l.kind, l.status, l.arbor_felt_balance AS "feltBalance",
            (l.arbor_empty_weight + coalesce(l.pipe_weight, 0) + coalesce(arbor.bricks, 0))::text AS "arborSide",
            l.lockout_reason AS "lockoutReason", l.locked_out_at AS "lockedOutAt", l.locked_out_by AS "lockedOutBy",
            lu.name AS "lockedOutByName", ticket.state AS "openTicket",
            h.id AS "hangId", h.title AS "hangTitle", h.revision AS "hangRevision",
            h.total_load::float8 AS "hangTotalLoad",
            h.total_load::text AS "hangTotalLoadExact", h.production_id AS "hangProductionId", h.unit_system AS "hangUnits",
            (h.calculation_result -> 'counterweight' ->> 'battenSide')::float8 AS "battenSide",
            ${stopCountSql('h')} AS "hangStops",
            ${lastChange ? LAST_CHANGE_COLUMNS : NO_LAST_CHANGE}
       FROM linesets l
       LEFT JOIN users lu ON lu.id = l.locked_out_by
       LEFT JOIN LATERAL (
         SELECT id, title, revision, total_load, production_id, unit_system, calculation_result
           FROM hangs WHERE lineset_id = l.id ORDER BY revision DESC LIMIT 1) h ON true
       LEFT JOIN LATERAL (
         SELECT state FROM weight_change_tickets
          WHERE lineset_id = l.id AND state IN ('requested', 'approved', 'loading')
          ORDER BY CASE state WHEN 'loading' THEN 3 WHEN 'requested' THEN 2 ELSE 1 END DESC LIMIT 1) ticket ON true
       LEFT JOIN LATERAL (
         SELECT sum(a.count * b.unit_weight) AS bricks
           FROM arbor_bricks a JOIN brick_types b ON b.id = a.brick_type_id WHERE a.lineset_id = l.id) arbor ON true
       ${lastChange ? LAST_CHANGE_JOINS : ''}
      WHERE l.venue_id = $1 AND l.retired_at IS NULL
        AND ($2::uuid IS NULL OR h.production_id = $2::uuid)
        AND ($3::uuid IS NULL OR l.id = $3::uuid)
      ORDER BY l.number`,
    [tx.actor.venueId, filter.productionId ?? null, filter.linesetId ?? null],
  )
}

/** The venue's units and balance tolerance (kg, exact text). */
export async function venueBoardPolicy(tx: ServiceContext) {
  const [venue] = await rows<{ unitSystem: UnitSystem; tolerance: string }>(
    tx,
    'SELECT unit_system AS "unitSystem", balance_tolerance::text AS tolerance FROM venues WHERE id = $1',
    [tx.actor.venueId],
  )
  return venue!
}
