import type { Board, BoardQuery } from '../../../shared/schemas/board.js'
import { inTransaction, type ServiceContext } from '../../context.js'
import { latestChecks, productionName } from '../pre-run-checks/pre-run-check-rows.js'
import { boardLineset } from './board-linesets.js'
import { boardRows, venueBoardPolicy } from './board-rows.js'

/**
 * The board: every lineset in service or not (or one production's, or one lineset), in number order, with its
 * operating status, what hangs, its last change and lock-out, and the venue's last pre-run check. Three
 * statements in one transaction, so every figure is of the same moment.
 */
export function getBoard(ctx: ServiceContext, query: BoardQuery): Promise<Board> {
  return inTransaction(ctx, async (tx) => {
    if (query.productionId) await productionName(tx, query.productionId)
    const policy = await venueBoardPolicy(tx)
    const found = await boardRows(tx, query)
    const [lastCheck] = await latestChecks(tx, 1)
    return {
      unitSystem: policy.unitSystem,
      linesets: found.map((row) => boardLineset(row, policy.tolerance, policy.unitSystem)),
      lastCheck: lastCheck ?? null,
    }
  })
}
