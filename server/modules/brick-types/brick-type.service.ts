import { Op } from 'sequelize'
import type { BrickType, BrickTypeInput, BrickTypeUpdate } from '../../../shared/schemas/brick-type.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import { inTransaction, type ServiceContext, type TransactionContext } from '../../context.js'
import { activeIn, namedListRules } from '../../db/named-list.js'
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

const list = namedListRules((db) => db.models.BrickType, {
  missing: 'That brick type',
  nameTaken: (name) => `A brick type named "${name}" already exists`,
})

/** The brick types in use, by name; retired ones are history only. */
export async function listBrickTypes(ctx: ServiceContext): Promise<BrickType[]> {
  const system = await venueUnitSystem(ctx)
  const rows = await list.listInUse(ctx, [['name', 'ASC']])
  return rows.map((row) => toApi(row, system))
}

export function createBrickType(ctx: ServiceContext, body: BrickTypeInput): Promise<BrickType> {
  return inTransaction(ctx, async (tx) => {
    const system = await unitsTypedIn(tx, body.unitSystem)
    await list.refuseTakenName(tx, body.name)
    const row = await tx.db.models.BrickType.create(
      // A new type's bricks all start in storage.
      { ...fromApi(body, system), inStorage: body.quantityOwned, venueId: tx.actor.venueId, retiredAt: null },
      { transaction: tx.transaction },
    )
    return toApi(row, system)
  })
}

/** Why a conditional update took no row: gone (404), saved by someone else (409), or fewer owned than in use. */
async function refuseFailedUpdate(tx: TransactionContext, id: string, body: BrickTypeUpdate): Promise<never> {
  const row = await tx.db.models.BrickType.findOne({
    where: { id, ...activeIn(tx.actor.venueId) },
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
    await list.refuseUnknown(tx, id)
    await list.refuseTakenName(tx, body.name, id)
    const { version, unitSystem: _typedIn, ...fields } = body
    const owned = Number(body.quantityOwned)
    const { literal } = tx.db.sequelize
    // Bricks bought or sold go into or out of storage; those on arbors or reserved stay where they are.
    const row = await list.updateAtVersion(
      tx,
      id,
      version,
      { ...fromApi(fields, system), inStorage: literal(`in_storage + (${owned} - quantity_owned)`) },
      { [Op.and]: literal(`on_arbors + reserved <= ${owned}`) },
    )
    return toApi(row ?? (await refuseFailedUpdate(tx, id, body)), system)
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
    const where = { id, ...activeIn(tx.actor.venueId) }
    try {
      // A savepoint, so a refusal leaves the outer transaction usable for the retirement.
      const deleted = await db.sequelize.transaction({ transaction }, (savepoint) =>
        db.models.BrickType.destroy({ where, transaction: savepoint }),
      )
      if (deleted === 0) throw notFound('That brick type')
    } catch (error) {
      if (!isForeignKeyViolation(error)) throw error
      await list.retire(tx, id)
    }
  })
}
