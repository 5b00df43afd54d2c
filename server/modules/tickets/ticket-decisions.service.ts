import type { TicketApprove, TicketDecline, TicketView } from '../../../shared/schemas/ticket.js'
import { inTransaction, type ServiceContext, type TransactionContext } from '../../context.js'
import { AppError } from '../../http/errors.js'
import { releaseReservation, reserveBricks } from '../brick-stock/brick-stock.service.js'
import { changesOf, markReserved, ticketBricks } from './ticket-bricks.js'
import { refuseDangerousHang } from './ticket-dangers.js'
import { recordTicketStep } from './ticket-ledger.js'
import { mailTicketDecided } from './ticket-mail.js'
import { readTicket } from './ticket-read.service.js'
import { lockTicket, moveTicket, type LockedTicket } from './ticket-store.js'

const stepFacts = (t: LockedTicket) => ({ id: t.id, hangRevision: t.hangRevision, hangTitle: t.hangTitle })

/**
 * Locks a requested ticket and moves it to `verdict`, recording who decided, when and why; conditional on the
 * state and version it starts from. Nobody decides a ticket they opened.
 */
async function decideTicket(
  tx: TransactionContext,
  id: string,
  verdict: 'approved' | 'declined',
  body: { version: number; comment?: string },
): Promise<LockedTicket> {
  const ticket = await lockTicket(tx, id)
  if (ticket.requestedBy === tx.actor.id)
    throw new AppError(403, 'forbidden', 'Nobody decides a ticket they opened; another technical director must')
  await moveTicket(
    tx,
    ticket,
    { name: verdict, from: ['requested'], to: verdict, version: body.version },
    { decided_by: tx.actor.id, decided_at: tx.clock.now(), decision_comment: body.comment || null },
  )
  return ticket
}

/**
 * Approves a requested ticket and reserves the bricks it adds, or refuses with 409 naming the brick type and
 * how many are missing, or the hang's findings that say stop (nothing written). Written conditional on the state and version it starts from.
 */
export function approveTicket(ctx: ServiceContext, id: string, body: TicketApprove): Promise<TicketView> {
  return inTransaction(ctx, async (tx) => {
    const ticket = await decideTicket(tx, id, 'approved', body)
    await refuseDangerousHang(tx, ticket)
    const bricks = await ticketBricks(tx, id)
    await reserveBricks(
      tx,
      bricks
        .filter((brick) => brick.planned > 0)
        .map((brick) => ({ brickTypeId: brick.brickTypeId, count: brick.planned })),
    )
    await markReserved(tx, id, true)
    const changes = changesOf(bricks)
    await recordTicketStep(tx, 'ticket-approved', ticket.linesetId, {
      ticket: stepFacts(ticket),
      changes,
      ...(body.comment ? { comment: body.comment } : {}),
    })
    await mailTicketDecided(tx, { ...ticket, changes }, 'approved', body.comment)
    return readTicket(tx, id)
  })
}

/** Declines a requested ticket with the comment that says why; the opener is mailed. */
export function declineTicket(ctx: ServiceContext, id: string, body: TicketDecline): Promise<TicketView> {
  return inTransaction(ctx, async (tx) => {
    const ticket = await decideTicket(tx, id, 'declined', body)
    const changes = changesOf(await ticketBricks(tx, id))
    await recordTicketStep(tx, 'ticket-declined', ticket.linesetId, {
      ticket: stepFacts(ticket),
      comment: body.comment,
    })
    await mailTicketDecided(tx, { ...ticket, changes }, 'declined', body.comment)
    return readTicket(tx, id)
  })
}

/** The opener takes a ticket back while it waits or is approved; an approval's reservation goes back to storage. */
export function withdrawTicket(ctx: ServiceContext, id: string, body: { version: number }): Promise<TicketView> {
  return inTransaction(ctx, async (tx) => {
    const ticket = await lockTicket(tx, id)
    if (ticket.requestedBy !== tx.actor.id)
      throw new AppError(403, 'forbidden', 'Only the person who opened a ticket can withdraw it')
    const was = ticket.state
    await moveTicket(tx, ticket, {
      name: 'withdrawn',
      from: ['requested', 'approved'],
      to: 'withdrawn',
      version: body.version,
    })
    if (was === 'approved') {
      const bricks = await ticketBricks(tx, id)
      await releaseReservation(
        tx,
        bricks.filter((b) => b.reserved > 0).map((b) => ({ brickTypeId: b.brickTypeId, count: b.reserved })),
      )
      await markReserved(tx, id, false)
    }
    await recordTicketStep(tx, 'ticket-withdrawn', ticket.linesetId, { ticket: stepFacts(ticket) })
    return readTicket(tx, id)
  })
}

export { stepFacts }
