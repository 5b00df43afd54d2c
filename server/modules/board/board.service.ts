import type { Board, BoardQuery } from '../../../shared/schemas/board.js'
import type { ServiceContext, TransactionContext } from '../../context.js'
import { latestChecks, productionName } from '../pre-run-checks/pre-run-check-rows.js'
import { boardLineset } from './board-linesets.js'
import { boardRows, venueBoardPolicy } from './board-rows.js'

/**
 * The board: every lineset in service or not (or one production's, or one lineset), in number order, with its
 * operating status, what hangs, its last change and lock-out, and the venue's last pre-run check.
 * Every lineset's figures come from one statement, so they are all of one moment. The venue's policy and the
 * last check are read beside it, at once: at the database's READ COMMITTED each statement saw its own moment
 * even inside a transaction, so one bought no common view and cost two more round trips (BEGIN, COMMIT).
 */
export async function getBoard(ctx: ServiceContext, query: BoardQuery): Promise<Board> {
  // Plain reads: in the caller's transaction when there is one, else each on its own connection.
  const reader = ctx as TransactionContext
  if (query.productionId) await productionName(reader, query.productionId)
  const [policy, found, [lastCheck]] = await Promise.all([
    venueBoardPolicy(ctx),
    boardRows(ctx, query),
    latestChecks(reader, 1),
  ])
  return {
    unitSystem: policy.unitSystem,
    linesets: found.map((row) => boardLineset(row, policy.tolerance, policy.unitSystem)),
    lastCheck: lastCheck ?? null,
  }
}
