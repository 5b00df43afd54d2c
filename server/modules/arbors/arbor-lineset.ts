import { isCounterweightKind, type LinesetKind } from '../../../shared/schemas/lineset.js'
import type { TransactionContext } from '../../context.js'
import { AppError, notFound } from '../../http/errors.js'
import { rows } from '../brick-stock/stock-sql.js'

const KIND_WORDS: Record<LinesetKind, string> = {
  'counterweight-single': 'a single-purchase counterweight set',
  'counterweight-double': 'a double-purchase counterweight set',
  'hemp-single': 'a single-line hemp set',
  'hemp-multi': 'a multi-line hemp set',
  'spot-line': 'a spot line',
  motorized: 'a motorized set',
}

export interface ArborLineset {
  id: string
  number: number
  kind: LinesetKind
  arborVersion: number
}

/**
 * The acting venue's lineset whose arbor is asked for (404 otherwise), refused with 409 in words when it is
 * not a counterweight set. With `lock`, the row stays locked until the transaction ends.
 */
export async function arborLineset(tx: TransactionContext, id: string, lock = false): Promise<ArborLineset> {
  const [lineset] = await rows<ArborLineset>(
    tx,
    `SELECT id, number, kind, arbor_version AS "arborVersion" FROM linesets
      WHERE id = $1 AND venue_id = $2 AND retired_at IS NULL ${lock ? 'FOR UPDATE' : ''}`,
    [id, tx.actor.venueId],
  )
  if (!lineset) throw notFound('That lineset')
  if (!isCounterweightKind(lineset.kind))
    throw new AppError(
      409,
      'not_counterweight',
      `Lineset ${lineset.number} is ${KIND_WORDS[lineset.kind]}: it has no arbor, so it holds no bricks`,
    )
  return lineset
}
