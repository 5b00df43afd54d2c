/**
 * Rules about a batten's lift lines that the lineset and the calculation both hold, written once so the two
 * cannot disagree. They read loosely typed values: the lineset form runs them while other fields are still
 * wrong, so every problem shows at once.
 */

const isFiniteNumber = (value: unknown): value is number => typeof value === 'number' && Number.isFinite(value)

/** A problem with one pick point, by its index in the list. */
export interface PickPointProblem {
  index: number
  message: string
}

/**
 * Pick points run in order from one end of the batten, each once, and none lies beyond its length.
 *
 * @example
 * pickPointProblems([0, 20, 10], 40) // [{ index: 2, message: 'Pick points must be in order from one end: 10 comes after 20' }]
 */
export function pickPointProblems(pickPoints: readonly unknown[], length: unknown): PickPointProblem[] {
  const problems: PickPointProblem[] = []
  const batten = isFiniteNumber(length) ? length : undefined
  pickPoints.forEach((at, index) => {
    if (!isFiniteNumber(at)) return
    const previous = pickPoints[index - 1]
    if (batten !== undefined && at > batten)
      problems.push({ index, message: `Pick point at ${at} is beyond the batten's length of ${batten}` })
    else if (isFiniteNumber(previous) && at <= previous)
      problems.push({
        index,
        message:
          at === previous
            ? `Pick point at ${at} is repeated`
            : `Pick points must be in order from one end: ${at} comes after ${previous}`,
      })
  })
  return problems
}

/** What a single-line hemp set must have. */
export const SINGLE_LINE_HEMP_RULE = 'A single-line hemp set has exactly one pick point'

/**
 * True when the kind's count of lines is wrong (a single-line hemp set hangs from one line).
 *
 * @example
 * wrongLineCount('hemp-single', 2) // true
 */
export const wrongLineCount = (kind: unknown, lines: number) => kind === 'hemp-single' && lines !== 1
