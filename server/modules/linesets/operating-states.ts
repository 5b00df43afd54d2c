import { arborWeight, outOfBalanceAtBatten } from '../../../shared/engine/arbor-balance.js'
import { purchaseRatio } from '../../../shared/engine/counterweight.js'
import { isCounterweightKind, type LinesetOperating } from '../../../shared/schemas/lineset.js'
import { operatingStatus } from '../../../shared/schemas/operating-status-rule.js'
import { inTransaction, type ServiceContext } from '../../context.js'
import { storedFromApi } from '../../db/quantities.js'
import { operatingFacts } from './operating-facts.js'

/**
 * Each lineset's operating status and lock-out, by id, for the acting venue (or one lineset of it). Figures
 * are compared in SI: the current hang's batten side against the arbor as counted, at the venue's tolerance.
 */
export function operatingStates(ctx: ServiceContext, linesetId?: string): Promise<Map<string, LinesetOperating>> {
  return inTransaction(ctx, async (tx) => {
    const facts = await operatingFacts(tx, linesetId)
    const states = new Map<string, LinesetOperating>()
    for (const lineset of facts.linesets) {
      const battenSide = facts.battenSides.get(lineset.id)
      const outOfBalance =
        isCounterweightKind(lineset.kind) && battenSide && lineset.arborEmptyWeight !== null
          ? outOfBalanceAtBatten(
              purchaseRatio(lineset.kind),
              storedFromApi(battenSide.value, 'weight', battenSide.units)!,
              arborWeight({
                emptyWeight: lineset.arborEmptyWeight,
                pipeWeightAboard: lineset.pipeWeight,
                bricks: facts.arbors.get(lineset.id) ?? [],
              }),
            )
          : null
      states.set(lineset.id, {
        operatingStatus: operatingStatus({
          status: lineset.status,
          lockedOut: lineset.lockedOutAt !== null,
          openTicket: facts.openTickets.get(lineset.id) ?? null,
          hangSaysStop: facts.hangsSayingStop.has(lineset.id),
          feltBalance: lineset.feltBalance,
          outOfBalance,
          tolerance: facts.tolerance,
        }),
        lockout:
          lineset.lockedOutAt === null
            ? null
            : {
                reason: lineset.lockoutReason!,
                at: lineset.lockedOutAt.toISOString(),
                by: lineset.lockedOutBy ? { id: lineset.lockedOutBy, name: lineset.lockedOutByName ?? '' } : null,
              },
      })
    }
    return states
  })
}
