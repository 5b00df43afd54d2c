import type { TransactionContext } from '../../context.js'
import type { LiveEvent } from '../../live/live-publisher.js'
import { appendLinesetEvent } from '../ledger/ledger.service.js'

/**
 * Records a change to a lineset where it happened: a ledger entry (figures in SI, like every table) and a
 * live event, both in the caller's transaction, so they land, or vanish, together with the change.
 */
export async function recordLinesetChange(
  tx: TransactionContext,
  type: Exclude<LiveEvent['type'], 'pre-run-check'>,
  linesetId: string,
  payload: Record<string, unknown> = {},
) {
  const venueId = tx.actor.venueId
  const eventId = await appendLinesetEvent(tx, { venueId, linesetId, actorId: tx.actor.id, eventType: type, payload })
  await tx.live.publish({ type, venueId, linesetId, eventId }, tx.transaction)
}
