import { Op } from 'sequelize'
import type { BrickType, BrickTypeInput, BrickTypeUpdate } from '../../../shared/schemas/brick-type.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import { inTransaction, type ServiceContext, type TransactionContext } from '../../context.js'
import { apiFromStored, storedFromApi } from '../../db/quantities.js'
import { AppError, notFound, staleVersion } from '../../http/errors.js'
import { unitsTypedIn } from '../venues/units.js'
import { venueUnitSystem } from '../venues/venue.service.js'
import type { BrickTypeModel } from './brick-type.model.js'

function toApi(row: BrickTypeModel, system: UnitSystem): BrickType {
  return {
    id: row.id,
    version: row.version,
    name: row.name,
    material: row.material,
    unitWeight: apiFromStored(row.unitWeight, 'weight', system)!,
    thickness: apiFromStored(row.thickness, 'shortLength', system)!,
    quantityOwned: row.quantityOwned,
    unitSystem: system,
  }
}

function fromApi(body: Omit<BrickTypeInput, 'unitSystem'>, system: UnitSystem) {
  return {
    name: body.name,
    material: body.material,
    unitWeight: storedFromApi(body.unitWeight, 'weight', system)!,
    thickness: storedFromApi(body.thickness, 'shortLength', system)!,
    quantityOwned: body.quantityOwned,
  }
}

const active = (venueId: string) => ({ venueId, retiredAt: null })

/** The brick types in use, by name; retired ones are history only. */
export async function listBrickTypes(ctx: ServiceContext): Promise<BrickType[]> {
  const system = await venueUnitSystem(ctx)
  const rows = await ctx.db.models.BrickType.findAll({
    where: active(ctx.actor.venueId),
    order: [['name', 'ASC']],
    transaction: ctx.transaction,
  })
  return rows.map((row) => toApi(row, system))
}

async function refuseTakenName(tx: TransactionContext, name: string, exceptId?: string) {
  const clash = await tx.db.models.BrickType.findOne({
    where: { ...active(tx.actor.venueId), name },
    attributes: ['id'],
    transaction: tx.transaction,
  })
  if (clash && clash.id !== exceptId)
    throw new AppError(409, 'duplicate', `A brick type named "${name}" already exists`, { name: 'Already in use' })
}

export function createBrickType(ctx: ServiceContext, body: BrickTypeInput): Promise<BrickType> {
  return inTransaction(ctx, async (tx) => {
    const system = await unitsTypedIn(tx, body.unitSystem)
    await refuseTakenName(tx, body.name)
    const row = await tx.db.models.BrickType.create(
      // A new type's bricks all start in storage.
      { ...fromApi(body, system), inStorage: body.quantityOwned, venueId: tx.actor.venueId, retiredAt: null },
      { transaction: tx.transaction },
    )
    return toApi(row, system)
  })
}

async function refuseUnknown(tx: TransactionContext, id: string) {
  const found = await tx.db.models.BrickType.count({
    where: { id, ...active(tx.actor.venueId) },
    transaction: tx.transaction,
  })
  if (!found) throw notFound('That brick type')
}

/** Why a conditional update took no row: gone (404), saved by someone else (409), or fewer owned than in use. */
async function refuseFailedUpdate(tx: TransactionContext, id: string, body: BrickTypeUpdate): Promise<never> {
  const row = await tx.db.models.BrickType.findOne({
    where: { id, ...active(tx.actor.venueId) },
    transaction: tx.transaction,
  })
  if (!row) throw notFound('That brick type')
  if (row.version !== body.version) throw staleVersion(`Brick type "${body.name}"`)
  const inUse = row.onArbors + row.reserved
  throw new AppError(
    409,
    'bricks_in_use',
    `"${row.name}": ${row.onArbors} are on arbors and ${row.reserved} reserved, so the house must own at least ${inUse}`,
    { quantityOwned: `At least ${inUse}: ${row.onArbors} on arbors, ${row.reserved} reserved` },
  )
}

/** Saves a brick type if nobody changed it since `version` was read (else 409). Answers from the row written. */
export function updateBrickType(ctx: ServiceContext, id: string, body: BrickTypeUpdate): Promise<BrickType> {
  return inTransaction(ctx, async (tx) => {
    const system = await unitsTypedIn(tx, body.unitSystem)
    await refuseUnknown(tx, id)
    await refuseTakenName(tx, body.name, id)
    const { version, unitSystem: _typedIn, ...fields } = body
    const owned = Number(body.quantityOwned)
    const { literal } = tx.db.sequelize
    // Bricks bought or sold go into or out of storage; those on arbors or reserved stay where they are.
    const [count, rows] = await tx.db.models.BrickType.update(
      {
        ...fromApi(fields, system),
        inStorage: literal(`in_storage + (${owned} - quantity_owned)`),
        version: version + 1,
      },
      {
        where: { id, version, ...active(tx.actor.venueId), [Op.and]: literal(`on_arbors + reserved <= ${owned}`) },
        transaction: tx.transaction,
        returning: true,
      },
    )
    if (count === 0) await refuseFailedUpdate(tx, id, body)
    return toApi(rows[0]!, system)
  })
}

const isForeignKeyViolation = (error: unknown) =>
  (error as { name?: string })?.name === 'SequelizeForeignKeyConstraintError'

/**
 * Deletes a brick type nothing refers to, and retires one that anything refers to (a lineset, a ticket:
 * every table that names a brick type references it with ON DELETE RESTRICT, so the database says which).
 * Both are conditional on the type still being in the lists: of two at once, one answers 404.
 */
export function deleteBrickType(ctx: ServiceContext, id: string): Promise<void> {
  return inTransaction(ctx, async (tx) => {
    const { db, transaction } = tx
    const where = { id, ...active(tx.actor.venueId) }
    try {
      // A savepoint, so a refusal leaves the outer transaction usable for the retirement.
      const deleted = await db.sequelize.transaction({ transaction }, (savepoint) =>
        db.models.BrickType.destroy({ where, transaction: savepoint }),
      )
      if (deleted === 0) throw notFound('That brick type')
    } catch (error) {
      if (!isForeignKeyViolation(error)) throw error
      const [retired] = await db.models.BrickType.update(
        { retiredAt: tx.clock.now(), version: db.sequelize.literal('version + 1') },
        { where, transaction },
      )
      if (retired === 0) throw notFound('That brick type')
    }
  })
}
