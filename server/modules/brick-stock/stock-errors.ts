import { AppError } from '../../http/errors.js'

/** One brick type in a move, named by the request field it came from (when it came from one). */
export interface BrickMove {
  brickTypeId: string
  count: number
  /** The request field to name in a refusal, e.g. `bricks.2.count`; else the brick type's id. */
  field?: string
}

const plural = (n: number, what: string) => `${n} ${what}${n === 1 ? '' : 's'}`

/** 409: the bricks are not where the move needs them; says which type and how many are missing. */
export function shortOf(
  move: BrickMove,
  name: string,
  where: 'in storage' | 'on the arbor' | 'reserved',
  held: number,
) {
  const missing = move.count - held
  const message = `Not enough "${name}" ${where}: ${plural(move.count, 'brick')} needed, ${held} there, ${missing} missing`
  return new AppError(409, 'not_enough_bricks', message, { [move.field ?? move.brickTypeId]: message })
}

/** 400: a brick type the venue does not have (or has retired, when bricks would be added). */
export function unknownBrickType(move: BrickMove, retired = false) {
  const message = retired ? 'This brick type is retired; no bricks of it can be added' : 'No such brick type here'
  const field = move.field ? move.field.replace(/count$/, 'brickTypeId') : 'brickTypeId'
  return new AppError(400, 'validation_failed', `${message}.`, { [field]: message })
}
