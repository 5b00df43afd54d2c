import type { TicketState } from '../../../shared/schemas/workflow-states.js'
import type { TransactionContext } from '../../context.js'
import { AppError, notFound, staleVersion } from '../../http/errors.js'
import { rows } from '../brick-stock/stock-sql.js'

/** What a move on a ticket needs to know, read with the ticket row locked. */
export interface LockedTicket {
  id: string
  state: TicketState
  version: number
  linesetId: string
  linesetNumber: number
  linesetName: string
  hangRevision: number
  hangTitle: string
  requestedBy: string | null
  openerEmail: string | null
}

const STATE_WORDS: Record<TicketState, string> = {
  requested: 'awaiting a decision',
  approved: 'approved',
  declined: 'declined',
  withdrawn: 'withdrawn',
  loading: 'being loaded',
  loaded: 'loaded',
}

/**
 * The acting venue's ticket, locked until the transaction ends so moves on one ticket take turns (404 for
 * another venue's). Locking it first, before the lineset and the brick types, keeps one lock order everywhere.
 */
export async function lockTicket(tx: TransactionContext, id: string): Promise<LockedTicket> {
  const [ticket] = await rows<LockedTicket>(
    tx,
    `SELECT t.id, t.state, t.version, t.lineset_id AS "linesetId", l.number AS "linesetNumber",
            l.name AS "linesetName", h.revision AS "hangRevision", h.title AS "hangTitle",
            t.requested_by AS "requestedBy", u.email AS "openerEmail"
       FROM weight_change_tickets t
       JOIN linesets l ON l.id = t.lineset_id
       JOIN hangs h ON h.id = t.hang_id
       LEFT JOIN users u ON u.id = t.requested_by
      WHERE t.id = $1 AND t.venue_id = $2
      FOR UPDATE OF t`,
    [id, tx.actor.venueId],
  )
  if (!ticket) throw notFound('That ticket')
  return ticket
}

// Where the ticket stands, said to the person whose move came too late or too early.
const STATE_SENTENCES: Record<TicketState, string> = {
  requested: 'This ticket is still awaiting a decision.',
  approved: 'This ticket has already been approved.',
  declined: 'This ticket has already been declined.',
  withdrawn: 'This ticket has been withdrawn.',
  loading: 'This ticket is already being loaded.',
  loaded: 'This ticket has already been loaded.',
}

// What each move does, after "only a ticket ... can".
const MOVE_WORDS: Record<string, string> = {
  approved: 'be approved',
  declined: 'be declined',
  withdrawn: 'be withdrawn',
  started: 'start loading',
  completed: 'be recorded as loaded',
}

/** 409 saying in words where the ticket stands and what the move needed; the state's name is in `fields`. */
export function wrongState(ticket: LockedTicket, move: string, needed: readonly TicketState[]) {
  const wanted = needed.map((state) => STATE_WORDS[state]).join(' or ')
  const does = MOVE_WORDS[move] ?? `be ${move}`
  return new AppError(409, 'ticket_state', `${STATE_SENTENCES[ticket.state]} Only a ticket ${wanted} can ${does}.`, {
    state: ticket.state,
  })
}

/**
 * Checks a move against the locked ticket (state first, so a late one of two decisions hears why), then
 * writes it conditional on the state and version it starts from; a row count of zero is refused too.
 */
export async function moveTicket(
  tx: TransactionContext,
  ticket: LockedTicket,
  move: { name: string; from: readonly TicketState[]; to: TicketState; version: number },
  set: Record<string, unknown> = {},
): Promise<number> {
  if (!move.from.includes(ticket.state)) throw wrongState(ticket, move.name, move.from)
  if (ticket.version !== move.version) throw staleVersion('This ticket')
  const columns = Object.keys(set)
  const assignments = columns.map((column, index) => `, ${column} = $${index + 6}`).join('')
  const [moved] = await rows<{ version: number }>(
    tx,
    `UPDATE weight_change_tickets SET state = $3, version = version + 1, updated_at = $4${assignments}
      WHERE id = $1 AND venue_id = $2 AND state = ANY($5::text[]) AND version = ${Number(move.version)}
      RETURNING version`,
    [ticket.id, tx.actor.venueId, move.to, tx.clock.now(), [...move.from], ...columns.map((column) => set[column])],
  )
  if (!moved) throw staleVersion('This ticket')
  return moved.version
}
