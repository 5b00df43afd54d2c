/** One brick type as recorded at the end of loading, beside what the plan has the arbor hold. */
export interface RecordedBrick {
  brickTypeId: string
  name: string
  planned: number
  recorded: number
}

/**
 * The brick types whose recorded count is not the plan's, in the order given: the server refuses them without
 * an explicit `differsFromPlan`, and the completion form warns of them before sending.
 *
 * @example
 * recordedDifferences([{ brickTypeId: 'h', name: 'Half', planned: 1, recorded: 12 }]).length // 1
 */
export function recordedDifferences(bricks: readonly RecordedBrick[]): RecordedBrick[] {
  return bricks.filter((brick) => brick.recorded !== brick.planned)
}

/**
 * One difference in plain words, the same on both sides.
 *
 * @example
 * recordedDifferenceWords({ brickTypeId: 'h', name: 'Half', planned: 1, recorded: 12 }) // '12 × Half recorded, the plan was 1'
 */
export function recordedDifferenceWords(brick: RecordedBrick): string {
  return `${brick.recorded} × ${brick.name} recorded, the plan was ${brick.planned}`
}
