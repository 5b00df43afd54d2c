import type { CalculationInput } from '../../../shared/schemas/calculation.js'
import type { TicketOpen, TicketView } from '../../../shared/schemas/ticket.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import { inTransaction, type ServiceContext, type TransactionContext } from '../../context.js'
import { AppError, notFound } from '../../http/errors.js'
import { arborLineset } from '../arbors/arbor-lineset.js'
import { rows } from '../brick-stock/stock-sql.js'
import { latestRevision } from '../hangs/hang-revision.js'
import { recordTicketStep } from './ticket-ledger.js'
import { mailTicketOpened } from './ticket-mail.js'
import { planTicket } from './ticket-plan.js'
import { readTicket } from './ticket-read.service.js'

interface SavedHang {
  id: string
  linesetId: string
  revision: number
  title: string
  units: UnitSystem
  input: CalculationInput
}

/** Why a lineset cannot take a new ticket now: out of service, locked out, or a ticket already open on it. */
async function refuseBusyLineset(tx: TransactionContext, lineset: { id: string; number: number }) {
  const [facts] = await rows<{ status: string; lockoutReason: string | null; openState: string | null }>(
    tx,
    `SELECT l.status, l.lockout_reason AS "lockoutReason",
            (SELECT state FROM weight_change_tickets t
              WHERE t.lineset_id = l.id AND t.state IN ('requested', 'approved', 'loading') LIMIT 1) AS "openState"
       FROM linesets l WHERE l.id = $1`,
    [lineset.id],
  )
  const set = `Lineset ${lineset.number}`
  if (facts!.status === 'out-of-service')
    throw new AppError(409, 'out_of_service', `${set} is out of service; no weight can be moved on it`)
  if (facts!.lockoutReason !== null)
    throw new AppError(409, 'locked_out', `${set} is locked out (${facts!.lockoutReason}); release it first`)
  if (facts!.openState === 'loading')
    throw new AppError(
      409,
      'lineset_loading',
      `${set} is being loaded now; a ticket for a new revision waits until that loading is done`,
    )
  if (facts!.openState)
    throw new AppError(
      409,
      'open_ticket_exists',
      `${set} already has an open ticket (${facts!.openState === 'requested' ? 'awaiting a decision' : 'approved'}); withdraw or finish it first`,
    )
}

/**
 * Opens a change ticket for a saved hang revision: only the lineset's latest revision, on a counterweight set
 * in service, not locked out and with no ticket open. The plan is the engine's against the bricks free now
 * (this arbor's and storage's); the ticket, its bricks, the ledger entry and the directors' e-mail are
 * written together. The lineset stays locked meanwhile, so two openings on one set take turns.
 */
export function openTicket(ctx: ServiceContext, body: TicketOpen): Promise<TicketView> {
  return inTransaction(ctx, async (tx) => {
    const [hang] = await rows<SavedHang>(
      tx,
      `SELECT id, lineset_id AS "linesetId", revision, title, unit_system AS units, calculation_input AS input
         FROM hangs WHERE id = $1 AND venue_id = $2`,
      [body.hangId, tx.actor.venueId],
    )
    if (!hang) throw notFound('That hang revision')
    const lineset = await arborLineset(tx, hang.linesetId, true)
    await refuseBusyLineset(tx, lineset)
    const latest = await latestRevision(tx, lineset.id)
    if (latest !== hang.revision)
      throw new AppError(
        409,
        'not_latest_revision',
        `Revision ${hang.revision} is not the latest of lineset ${lineset.number} (revision ${latest} is); ask for the latest`,
        { hangId: `The latest is revision ${latest}` },
      )
    const plan = await planTicket(tx, lineset, { input: hang.input, units: hang.units })
    const now = tx.clock.now()
    const [ticket] = await rows<{ id: string }>(
      tx,
      `INSERT INTO weight_change_tickets (venue_id, lineset_id, hang_id, state, requested_by, expected_out_of_balance,
              created_at, updated_at)
       VALUES ($1, $2, $3, 'requested', $4, $5, $6, $6) RETURNING id`,
      [tx.actor.venueId, lineset.id, hang.id, tx.actor.id, plan.expectedOutOfBalance, now],
    )
    const lines = plan.bricks.filter((brick) => brick.change !== 0 || brick.after > 0)
    for (const brick of lines)
      await rows(
        tx,
        `INSERT INTO ticket_bricks (venue_id, ticket_id, brick_type_id, planned, arbor_after)
         VALUES ($1, $2, $3, $4, $5) RETURNING ticket_id`,
        [tx.actor.venueId, ticket!.id, brick.brickTypeId, brick.change, brick.after],
      )
    const changes = lines.filter((b) => b.change !== 0).map((b) => ({ name: b.name, count: b.change }))
    const facts = { id: ticket!.id, hangRevision: hang.revision, hangTitle: hang.title }
    await recordTicketStep(tx, 'ticket-opened', lineset.id, { ticket: facts, changes })
    const [named] = await rows<{ name: string }>(tx, 'SELECT name FROM linesets WHERE id = $1', [lineset.id])
    await mailTicketOpened(tx, { ...facts, linesetNumber: lineset.number, linesetName: named!.name, changes })
    return readTicket(tx, ticket!.id)
  })
}
