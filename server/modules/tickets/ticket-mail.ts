import type { TransactionContext } from '../../context.js'
import { rows } from '../brick-stock/stock-sql.js'
import { queueMail } from '../outbox/outbox.service.js'

/** What a ticket's e-mail names: the lineset, the revision and the bricks that move. */
export interface TicketMailFacts {
  id: string
  linesetNumber: number
  linesetName: string
  hangRevision: number
  hangTitle: string
  changes: readonly { name: string; count: number }[]
}

const linkTo = (tx: TransactionContext, id: string) => `${tx.publicUrl}/tickets/${id}`

/** "4 × Full on, 2 × Half off", or a sentence when no brick moves. */
export function changeWords(changes: readonly { name: string; count: number }[]): string {
  const moving = changes.filter((change) => change.count !== 0)
  if (!moving.length) return 'no bricks move'
  return moving.map((c) => `${Math.abs(c.count)} × ${c.name} ${c.count > 0 ? 'on' : 'off'}`).join(', ')
}

const setWords = (t: TicketMailFacts) => `lineset ${t.linesetNumber} (${t.linesetName})`

/** Opening a ticket: every technical director of the venue hears of it, in the same transaction. */
export async function mailTicketOpened(tx: TransactionContext, ticket: TicketMailFacts) {
  const directors = await rows<{ email: string }>(
    tx,
    `SELECT u.email FROM memberships m JOIN users u ON u.id = m.user_id
      WHERE m.venue_id = $1 AND m.role = 'technical-director' ORDER BY u.email`,
    [tx.actor.venueId],
  )
  if (!directors.length) return
  await queueMail(tx, {
    to: directors.map((director) => director.email),
    subject: `Change ticket for ${setWords(ticket)}: waiting for your decision`,
    text: [
      `${tx.actor.name} asks for a weight change on ${setWords(ticket)}, for hang revision ${ticket.hangRevision} “${ticket.hangTitle}”.`,
      '',
      `Bricks: ${changeWords(ticket.changes)}.`,
      '',
      'Read the plan, any shortfall, and approve or decline it here:',
      linkTo(tx, ticket.id),
    ].join('\n'),
    cause: { kind: 'ticket', id: ticket.id },
  })
}

/** A decision (approved, declined) is mailed to the ticket's opener, with the comment given. */
export async function mailTicketDecided(
  tx: TransactionContext,
  ticket: TicketMailFacts & { openerEmail: string | null },
  decision: 'approved' | 'declined',
  comment: string | undefined,
) {
  if (!ticket.openerEmail) return
  await queueMail(tx, {
    to: [ticket.openerEmail],
    subject: `Change ticket for ${setWords(ticket)} ${decision}`,
    text: [
      `${tx.actor.name} ${decision} your weight change on ${setWords(ticket)} (hang revision ${ticket.hangRevision} “${ticket.hangTitle}”).`,
      ...(comment ? ['', `Comment: ${comment}`] : []),
      '',
      decision === 'approved'
        ? `The bricks are held for you (${changeWords(ticket.changes)}). Open the ticket to load:`
        : 'Open the ticket:',
      linkTo(tx, ticket.id),
    ].join('\n'),
    cause: { kind: 'ticket', id: ticket.id },
  })
}
