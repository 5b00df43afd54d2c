import { z } from 'zod'
import type { UnitSystem } from '../units/systems.js'
import { FELT_BALANCES, type FeltBalance } from './operating-status.js'
import { count, versionField } from './quantity.js'
import { multiLineText } from './text.js'
import { TICKET_STATES, type TicketState } from './workflow-states.js'

/** The body of `POST /api/v1/tickets`: the saved hang revision whose weight change is asked for. */
export const ticketOpenSchema = z.object({ hangId: z.uuid({ error: 'Choose a saved hang revision' }) })
export type TicketOpen = z.infer<typeof ticketOpenSchema>

/** `GET /api/v1/tickets?state=`: one state, or every ticket when left out. */
export const ticketListQuerySchema = z.object({
  state: z.enum(TICKET_STATES, { error: `State must be one of ${TICKET_STATES.join(', ')}` }).optional(),
})

const comment = multiLineText('Comment', 2000)

/** `/approve`: the version read, and a comment if the deciding person has one. */
export const ticketApproveSchema = z.object({ version: versionField(), comment: comment.optional() })
/** `/decline`: a comment is required, so the opener learns why. */
export const ticketDeclineSchema = z.object({
  version: versionField(),
  comment: multiLineText('Comment', 2000, { required: true }),
})
/** `/withdraw` and `/start-loading`: only the version read. */
export const ticketVersionSchema = z.object({ version: versionField() })
export type TicketApprove = z.infer<typeof ticketApproveSchema>
export type TicketDecline = z.infer<typeof ticketDeclineSchema>

/**
 * `/complete`: what the arbor holds per brick type once loaded (a type left out stays as the plan leaves it),
 * how the set felt at the rail, and a note. A type named twice is refused. Counts that differ from the plan
 * are refused (422) unless `differsFromPlan` is true: a typing slip must not pass for a load.
 *
 * @example
 * ticketCompleteSchema.safeParse({ version: 2, loaded: [{ brickTypeId, count: 14 }], feltBalance: 'balanced' }).success // true
 */
export const ticketCompleteSchema = z.object({
  version: versionField(),
  loaded: z
    .array(
      z.object({ brickTypeId: z.uuid({ error: 'Choose a brick type' }), count: count('bricks', 'Bricks loaded') }),
      {
        error: 'List the bricks on the arbor once loaded',
      },
    )
    .max(20, 'At most 20 brick types')
    .superRefine((bricks, ctx) => {
      const seen = new Set<string>()
      bricks.forEach((brick, index) => {
        if (seen.has(brick.brickTypeId))
          ctx.addIssue({ code: 'custom', path: [index, 'brickTypeId'], message: 'This brick type is listed twice' })
        seen.add(brick.brickTypeId)
      })
    }),
  feltBalance: z.enum(FELT_BALANCES, { error: 'Say how the set felt at the rail' }),
  note: multiLineText('Note', 2000).optional(),
  differsFromPlan: z.boolean({ error: 'Say true or false' }).optional(),
})
export type TicketComplete = z.infer<typeof ticketCompleteSchema>

/** One brick type in a ticket's plan: signed change (+ on, − off), what the arbor holds now and after. */
export interface TicketBrickLine {
  brickTypeId: string
  name: string
  /** Signed: + bricks going on, − bricks coming off. */
  count: number
  before: number
  after: number
  /** Held in reserve for this ticket (approved or loading). */
  reserved: number
  /** Signed count actually moved, once loaded. */
  loaded: number | null
  /** One brick of this type, in the venue's units (null when the type's weight is unknown). */
  unitWeight: number | null
}

/** A comment or decision on a ticket, oldest first. */
export interface TicketComment {
  kind: 'approved' | 'declined' | 'completed'
  text: string
  by: { id: string; name: string } | null
  at: string
}

/** A change ticket as the API shows it (figures in the venue's units, named by `unitSystem`). */
export interface TicketView {
  id: string
  state: TicketState
  version: number
  linesetId: string
  lineset: { number: number; name: string }
  hangId: string
  hang: { revision: number; title: string }
  changes: { brickTypeId: string; name: string; count: number }[]
  arborAfter: { brickTypeId: string; count: number }[]
  bricks: TicketBrickLine[]
  /** The plan's out of balance at the batten, signed (+ batten heavy). */
  expectedOutOfBalance: number | null
  /** Once loaded: the out of balance the recorded counts give, signed like the expected one. */
  loadedOutOfBalance: number | null
  /** 1 single purchase, 2 double purchase. */
  purchaseRatio: 1 | 2
  /** The venue's balance tolerance at the batten, in its units. */
  balanceTolerance: number
  unitSystem: UnitSystem
  openedBy: { id: string; name: string } | null
  openedAt: string
  decidedBy: { id: string; name: string } | null
  decidedAt: string | null
  comments: TicketComment[]
  feltBalance: FeltBalance | null
  /** Bricks storage cannot supply now, per type (only while the ticket still has to reserve them). */
  shortfall: { brickTypeId: string; name: string; missing: number }[]
}

/** How each ticket state reads: words and an icon (never colour alone). */
export const TICKET_STATE_LOOK: Readonly<Record<TicketState, { label: string; icon: string; color: string }>> = {
  requested: { label: 'Awaiting a decision', icon: 'mdi-clock-outline', color: 'info' },
  approved: { label: 'Approved, ready to load', icon: 'mdi-check', color: 'success' },
  declined: { label: 'Declined', icon: 'mdi-close-circle-outline', color: 'error' },
  withdrawn: { label: 'Withdrawn', icon: 'mdi-undo', color: 'secondary' },
  loading: { label: 'Loading, do not operate', icon: 'mdi-weight', color: 'warning' },
  loaded: { label: 'Loaded', icon: 'mdi-check-all', color: 'success' },
}

/** Tickets that still hold their lineset: one at a time per lineset. */
export const OPEN_TICKET_STATES: readonly TicketState[] = ['requested', 'approved', 'loading']
