import type { CalculationResult } from '../../../shared/schemas/calculation.js'
import type { HangRevision, HangSave, HangSummary } from '../../../shared/schemas/hang.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import { inTransaction, type ServiceContext, type TransactionContext } from '../../context.js'
import { apiFromStored, storedFromApi } from '../../db/quantities.js'
import { AppError, notFound } from '../../http/errors.js'
import { linesetToApi } from '../linesets/lineset.mapper.js'
import { recordLinesetChange } from '../linesets/lineset-history.js'
import { unitsTypedIn } from '../venues/units.js'
import { venueUnitSystem } from '../venues/venue.service.js'
import { computeHang } from './hang-calculation.js'
import { entryFromStored, storedFromEntry } from './hang-entry.mapper.js'
import { insertRevision, latestRevision, staleRevision } from './hang-revision.js'
import { refuseUnchangedHang } from './unchanged-hang.js'
import { storedCalculationInput } from './stored-input.js'
import type { HangModel } from './hang.model.js'

/** The lineset in this venue's lists, held until the save commits so saves on one lineset take turns. */
async function lockLineset(tx: TransactionContext, id: string) {
  const row = await tx.db.models.Lineset.findOne({
    where: { id, venueId: tx.actor.venueId, retiredAt: null },
    transaction: tx.transaction,
    lock: tx.transaction.LOCK.UPDATE,
  })
  if (!row) throw notFound('That lineset')
  return row
}

async function refuseUnusableProduction(tx: TransactionContext, id: string) {
  const production = await tx.db.models.Production.findOne({
    where: { id, venueId: tx.actor.venueId },
    attributes: ['state'],
    transaction: tx.transaction,
  })
  const problem = !production
    ? 'No such production in this venue'
    : production.state === 'closed'
      ? 'That production has closed'
      : null
  if (problem) throw new AppError(400, 'validation_failed', `${problem}.`, { productionId: problem })
}

const summaryOf = (row: HangModel, system: UnitSystem): HangSummary => ({
  id: row.id,
  revision: row.revision,
  title: row.title,
  productionId: row.productionId,
  createdAt: row.createdAt.toISOString(),
  createdBy: row.creator ? { id: row.creator.id, name: row.creator.name } : null,
  totalLoad: apiFromStored(row.totalLoad, 'weight', system) ?? 0,
})

/**
 * Saves a new revision of a lineset's hang: the items are expanded and recomputed here with the shared engine
 * (whatever a client computed is not asked for), then items, engine input and result and a `hang-saved` ledger
 * entry are written in one transaction. A save based on anything but the latest revision answers 409, and so does one
 * that only repeats the latest revision (`hang_unchanged`).
 */
export function saveHang(ctx: ServiceContext, linesetId: string, body: HangSave): Promise<HangRevision> {
  return inTransaction(ctx, async (tx) => {
    const system = await unitsTypedIn(tx, body.unitSystem)
    const lineset = linesetToApi(await lockLineset(tx, linesetId), system)
    const latest = await latestRevision(tx, linesetId)
    if (body.basedOnRevision !== latest) throw staleRevision(latest)
    const productionId = body.productionId ?? null
    if (productionId) await refuseUnusableProduction(tx, productionId)
    const { input, result } = await computeHang(tx, lineset, body.items, system)
    await refuseUnchangedHang(
      tx,
      latest,
      { linesetId, title: body.title, productionId, items: body.items, input },
      system,
    )
    const revision = (latest ?? 0) + 1
    const createdAt = tx.clock.now()
    const totalLoad = storedFromApi(result.totalLoad, 'weight', system)!
    const { id } = await insertRevision(tx, {
      venueId: tx.actor.venueId,
      linesetId,
      revision,
      basedOnRevision: latest,
      productionId,
      title: body.title,
      createdBy: tx.actor.id,
      unitSystem: system,
      calculationInput: input,
      calculationResult: result,
      totalLoad,
      createdAt,
    })
    await tx.db.models.HangItem.bulkCreate(
      body.items.map((entry, position) => ({
        ...storedFromEntry(entry, system),
        venueId: tx.actor.venueId,
        hangId: id,
        position,
      })),
      { transaction: tx.transaction },
    )
    await recordLinesetChange(tx, 'hang-saved', linesetId, {
      hang: {
        id,
        revision,
        title: body.title,
        productionId,
        basedOnRevision: latest,
        items: body.items.length,
        totalLoad,
      },
    })
    return {
      id,
      linesetId,
      revision,
      title: body.title,
      productionId,
      createdAt: createdAt.toISOString(),
      createdBy: { id: tx.actor.id, name: tx.actor.name },
      totalLoad: result.totalLoad,
      unitSystem: system,
      items: body.items,
      input,
      result,
    }
  })
}

/** A lineset of this venue, retired or not: its saved hangs stay readable like its history. */
async function refuseUnknownLineset(ctx: ServiceContext, id: string) {
  const found = await ctx.db.models.Lineset.count({
    where: { id, venueId: ctx.actor.venueId },
    transaction: ctx.transaction,
  })
  if (!found) throw notFound('That lineset')
}

const withCreator = (ctx: ServiceContext) => ({ model: ctx.db.models.User, as: 'creator', attributes: ['id', 'name'] })

/** A lineset's saved revisions, newest first. */
export async function listHangs(ctx: ServiceContext, linesetId: string): Promise<HangSummary[]> {
  await refuseUnknownLineset(ctx, linesetId)
  const system = await venueUnitSystem(ctx)
  const rows = await ctx.db.models.Hang.findAll({
    where: { linesetId, venueId: ctx.actor.venueId },
    attributes: { exclude: ['calculationInput', 'calculationResult'] },
    include: [withCreator(ctx)],
    order: [['revision', 'DESC']],
    transaction: ctx.transaction,
  })
  return rows.map((row) => summaryOf(row, system))
}

/** One saved revision with its items (in the venue's units) and the engine input and result stored with it. */
export async function getHang(ctx: ServiceContext, linesetId: string, hangId: string): Promise<HangRevision> {
  const system = await venueUnitSystem(ctx)
  const row = await ctx.db.models.Hang.findOne({
    where: { id: hangId, linesetId, venueId: ctx.actor.venueId },
    include: [withCreator(ctx)],
    transaction: ctx.transaction,
  })
  if (!row) throw notFound('That hang')
  const items = await ctx.db.models.HangItem.findAll({
    where: { hangId, venueId: ctx.actor.venueId },
    order: [['position', 'ASC']],
    transaction: ctx.transaction,
  })
  return {
    ...summaryOf(row, system),
    linesetId,
    unitSystem: system,
    items: items.map((item) => entryFromStored(item, system)),
    input: storedCalculationInput(row.calculationInput, row.calculationResult?.units),
    result: row.calculationResult as unknown as CalculationResult,
  }
}
