import { z } from 'zod'

/** The most ledger entries one page of a lineset's history holds. */
export const LINESET_EVENTS_PAGE_MAX = 100

/** `GET /api/v1/linesets/:id/events?limit=&before=`: newest first, `before` the `next` of the previous page. */
export const linesetEventsQuerySchema = z.object({
  limit: z.coerce
    .number({ error: 'Limit must be a number' })
    .int('Limit must be a whole number')
    .min(1, 'Limit must be 1 or more')
    .max(LINESET_EVENTS_PAGE_MAX, `Limit must be ${LINESET_EVENTS_PAGE_MAX} or less`)
    .default(20),
  before: z
    .string()
    .regex(/^[1-9]\d{0,17}$/, 'Before must be the "next" value of a previous page')
    .optional(),
})
export type LinesetEventsQuery = z.infer<typeof linesetEventsQuerySchema>

/** One entry of a lineset's history as the API shows it. */
export interface LinesetEventView {
  id: string
  type: string
  occurredAt: string
  /** Who made the change; null for changes nobody signed in made. */
  actor: { id: string; name: string } | null
  /** What happened, in plain words. */
  summary: string
  /** The entry's details, every figure in the venue's current units. */
  payload: Record<string, unknown>
}

/** A page of history; `next` is the `before` of the following page, null on the last one. */
export interface LinesetEventsPage {
  events: LinesetEventView[]
  next: string | null
}
