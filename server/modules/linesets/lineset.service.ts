import { QueryTypes, type Model, type ModelStatic } from 'sequelize'
import type {
  Lineset,
  LinesetDetail,
  LinesetInput,
  LinesetListItem,
  LinesetOperating,
  LinesetUpdate,
} from '../../../shared/schemas/lineset.js'
import { inTransaction, type ServiceContext, type TransactionContext } from '../../context.js'
import { AppError, notFound, staleVersion } from '../../http/errors.js'
import { venueBoardPolicy } from '../board/board-rows.js'
import { unitsTypedIn } from '../venues/units.js'
import { venueUnitSystem } from '../venues/venue.service.js'
import { recordLinesetChange } from './lineset-history.js'
import { listedStates } from './lineset-list-states.js'
import { operatingStates } from './operating-states.js'
import { changedFields, linesetFromApi, linesetToApi, storedFromRow, type LinesetRow } from './lineset.mapper.js'
import { refuseWhileHolding } from './lineset-holdings.js'

const active = (venueId: string) => ({ venueId, retiredAt: null })

// The list's read, written once per model from its attribute map: building it through `findAll` on every call
// cost more CPU than reading the rows. The text depends only on the model's columns, which never change.
const activeLinesetsSqls = new WeakMap<ModelStatic<Model>, string>()
function activeLinesetsSql(model: ModelStatic<Model>): string {
  let sql = activeLinesetsSqls.get(model)
  if (sql === undefined) {
    const columns = Object.entries(model.getAttributes()).map(
      ([name, column]) => `"${column.field ?? name}" AS "${name}"`,
    )
    sql = `SELECT ${columns.join(', ')} FROM linesets WHERE venue_id = $1 AND retired_at IS NULL ORDER BY number`
    activeLinesetsSqls.set(model, sql)
  }
  return sql
}

// A lineset added between the two reads: nothing is known against it yet.
const UNKNOWN_STATE: LinesetOperating = { operatingStatus: 'ready', lockout: null }

/** Every lineset in service or not, in number order, with its latest saved hang; retired ones are history only. */
export async function listLinesets(ctx: ServiceContext): Promise<LinesetListItem[]> {
  // Three independent reads sent at once: the venue's units and tolerance, the linesets' own rows, and their
  // states in one statement. The answer waits for the slowest, not for the sum of their round trips.
  const venue = venueBoardPolicy(ctx)
  const [policy, rows, states] = await Promise.all([
    venue,
    ctx.db.sequelize.query<LinesetRow>(activeLinesetsSql(ctx.db.models.Lineset), {
      bind: [ctx.actor.venueId],
      type: QueryTypes.SELECT, // plain rows: the list only reads them
      transaction: ctx.transaction,
    }),
    venue.then((policy) => listedStates(ctx, policy.unitSystem, policy.tolerance)),
  ])
  // Each item is the lineset's fresh answer with its state's fields added in place: no copies per row.
  return rows.map((row) => {
    const state = states.get(row.id)
    const item = linesetToApi(row, policy.unitSystem) as LinesetListItem
    item.operatingStatus = state?.operatingStatus ?? UNKNOWN_STATE.operatingStatus
    item.lockout = state?.lockout ?? UNKNOWN_STATE.lockout
    item.currentHang = state?.currentHang ?? null
    return item
  })
}

async function findOwn(ctx: ServiceContext, id: string) {
  const row = await ctx.db.models.Lineset.findOne({
    where: { id, ...active(ctx.actor.venueId) },
    transaction: ctx.transaction,
  })
  if (!row) throw notFound('That lineset')
  return row
}

/** One lineset with its operating status and lock-out. */
export async function getLineset(ctx: ServiceContext, id: string): Promise<LinesetDetail> {
  const system = await venueUnitSystem(ctx)
  const row = await findOwn(ctx, id)
  const states = await operatingStates(ctx, id)
  return { ...linesetToApi(row, system), ...(states.get(id) ?? UNKNOWN_STATE) }
}

async function refuseTakenNumber(tx: TransactionContext, number: number, exceptId?: string) {
  const clash = await tx.db.models.Lineset.findOne({
    where: { ...active(tx.actor.venueId), number },
    attributes: ['id'],
    transaction: tx.transaction,
  })
  if (clash && clash.id !== exceptId)
    throw new AppError(409, 'duplicate', `Lineset number ${number} is already in use`, { number: 'Already in use' })
}

/** Adds a lineset and its first ledger entry. Answers from the row written. */
export function createLineset(ctx: ServiceContext, body: LinesetInput): Promise<Lineset> {
  return inTransaction(ctx, async (tx) => {
    const system = await unitsTypedIn(tx, body.unitSystem)
    await refuseTakenNumber(tx, body.number)
    const { unitSystem: _typedIn, ...fields } = body
    const row = await tx.db.models.Lineset.create(
      { ...linesetFromApi(fields, system), venueId: tx.actor.venueId, retiredAt: null },
      { transaction: tx.transaction },
    )
    await recordLinesetChange(tx, 'lineset-added', row.id, { lineset: storedFromRow(row) })
    return linesetToApi(row, system)
  })
}

/**
 * Saves a whole lineset if nobody changed it since `version` was read: the write is conditional on that
 * version, so a stale one is a 409, never an overwrite. Answers from the row written.
 */
export function updateLineset(ctx: ServiceContext, id: string, body: LinesetUpdate): Promise<Lineset> {
  return inTransaction(ctx, async (tx) => {
    const system = await unitsTypedIn(tx, body.unitSystem)
    const before = await findOwn(tx, id)
    await refuseTakenNumber(tx, body.number, id)
    if (before.kind !== body.kind) await refuseWhileHolding(tx, id, body.kind)
    const { version, unitSystem: _typedIn, ...fields } = body
    const [count, rows] = await tx.db.models.Lineset.update(
      { ...linesetFromApi(fields, system), version: version + 1 },
      { where: { id, version, ...active(tx.actor.venueId) }, transaction: tx.transaction, returning: true },
    )
    if (count === 0) {
      await findOwn(tx, id) // retired meanwhile: 404; otherwise someone saved first
      throw staleVersion(`Lineset ${body.number}`)
    }
    const after = rows[0]!
    const stored = storedFromRow(after)
    await recordLinesetChange(tx, 'lineset-changed', id, {
      lineset: stored,
      changed: changedFields(storedFromRow(before), stored),
    })
    return linesetToApi(after, system)
  })
}

/**
 * Takes a lineset out of the lists; its ledger stays. The write is conditional on the lineset still being in
 * the lists, so of any number of retirements at once exactly one takes effect and the rest answer 404.
 */
export function retireLineset(ctx: ServiceContext, id: string): Promise<void> {
  return inTransaction(ctx, async (tx) => {
    await refuseWhileHolding(tx, id)
    const [count] = await tx.db.models.Lineset.update(
      { retiredAt: tx.clock.now(), version: tx.db.sequelize.literal('version + 1') },
      { where: { id, ...active(tx.actor.venueId) }, transaction: tx.transaction },
    )
    if (count === 0) throw notFound('That lineset')
    await recordLinesetChange(tx, 'lineset-retired', id)
  })
}
