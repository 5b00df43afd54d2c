import type { TicketComplete, TicketView } from '../../../shared/schemas/ticket.js'
import { inTransaction, type ServiceContext, type TransactionContext } from '../../context.js'
import { AppError } from '../../http/errors.js'
import { loadBricks, type BrickMove } from '../brick-stock/brick-stock.service.js'
import { rows } from '../brick-stock/stock-sql.js'
import { ticketBricks } from './ticket-bricks.js'
import { stepFacts } from './ticket-decisions.service.js'
import { recordTicketStep } from './ticket-ledger.js'
import { weighRecorded } from './ticket-recorded.js'
import { readTicket } from './ticket-read.service.js'
import { lockTicket, moveTicket } from './ticket-store.js'

async function refuseUnworkable(tx: TransactionContext, linesetId: string) {
  const [lineset] = await rows<{ number: number; status: string; reason: string | null }>(
    tx,
    'SELECT number, status, lockout_reason AS reason FROM linesets WHERE id = $1',
    [linesetId],
  )
  if (lineset!.status === 'out-of-service')
    throw new AppError(409, 'out_of_service', `Lineset ${lineset!.number} is out of service; it cannot be loaded`)
  if (lineset!.reason !== null)
    throw new AppError(
      409,
      'locked_out',
      `Lineset ${lineset!.number} is locked out (${lineset!.reason}); release it first`,
    )
}

/** Approved -> loading: from now the lineset reads "loading, do not operate" everywhere. */
export function startLoading(ctx: ServiceContext, id: string, body: { version: number }): Promise<TicketView> {
  return inTransaction(ctx, async (tx) => {
    const ticket = await lockTicket(tx, id)
    await refuseUnworkable(tx, ticket.linesetId)
    await moveTicket(
      tx,
      ticket,
      { name: 'started', from: ['approved'], to: 'loading', version: body.version },
      { started_by: tx.actor.id, started_at: tx.clock.now() },
    )
    await recordTicketStep(tx, 'ticket-loading', ticket.linesetId, { ticket: stepFacts(ticket) })
    return readTicket(tx, id)
  })
}

/**
 * Loading -> loaded, all in one transaction: the ticket's reservation goes back to storage, the arbor is set
 * to what was actually loaded (a type not named stays as the plan leaves it) with the difference drawn from or
 * returned to storage (409 naming the type when storage cannot supply it), the felt balance is kept (the
 * lineset's status follows from it), and the ticket and the ledger record what moved. Counts that differ from
 * the plan need `differsFromPlan` (422 otherwise); the ticket keeps the out of balance the counts give.
 */
export function completeTicket(ctx: ServiceContext, id: string, body: TicketComplete): Promise<TicketView> {
  return inTransaction(ctx, async (tx) => {
    const ticket = await lockTicket(tx, id)
    const note = body.note ?? ''
    await moveTicket(
      tx,
      ticket,
      { name: 'completed', from: ['loading'], to: 'loaded', version: body.version },
      { completed_by: tx.actor.id, completed_at: tx.clock.now(), felt_balance: body.feltBalance, note },
    )
    const plan = await ticketBricks(tx, id)
    const aboard = await rows<{ brickTypeId: string; name: string; count: number }>(
      tx,
      `SELECT a.brick_type_id AS "brickTypeId", b.name, a.count FROM arbor_bricks a
         JOIN brick_types b ON b.id = a.brick_type_id WHERE a.lineset_id = $1`,
      [ticket.linesetId],
    )
    const now = new Map(aboard.map((row) => [row.brickTypeId, row.count]))
    const target = new Map(plan.map((b) => [b.brickTypeId, { count: b.arborAfter ?? now.get(b.brickTypeId) ?? 0 }]))
    const planned = new Map([...target].map(([brickTypeId, { count }]) => [brickTypeId, count]))
    const fields = new Map<string, string>()
    body.loaded.forEach((brick, index) => {
      target.set(brick.brickTypeId, { count: brick.count })
      fields.set(brick.brickTypeId, `loaded.${index}.count`)
    })
    const recorded = await weighRecorded(
      tx,
      id,
      [...target].map(([brickTypeId, { count }]) => ({
        brickTypeId,
        planned: planned.get(brickTypeId) ?? now.get(brickTypeId) ?? 0,
        recorded: count,
      })),
      body.differsFromPlan === true,
    )
    await rows(tx, 'UPDATE weight_change_tickets SET loaded_out_of_balance = $2 WHERE id = $1 RETURNING id', [
      id,
      recorded.outOfBalance,
    ])
    const moves: BrickMove[] = [...target].map(([brickTypeId, { count }]) => ({
      brickTypeId,
      count: count - (now.get(brickTypeId) ?? 0),
      ...(fields.has(brickTypeId) ? { field: fields.get(brickTypeId) } : {}),
    }))
    await loadBricks(tx, ticket.linesetId, {
      reserved: plan.filter((b) => b.reserved > 0).map((b) => ({ brickTypeId: b.brickTypeId, count: b.reserved })),
      loaded: moves,
      feltBalance: body.feltBalance,
    })
    for (const move of moves)
      await rows(
        tx,
        `INSERT INTO ticket_bricks (venue_id, ticket_id, brick_type_id, planned, reserved, loaded)
         VALUES ($1, $2, $3, 0, 0, $4)
         ON CONFLICT (ticket_id, brick_type_id) DO UPDATE SET reserved = 0, loaded = EXCLUDED.loaded
         RETURNING ticket_id`,
        [tx.actor.venueId, id, move.brickTypeId, move.count],
      )
    const names = await rows<{ id: string; name: string }>(
      tx,
      'SELECT id, name FROM brick_types WHERE id = ANY($1::uuid[])',
      [moves.map((move) => move.brickTypeId)],
    )
    const loaded = moves
      .filter((move) => move.count !== 0)
      .map((move) => {
        const before = now.get(move.brickTypeId) ?? 0
        return { name: names.find((n) => n.id === move.brickTypeId)?.name ?? '', before, after: before + move.count }
      })
    await recordTicketStep(tx, 'ticket-loaded', ticket.linesetId, {
      ticket: stepFacts(ticket),
      loaded,
      feltBalance: body.feltBalance,
      ...(recorded.differences.length ? { differsFromPlan: recorded.differences } : {}),
      ...(note ? { note } : {}),
    })
    return readTicket(tx, id)
  })
}
