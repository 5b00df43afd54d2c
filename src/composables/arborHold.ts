import { outOfBalanceAsRecorded } from '../../shared/engine/arbor-balance.js'
import type { CounterweightResult } from '../../shared/schemas/calculation-result.js'

/** One brick type on the arbor now, by name, with one brick's weight when the page knows it. */
export interface ArborNowBrick {
  name: string
  count: number
  unitWeight: number | null
}

/** One type: what the hang needs the arbor to hold in all, what it holds now, and the signed change to get there. */
export interface ArborHoldRow {
  name: string
  shouldHold: number
  holdsNow: number
  change: number
}

/**
 * "nothing to move", "add 2", "take off 1": what to do with one type, never the total.
 *
 * @example
 * changeWords(-1) // 'take off 1'
 */
export const changeWords = (change: number) =>
  change === 0 ? 'nothing to move' : change > 0 ? `add ${change}` : `take off ${-change}`

/**
 * The engine's total per type beside the arbor's count now: every type either side has (a type aboard that the
 * plan does not use comes off), in the plan's order and then the arbor's.
 */
export function arborHoldRows(plan: CounterweightResult['bricks'], now: readonly ArborNowBrick[]): ArborHoldRow[] {
  const names = [
    ...plan.filter((brick) => brick.count > 0).map((brick) => brick.name),
    ...now.filter((brick) => brick.count > 0).map((brick) => brick.name),
  ]
  return [...new Set(names)].map((name) => {
    const shouldHold = plan.find((brick) => brick.name === name)?.count ?? 0
    const holdsNow = now.find((brick) => brick.name === name)?.count ?? 0
    return { name, shouldHold, holdsNow, change: shouldHold - holdsNow }
  })
}

/**
 * "add 2 × Full, take off 1 × Half", or null when the arbor already holds the plan.
 *
 * @example
 * movesInWords([{ name: 'Full', shouldHold: 30, holdsNow: 28, change: 2 }]) // 'add 2 × Full'
 */
export function movesInWords(rows: readonly ArborHoldRow[]): string | null {
  const moves = rows.filter((row) => row.change !== 0)
  if (!moves.length) return null
  return moves.map((row) => `${changeWords(row.change).replace(/\d+$/, (n) => `${n} ×`)} ${row.name}`).join(', ')
}

/**
 * The out of balance at the batten with the arbor as it holds now, from the engine's figure for its own plan (the
 * shared arbor balance): null when a type's weight is not known here.
 */
export function balanceAsHeldNow(
  counterweight: Pick<CounterweightResult, 'ratio' | 'outOfBalance'>,
  rows: readonly ArborHoldRow[],
  now: readonly ArborNowBrick[],
): number | null {
  const weights = rows.map((row) => now.find((brick) => brick.name === row.name)?.unitWeight ?? null)
  if (weights.some((weight) => weight === null)) return null
  return outOfBalanceAsRecorded(
    counterweight.ratio === 2 ? 2 : 1,
    counterweight.outOfBalance,
    rows.map((row, index) => ({ unitWeight: weights[index]!, planned: row.shouldHold, recorded: row.holdsNow })),
  ).toNumber()
}
