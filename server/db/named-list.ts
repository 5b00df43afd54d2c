import type { Attributes, Model, ModelStatic, Order, WhereOptions } from 'sequelize'
import type { ServiceContext, TransactionContext } from '../context.js'
import { AppError, notFound } from '../http/errors.js'
import type { Database } from './models.js'

/** Rows still in a venue's lists; retired ones are history only. */
export const activeIn = (venueId: string) => ({ venueId, retiredAt: null })

/** A row of a venue's named list: it carries a version, and a name unique among the rows in use. */
interface NamedRow {
  id: string
  name: string
  version: number
}

/** How a list speaks of its rows in refusals. */
interface ListWords {
  /** The row as a 404 names it, e.g. 'That brick type'. */
  missing: string
  /** The 409 when another row in use has the name. */
  nameTaken: (name: string) => string
}

/**
 * The rules every venue's named list keeps (brick types, item types): only this venue's rows in use are seen,
 * a name belongs to one of them, an update applies only to the version that was read, and a row is retired
 * (never deleted) where history refers to it. Each service keeps its own rules on top.
 *
 * @example
 * const list = namedListRules((db) => db.models.ItemType, { missing: 'That item type', nameTaken: (n) => `"${n}" is taken` })
 * await list.refuseTakenName(tx, body.name, id)
 */
export function namedListRules<Row extends Model & NamedRow>(
  modelOf: (db: Database) => ModelStatic<Row>,
  words: ListWords,
) {
  // The shared where-clauses name columns every such row has; Sequelize cannot see that through the generic row.
  const where = (clause: Record<string, unknown>) => clause as WhereOptions<Attributes<Row>>

  /** The venue's rows in use, in `order`. */
  function listInUse(ctx: ServiceContext, order: Order): Promise<Row[]> {
    return modelOf(ctx.db).findAll({ where: where(activeIn(ctx.actor.venueId)), order, transaction: ctx.transaction })
  }

  async function refuseTakenName(tx: TransactionContext, name: string, exceptId?: string) {
    const clash = await modelOf(tx.db).findOne({
      where: where({ ...activeIn(tx.actor.venueId), name }),
      attributes: ['id'],
      transaction: tx.transaction,
    })
    if (clash && clash.id !== exceptId)
      throw new AppError(409, 'duplicate', words.nameTaken(name), { name: 'Already in use' })
  }

  /** 404 unless the row is this venue's and in use (another venue's id names nothing here). */
  async function refuseUnknown(tx: TransactionContext, id: string) {
    const found = await modelOf(tx.db).count({
      where: where({ id, ...activeIn(tx.actor.venueId) }),
      transaction: tx.transaction,
    })
    if (!found) throw notFound(words.missing)
  }

  /**
   * Writes `values` and the next version where the row is in use and still at `version` (and `also` holds).
   * Answers the row written, or null when no row matched: the caller says why.
   */
  async function updateAtVersion(
    tx: TransactionContext,
    id: string,
    version: number,
    values: Record<string, unknown>,
    also: Record<string | symbol, unknown> = {},
  ): Promise<Row | null> {
    const [count, rows] = await modelOf(tx.db).update({ ...values, version: version + 1 } as Partial<Attributes<Row>>, {
      where: where({ id, version, ...activeIn(tx.actor.venueId), ...also }),
      transaction: tx.transaction,
      returning: true,
    })
    return count === 0 ? null : rows[0]!
  }

  /** Takes the row out of the lists; conditional on it still being in them, so of two at once one answers 404. */
  async function retire(tx: TransactionContext, id: string) {
    const [count] = await modelOf(tx.db).update(
      { retiredAt: tx.clock.now(), version: tx.db.sequelize.literal('version + 1') } as unknown as Partial<
        Attributes<Row>
      >,
      { where: where({ id, ...activeIn(tx.actor.venueId) }), transaction: tx.transaction },
    )
    if (count === 0) throw notFound(words.missing)
  }

  return { listInUse, refuseTakenName, refuseUnknown, updateAtVersion, retire }
}
