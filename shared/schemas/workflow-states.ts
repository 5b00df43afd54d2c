/**
 * The states a saved hang and a change ticket move through, and which moves are allowed. Both sides import
 * them: the server writes each move conditional on the state it starts from, and the client shows only the
 * moves the current state allows.
 */

/** A hang revision's life on its lineset. */
export const HANG_STATES = ['draft', 'awaiting-approval', 'approved', 'loaded', 'struck'] as const
export type HangState = (typeof HANG_STATES)[number]

/** A change ticket: a fly operator asks, a technical director decides, the crew loads. */
export const TICKET_STATES = ['requested', 'approved', 'declined', 'withdrawn', 'loading', 'loaded'] as const
export type TicketState = (typeof TICKET_STATES)[number]

/** Where each ticket state may go next; an empty list is an end state. */
export const TICKET_MOVES: Readonly<Record<TicketState, readonly TicketState[]>> = {
  requested: ['approved', 'declined', 'withdrawn'],
  approved: ['loading'],
  loading: ['loaded'],
  declined: [],
  withdrawn: [],
  loaded: [],
}

/**
 * Whether a ticket may move from one state to another.
 *
 * @example
 * canMoveTicket('requested', 'approved') // true
 * canMoveTicket('loaded', 'requested') // false
 */
export const canMoveTicket = (from: TicketState, to: TicketState) => TICKET_MOVES[from].includes(to)
