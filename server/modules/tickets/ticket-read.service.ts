import { purchaseRatio } from '../../../shared/engine/counterweight.js'
import type { FeltBalance } from '../../../shared/schemas/operating-status.js'
import type { TicketComment, TicketView } from '../../../shared/schemas/ticket.js'
import type { TicketState } from '../../../shared/schemas/workflow-states.js'
import { inTransaction, type ServiceContext, type TransactionContext } from '../../context.js'
import { apiFromStored } from '../../db/quantities.js'
import { notFound } from '../../http/errors.js'
import { rows } from '../brick-stock/stock-sql.js'
import { venueUnitSystem } from '../venues/venue.service.js'

type Person = { id: string; name: string } | null

interface TicketRow {
  id: string
  state: TicketState
  version: number
  linesetId: string
  linesetNumber: number
  linesetName: string
  linesetKind: string
  hangId: string
  hangRevision: number
  hangTitle: string
  expectedOutOfBalance: string | null
  loadedOutOfBalance: string | null
  createdAt: Date
  opener: Person
  decider: Person
  decidedAt: Date | null
  decisionComment: string | null
  completer: Person
  completedAt: Date | null
  note: string
  feltBalance: FeltBalance | null
}

interface BrickRow {
  ticketId: string
  brickTypeId: string
  name: string
  planned: number
  reserved: number
  loaded: number | null
  arborAfter: number | null
  inStorage: number
  unitWeight: string | null
}

const person = (column: string) =>
  `CASE WHEN ${column}.id IS NULL THEN NULL ELSE json_build_object('id', ${column}.id, 'name', ${column}.name) END`

function commentsOf(row: TicketRow): TicketComment[] {
  const comments: TicketComment[] = []
  if (row.decidedAt && (row.decisionComment || row.state === 'declined'))
    comments.push({
      kind: row.state === 'declined' ? 'declined' : 'approved',
      text: row.decisionComment ?? '',
      by: row.decider,
      at: row.decidedAt.toISOString(),
    })
  if (row.completedAt && row.note)
    comments.push({ kind: 'completed', text: row.note, by: row.completer, at: row.completedAt.toISOString() })
  return comments
}

/** The venue's tickets (one, or those in a state, or all), newest first, each with its plan and shortfall. */
async function ticketViews(tx: TransactionContext, filter: { id?: string; state?: TicketState }) {
  const system = await venueUnitSystem(tx)
  const [venue] = await rows<{ tolerance: string }>(
    tx,
    'SELECT balance_tolerance AS tolerance FROM venues WHERE id = $1',
    [tx.actor.venueId],
  )
  const tickets = await rows<TicketRow>(
    tx,
    `SELECT t.id, t.state, t.version, t.lineset_id AS "linesetId", l.number AS "linesetNumber", l.name AS "linesetName",
            l.kind AS "linesetKind", t.hang_id AS "hangId", h.revision AS "hangRevision", h.title AS "hangTitle",
            t.expected_out_of_balance AS "expectedOutOfBalance",
            t.loaded_out_of_balance AS "loadedOutOfBalance", t.created_at AS "createdAt",
            ${person('o')} AS opener, ${person('d')} AS decider, t.decided_at AS "decidedAt",
            t.decision_comment AS "decisionComment", ${person('c')} AS completer, t.completed_at AS "completedAt",
            t.note, t.felt_balance AS "feltBalance"
       FROM weight_change_tickets t
       JOIN linesets l ON l.id = t.lineset_id
       JOIN hangs h ON h.id = t.hang_id
       LEFT JOIN users o ON o.id = t.requested_by
       LEFT JOIN users d ON d.id = t.decided_by
       LEFT JOIN users c ON c.id = t.completed_by
      WHERE t.venue_id = $1 AND ($2::uuid IS NULL OR t.id = $2::uuid) AND ($3::text IS NULL OR t.state = $3::text)
      ORDER BY t.created_at DESC, t.id DESC LIMIT 500`,
    [tx.actor.venueId, filter.id ?? null, filter.state ?? null],
  )
  const bricks = await rows<BrickRow>(
    tx,
    `SELECT tb.ticket_id AS "ticketId", tb.brick_type_id AS "brickTypeId", b.name, tb.planned, tb.reserved,
            tb.loaded, tb.arbor_after AS "arborAfter", b.in_storage AS "inStorage",
            b.unit_weight AS "unitWeight"
       FROM ticket_bricks tb JOIN brick_types b ON b.id = tb.brick_type_id
      WHERE tb.ticket_id = ANY($1::uuid[]) ORDER BY b.name, b.id`,
    [tickets.map((ticket) => ticket.id)],
  )
  return tickets.map((row): TicketView => {
    const own = bricks.filter((brick) => brick.ticketId === row.id)
    return {
      id: row.id,
      state: row.state,
      version: row.version,
      linesetId: row.linesetId,
      lineset: { number: row.linesetNumber, name: row.linesetName },
      hangId: row.hangId,
      hang: { revision: row.hangRevision, title: row.hangTitle },
      changes: own
        .filter((b) => b.planned !== 0)
        .map((b) => ({ brickTypeId: b.brickTypeId, name: b.name, count: b.planned })),
      arborAfter: own.map((b) => ({ brickTypeId: b.brickTypeId, count: b.arborAfter ?? 0 })),
      bricks: own.map((b) => ({
        brickTypeId: b.brickTypeId,
        name: b.name,
        count: b.planned,
        before: (b.arborAfter ?? 0) - b.planned,
        after: b.arborAfter ?? 0,
        reserved: b.reserved,
        loaded: b.loaded,
        unitWeight: apiFromStored(b.unitWeight, 'weight', system),
      })),
      expectedOutOfBalance: apiFromStored(row.expectedOutOfBalance, 'weight', system),
      loadedOutOfBalance: apiFromStored(row.loadedOutOfBalance, 'weight', system),
      purchaseRatio: purchaseRatio(row.linesetKind),
      balanceTolerance: apiFromStored(venue!.tolerance, 'weight', system)!,
      unitSystem: system,
      openedBy: row.opener,
      openedAt: row.createdAt.toISOString(),
      decidedBy: row.decider,
      decidedAt: row.decidedAt?.toISOString() ?? null,
      comments: commentsOf(row),
      feltBalance: row.feltBalance,
      // Only a ticket still waiting to reserve can be short; once approved its bricks are held.
      shortfall:
        row.state === 'requested'
          ? own
              .filter((b) => b.planned > b.inStorage)
              .map((b) => ({ brickTypeId: b.brickTypeId, name: b.name, missing: b.planned - b.inStorage }))
          : [],
    }
  })
}

/** One ticket of the acting venue (404 for another venue's). */
export async function readTicket(ctx: ServiceContext, id: string): Promise<TicketView> {
  return inTransaction(ctx, async (tx) => {
    const [ticket] = await ticketViews(tx, { id })
    if (!ticket) throw notFound('That ticket')
    return ticket
  })
}

/** The acting venue's tickets, newest first, in one state or all. */
export function listTickets(ctx: ServiceContext, state?: TicketState): Promise<TicketView[]> {
  return inTransaction(ctx, (tx) => ticketViews(tx, { state }))
}
