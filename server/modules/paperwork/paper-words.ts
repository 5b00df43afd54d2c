import { displayNumber, displayQuantity } from '../../../shared/units/display.js'
import type { UnitSystem } from '../../../shared/units/systems.js'

/** A day as printed on every paper: ISO, in UTC, so no time zone moves it. */
export const printedDay = (at: Date) => at.toISOString().slice(0, 10)

/** A weight in the venue's units by the one display rule. */
export const weightWords = (value: number, system: UnitSystem) => displayQuantity(value, 'weight', system)

/**
 * How much of a capacity is used, in words: "412.5 lb of 1,000 lb (41 %)"; the share is left out without a
 * capacity.
 */
export function useOf(used: number, capacity: number | null | undefined, system: UnitSystem) {
  if (capacity === null || capacity === undefined || capacity <= 0)
    return `${weightWords(used, system)} (no capacity given)`
  const share = displayNumber((used / capacity) * 100, 0)
  return `${weightWords(used, system)} of ${weightWords(capacity, system)} (${share} %)`
}

/** An out of balance stated at the batten, with which side is heavy. */
export function balanceWords(outOfBalance: number, system: UnitSystem) {
  if (outOfBalance === 0) return 'in balance'
  const side = outOfBalance > 0 ? 'batten heavy' : 'arbor heavy'
  return `${weightWords(Math.abs(outOfBalance), system)} ${side}`
}

/** Bricks by type in one line: "26 × Full, 2 × Half"; "none" for an empty arbor. */
export const bricksWords = (bricks: ReadonlyArray<{ name: string; count: number }>) =>
  bricks.length ? bricks.map((brick) => `${brick.count} × ${brick.name}`).join(', ') : 'none'
