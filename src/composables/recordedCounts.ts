import { outOfBalanceAsRecorded } from '../../shared/engine/arbor-balance.js'
import { recordedDifferences, type RecordedBrick, type TicketView } from '../../shared/schemas/index.js'
import { balanceInWords, showFigure } from './balanceFigures'

/** What the completion form's counts say against the plan: the types that differ and the balance they give. */
export interface RecordedAgainstPlan {
  differences: RecordedBrick[]
  /** Signed out of balance at the batten with the counts as typed; null while a count is not a whole number. */
  balance: number | null
}

const wholeCount = (value: number | string | undefined) => {
  const count = typeof value === 'string' && value.trim() === '' ? NaN : Number(value)
  return Number.isInteger(count) && count >= 0 ? count : null
}

/**
 * Compares the counts typed in the completion form with the arbor the plan leaves, type by type, and works out
 * the out of balance they give with the shared engine, as the server does when it stores the completion.
 */
export function recordedAgainstPlan(
  ticket: Pick<TicketView, 'bricks' | 'expectedOutOfBalance' | 'purchaseRatio'>,
  counts: Readonly<Record<string, number | string>>,
): RecordedAgainstPlan {
  const typed = ticket.bricks.map((brick) => ({ brick, recorded: wholeCount(counts[brick.brickTypeId]) }))
  const differences = recordedDifferences(
    typed
      .filter((row) => row.recorded !== null)
      .map(({ brick, recorded }) => ({
        brickTypeId: brick.brickTypeId,
        name: brick.name,
        planned: brick.after,
        recorded: recorded!,
      })),
  )
  const known = typed.every((row) => row.recorded !== null && row.brick.unitWeight !== null)
  const balance =
    known && ticket.expectedOutOfBalance !== null
      ? outOfBalanceAsRecorded(
          ticket.purchaseRatio,
          ticket.expectedOutOfBalance,
          typed.map(({ brick, recorded }) => ({
            unitWeight: brick.unitWeight!,
            planned: brick.after,
            recorded: recorded!,
          })),
        ).toNumber()
      : null
  return { differences, balance }
}

/**
 * An out of balance in words with the venue's tolerance beside it.
 *
 * @example
 * balanceAgainstTolerance(-102.69, 10, 'imperial') // { words: '102.69 lb arbor heavy', beyond: true, tolerance: "beyond the venue's tolerance of 10 lb" }
 */
export function balanceAgainstTolerance(value: number, tolerance: number, units: TicketView['unitSystem']) {
  const beyond = Math.abs(value) > tolerance
  return {
    words: balanceInWords(value, units).words,
    beyond,
    tolerance: `${beyond ? 'beyond' : 'within'} the venue's tolerance of ${showFigure(tolerance, 'weight', units)}`,
  }
}
