import type { Check } from '../../../shared/schemas/calculation-result.js'
import type { TransactionContext } from '../../context.js'
import { AppError } from '../../http/errors.js'
import { rows } from '../brick-stock/stock-sql.js'

/** Each finding that says stop, as its words, each ending in a full stop so they read as one paragraph. */
export function dangersOf(checks: readonly Check[] | null | undefined): string[] {
  return (checks ?? [])
    .filter((check) => check.level === 'danger')
    .map((check) => (/[.!?]$/.test(check.message.trim()) ? check.message.trim() : `${check.message.trim()}.`))
}

/**
 * Refuses to approve a ticket whose hang revision was saved with findings that say stop. No such ticket opens
 * now; this holds for one opened before that rule, or on figures that have changed since.
 */
export async function refuseDangerousHang(tx: TransactionContext, ticket: { id: string; linesetNumber: number }) {
  const [hang] = await rows<{ checks: Check[] | null }>(
    tx,
    `SELECT h.calculation_result->'checks' AS checks
       FROM weight_change_tickets t JOIN hangs h ON h.id = t.hang_id WHERE t.id = $1`,
    [ticket.id],
  )
  const stops = dangersOf(hang?.checks)
  if (stops.length)
    throw new AppError(
      409,
      'hang_has_dangers',
      `This change cannot be approved: the hang on lineset ${ticket.linesetNumber} has ${stops.length === 1 ? 'a finding that says' : `${stops.length} findings that say`} stop: ${stops.join(' ')} Decline it, and ask for a hang that balances within the ratings.`,
    )
}
