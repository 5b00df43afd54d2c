import type { LibraryWeights } from '../../../shared/hang/hang-items.js'
import type { ItemType, ItemTypeInput, ItemTypeUpdate } from '../../../shared/schemas/item-type.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import { inTransaction, type ServiceContext, type TransactionContext } from '../../context.js'
import { activeIn, namedListRules } from '../../db/named-list.js'
import { apiFromStored, storedFromApi } from '../../db/quantities.js'
import { staleVersion } from '../../http/errors.js'
import { unitsTypedIn } from '../venues/units.js'
import { venueUnitSystem } from '../venues/venue.service.js'
import type { ItemTypeModel } from './item-type.model.js'

function toApi(row: ItemTypeModel, system: UnitSystem): ItemType {
  return {
    id: row.id,
    version: row.version,
    name: row.name,
    category: row.category,
    unitWeight: apiFromStored(row.unitWeight, 'weight', system)!,
    allowancePerUnit: apiFromStored(row.allowancePerUnit, 'weight', system)!,
    notes: row.notes,
    unitSystem: system,
  }
}

function fromApi(body: Omit<ItemTypeInput, 'unitSystem'>, system: UnitSystem) {
  return {
    name: body.name,
    category: body.category,
    unitWeight: storedFromApi(body.unitWeight, 'weight', system)!,
    allowancePerUnit: storedFromApi(body.allowancePerUnit, 'weight', system)!,
    notes: body.notes ?? '',
  }
}

const list = namedListRules((db) => db.models.ItemType, {
  missing: 'That item type',
  nameTaken: (name) => `The library already has an item named "${name}"`,
})

/** The library as it stands, by category and name; retired types are history only. */
export async function listItemTypes(ctx: ServiceContext): Promise<ItemType[]> {
  const system = await venueUnitSystem(ctx)
  const rows = await list.listInUse(ctx, [
    ['category', 'ASC'],
    ['name', 'ASC'],
  ])
  return rows.map((row) => toApi(row, system))
}

/**
 * The weights of the library types named, in `system`, for expanding hang entries. Only this venue's types
 * in the library count: another venue's id, or a retired one, is simply absent.
 */
export async function libraryWeights(
  tx: TransactionContext,
  ids: readonly string[],
  system: UnitSystem,
): Promise<Map<string, LibraryWeights>> {
  if (ids.length === 0) return new Map()
  const rows = await tx.db.models.ItemType.findAll({
    where: { ...activeIn(tx.actor.venueId), id: [...new Set(ids)] },
    transaction: tx.transaction,
    lock: tx.transaction.LOCK.SHARE, // a change of weight waits for the hang that used the old one
  })
  return new Map(rows.map((row) => [row.id, toApi(row, system)]))
}

export function createItemType(ctx: ServiceContext, body: ItemTypeInput): Promise<ItemType> {
  return inTransaction(ctx, async (tx) => {
    const system = await unitsTypedIn(tx, body.unitSystem)
    await list.refuseTakenName(tx, body.name)
    const row = await tx.db.models.ItemType.create(
      { ...fromApi(body, system), venueId: tx.actor.venueId, retiredAt: null },
      { transaction: tx.transaction },
    )
    return toApi(row, system)
  })
}

/** Saves an item type if nobody changed it since `version` was read (else 409). Answers from the row written. */
export function updateItemType(ctx: ServiceContext, id: string, body: ItemTypeUpdate): Promise<ItemType> {
  return inTransaction(ctx, async (tx) => {
    const system = await unitsTypedIn(tx, body.unitSystem)
    await list.refuseUnknown(tx, id)
    await list.refuseTakenName(tx, body.name, id)
    const { version, unitSystem: _typedIn, ...fields } = body
    const row = await list.updateAtVersion(tx, id, version, fromApi(fields, system))
    if (!row) {
      await list.refuseUnknown(tx, id) // retired meanwhile: 404; otherwise someone saved first
      throw staleVersion(`Item type "${body.name}"`)
    }
    return toApi(row, system)
  })
}

/**
 * Takes an item type out of the library. Saved hangs keep what it weighed when they were saved, so it is
 * retired, never deleted; conditional on it still being in the library, so of two at once one answers 404.
 */
export function retireItemType(ctx: ServiceContext, id: string): Promise<void> {
  return inTransaction(ctx, (tx) => list.retire(tx, id))
}
