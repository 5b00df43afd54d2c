import { outOfBalanceAsRecorded } from '../../../shared/engine/arbor-balance.js'
import { purchaseRatio } from '../../../shared/engine/counterweight.js'
import {
  recordedDifferences,
  recordedDifferenceWords,
  type RecordedBrick,
} from '../../../shared/schemas/ticket-recorded.js'
import type { TransactionContext } from '../../context.js'
import { apiFromStored } from '../../db/quantities.js'
import { AppError } from '../../http/errors.js'
import { rows } from '../brick-stock/stock-sql.js'
import { balanceWords } from '../paperwork/paper-words.js'
import { venueUnitSystem } from '../venues/venue.service.js'

/** One brick type at completion: what the plan has the arbor hold and what was recorded, by id. */
export type RecordedCount = Omit<RecordedBrick, 'name'>

/**
 * Weighs what was recorded at the end of loading. Counts that differ from the plan are refused with 422
 * `differs_from_plan` naming the field `differsFromPlan`, each difference and the out of balance they would give,
 * unless the body confirms them; a typing slip (12 half bricks for 1) must not pass silently for a load.
 * Answers the out of balance the recorded counts give (kg at the batten, SI string; null when the plan had no
 * figure), worked out from the plan's own figure with the shared engine, as the completion form does, and the
 * differences in words for the ledger.
 */
export async function weighRecorded(
  tx: TransactionContext,
  ticketId: string,
  counts: readonly RecordedCount[],
  confirmed: boolean,
): Promise<{ outOfBalance: string | null; differences: string[] }> {
  const [ticket] = await rows<{ expected: string | null; kind: string }>(
    tx,
    `SELECT t.expected_out_of_balance AS expected, l.kind
       FROM weight_change_tickets t JOIN linesets l ON l.id = t.lineset_id WHERE t.id = $1`,
    [ticketId],
  )
  const types = await rows<{ id: string; name: string; unitWeight: string }>(
    tx,
    'SELECT id, name, unit_weight AS "unitWeight" FROM brick_types WHERE id = ANY($1::uuid[])',
    [counts.map((count) => count.brickTypeId)],
  )
  const typeOf = (id: string) => types.find((type) => type.id === id)
  const recorded = ticket!.expected
    ? outOfBalanceAsRecorded(
        purchaseRatio(ticket!.kind),
        ticket!.expected,
        counts.map((count) => ({ ...count, unitWeight: typeOf(count.brickTypeId)?.unitWeight ?? 0 })),
      ).toString()
    : null
  const differences = recordedDifferences(counts.map((c) => ({ ...c, name: typeOf(c.brickTypeId)?.name ?? '' })))
  if (differences.length && !confirmed) {
    const system = await venueUnitSystem(tx)
    const balance =
      recorded === null
        ? ''
        : ` With them the set is ${balanceWords(apiFromStored(recorded, 'weight', system)!, system)} at the batten.`
    throw new AppError(
      422,
      'differs_from_plan',
      `The counts recorded differ from the plan: ${differences.map(recordedDifferenceWords).join('; ')}.${balance} Count the arbor again; to record these counts as they are, send differsFromPlan: true`,
      { differsFromPlan: 'Confirm the counts that differ from the plan, or correct them' },
    )
  }
  return { outOfBalance: recorded, differences: differences.map(recordedDifferenceWords) }
}
