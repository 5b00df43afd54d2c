import { z } from 'zod'
import { singleLineText } from './text.js'

/** The body of `POST /api/v1/linesets/:id/lockout`: why the set must not be operated. */
export const lockoutSchema = z.object({ reason: singleLineText('Reason', 200, { required: true }) })
export type LockoutInput = z.infer<typeof lockoutSchema>

/** A lineset's lock-out as the API shows it; `null` on the lineset when it is not locked out. */
export interface Lockout {
  reason: string
  /** ISO time it was locked out. */
  at: string
  by: { id: string; name: string } | null
}
