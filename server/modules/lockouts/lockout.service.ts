import type { Lockout, LockoutInput, LockoutReleaseInput } from '../../../shared/schemas/lockout.js'
import { inTransaction, type ServiceContext, type TransactionContext } from '../../context.js'
import { AppError, notFound } from '../../http/errors.js'
import { rows } from '../brick-stock/stock-sql.js'
import { recordLinesetChange } from '../linesets/lineset-history.js'

async function refuseWhy(tx: TransactionContext, id: string, wanted: 'locked' | 'released'): Promise<never> {
  const [lineset] = await rows<{ number: number; reason: string | null }>(
    tx,
    'SELECT number, lockout_reason AS reason FROM linesets WHERE id = $1 AND venue_id = $2 AND retired_at IS NULL',
    [id, tx.actor.venueId],
  )
  if (!lineset) throw notFound('That lineset')
  if (wanted === 'locked')
    throw new AppError(409, 'already_locked_out', `Lineset ${lineset.number} is already locked out: ${lineset.reason}`)
  throw new AppError(409, 'not_locked_out', `Lineset ${lineset.number} is not locked out`)
}

/**
 * Locks a lineset out with a reason, only if it is not locked out already (409 otherwise: of two at once,
 * one takes effect). The lineset's own figures and version are untouched.
 */
export function lockOut(ctx: ServiceContext, id: string, body: LockoutInput): Promise<Lockout> {
  return inTransaction(ctx, async (tx) => {
    const at = tx.clock.now()
    const locked = await rows(
      tx,
      `UPDATE linesets SET lockout_reason = $3, locked_out_at = $4, locked_out_by = $5
        WHERE id = $1 AND venue_id = $2 AND retired_at IS NULL AND locked_out_at IS NULL RETURNING id`,
      [id, tx.actor.venueId, body.reason, at, tx.actor.id],
    )
    if (!locked.length) await refuseWhy(tx, id, 'locked')
    await recordLinesetChange(tx, 'lineset-locked-out', id, { reason: body.reason })
    return { reason: body.reason, at: at.toISOString(), by: { id: tx.actor.id, name: tx.actor.name } }
  })
}

/**
 * Releases a lock-out, only if the lineset is locked out (409 otherwise); the ledger keeps why it was locked out
 * (`reason`) and what was checked or fixed before release (`releaseReason`).
 */
export function releaseLockout(ctx: ServiceContext, id: string, body: LockoutReleaseInput): Promise<void> {
  return inTransaction(ctx, async (tx) => {
    const released = await rows<{ reason: string }>(
      tx,
      `UPDATE linesets SET lockout_reason = NULL, locked_out_at = NULL, locked_out_by = NULL
        FROM (SELECT id, lockout_reason FROM linesets WHERE id = $1 FOR UPDATE) was
        WHERE linesets.id = was.id AND venue_id = $2 AND retired_at IS NULL AND locked_out_at IS NOT NULL
        RETURNING was.lockout_reason AS reason`,
      [id, tx.actor.venueId],
    )
    if (!released.length) await refuseWhy(tx, id, 'released')
    await recordLinesetChange(tx, 'lineset-released', id, {
      reason: released[0]!.reason,
      releaseReason: body.reason,
    })
  })
}
