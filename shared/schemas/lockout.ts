import { z } from 'zod'
import { singleLineText } from './text.js'

/** The body of `POST /api/v1/linesets/:id/lockout`: why the set must not be operated. */
export const lockoutSchema = z.object({ reason: singleLineText('Reason', 200, { required: true }) })
export type LockoutInput = z.infer<typeof lockoutSchema>

// A release sent with no body at all (as before a reason was asked for) reads as an empty one, so the answer
// names the missing field rather than the whole body.
/**
 * The body of `DELETE /api/v1/linesets/:id/lockout`: what was checked or fixed before the set may be operated
 * again. Required, like the lock's own reason, so the ledger says why the set came back into use.
 */
export const lockoutReleaseSchema = z
  .object({ reason: singleLineText('What was checked or fixed', 200, { required: true }) })
  .prefault({ reason: '' })
export type LockoutReleaseInput = z.infer<typeof lockoutReleaseSchema>

/** A lineset's lock-out as the API shows it; `null` on the lineset when it is not locked out. */
export interface Lockout {
  reason: string
  /** ISO time it was locked out. */
  at: string
  by: { id: string; name: string } | null
}
