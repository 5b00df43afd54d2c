import type { TicketView } from '../../shared/schemas/index.js'
import { displayQuantity } from '../../shared/units/display.js'
import { dayAndTime } from './moments'

/** "4 × Full on, 2 × Half off", or a sentence when no brick moves. */
export function ticketChangeWords(changes: TicketView['changes']): string {
  if (!changes.length) return 'No bricks move'
  return changes.map((c) => `${Math.abs(c.count)} × ${c.name} ${c.count > 0 ? 'on' : 'off'}`).join(', ')
}

/** The expected out of balance in words: how heavy, and which side. */
export function expectedBalanceWords(ticket: Pick<TicketView, 'expectedOutOfBalance' | 'unitSystem'>): string {
  const value = ticket.expectedOutOfBalance
  if (value === null) return 'Not known'
  if (value === 0) return 'Balanced'
  const amount = displayQuantity(Math.abs(value), 'weight', ticket.unitSystem)
  return `${amount} ${value > 0 ? 'batten heavy' : 'arbor heavy'}`
}

/** A moment as tickets show it: day, month, year and time of day, in the reader's own zone. */
export const ticketMoment = (iso: string) => dayAndTime(iso)
