import type { LinesetKind, LinesetStatus } from '../../../shared/schemas/lineset.js'
import type { FeltBalance } from '../../../shared/schemas/operating-status.js'
import type { TicketState } from '../../../shared/schemas/workflow-states.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import type { TransactionContext } from '../../context.js'
import { rows } from '../brick-stock/stock-sql.js'
import { stopCountSql } from '../hangs/hang-stops.js'

interface LinesetFacts {
  id: string
  kind: LinesetKind
  status: LinesetStatus
  arborEmptyWeight: string | null
  pipeWeight: string | null
  feltBalance: FeltBalance | null
  lockoutReason: string | null
  lockedOutAt: Date | null
  lockedOutBy: string | null
  lockedOutByName: string | null
}

// When a lineset has several open tickets, the one furthest along speaks for it.
const TICKET_WEIGHT: Partial<Record<TicketState, number>> = { loading: 3, requested: 2, approved: 1 }

/** What operating statuses are decided from, read in four queries for the venue (or one of its linesets). */
export async function operatingFacts(tx: TransactionContext, linesetId?: string) {
  const bind = [tx.actor.venueId, linesetId ?? null]
  const only = (column: string) => `($2::uuid IS NULL OR ${column} = $2::uuid)`
  const linesets = await rows<LinesetFacts>(
    tx,
    `SELECT l.id, l.kind, l.status, l.arbor_empty_weight AS "arborEmptyWeight", l.pipe_weight AS "pipeWeight",
            l.arbor_felt_balance AS "feltBalance", l.lockout_reason AS "lockoutReason",
            l.locked_out_at AS "lockedOutAt", l.locked_out_by AS "lockedOutBy", u.name AS "lockedOutByName"
       FROM linesets l LEFT JOIN users u ON u.id = l.locked_out_by
      WHERE l.venue_id = $1 AND l.retired_at IS NULL AND ${only('l.id')}`,
    bind,
  )
  const tickets = await rows<{ linesetId: string; state: TicketState }>(
    tx,
    `SELECT lineset_id AS "linesetId", state FROM weight_change_tickets
      WHERE venue_id = $1 AND state IN ('requested', 'approved', 'loading') AND ${only('lineset_id')}`,
    bind,
  )
  const hangs = await rows<{ linesetId: string; units: UnitSystem; battenSide: number | null; stops: number }>(
    tx,
    `SELECT DISTINCT ON (lineset_id) lineset_id AS "linesetId", unit_system AS units,
            (calculation_result -> 'counterweight' ->> 'battenSide')::float8 AS "battenSide",
            ${stopCountSql()} AS stops
       FROM hangs WHERE venue_id = $1 AND ${only('lineset_id')} ORDER BY lineset_id, revision DESC`,
    bind,
  )
  const bricks = await rows<{ linesetId: string; count: number; unitWeight: string }>(
    tx,
    `SELECT a.lineset_id AS "linesetId", a.count, b.unit_weight AS "unitWeight"
       FROM arbor_bricks a JOIN brick_types b ON b.id = a.brick_type_id
      WHERE a.venue_id = $1 AND ${only('a.lineset_id')}`,
    bind,
  )
  const [venue] = await rows<{ tolerance: string }>(
    tx,
    'SELECT balance_tolerance AS tolerance FROM venues WHERE id = $1',
    [tx.actor.venueId],
  )
  const openTickets = new Map<string, TicketState>()
  for (const { linesetId: id, state } of tickets)
    if ((TICKET_WEIGHT[state] ?? 0) > (TICKET_WEIGHT[openTickets.get(id)!] ?? 0)) openTickets.set(id, state)
  const battenSides = new Map(
    hangs.flatMap((hang) =>
      hang.battenSide === null ? [] : [[hang.linesetId, { value: hang.battenSide, units: hang.units }] as const],
    ),
  )
  const arbors = new Map<string, { unitWeight: string; count: number }[]>()
  for (const brick of bricks) arbors.set(brick.linesetId, [...(arbors.get(brick.linesetId) ?? []), brick])
  const hangsSayingStop = new Set(hangs.filter((hang) => hang.stops > 0).map((hang) => hang.linesetId))
  return { linesets, openTickets, battenSides, arbors, hangsSayingStop, tolerance: venue!.tolerance }
}
