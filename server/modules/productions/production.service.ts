import type { Production, ProductionInput, ProductionUpdate } from '../../../shared/schemas/production.js'
import { inTransaction, type ServiceContext, type TransactionContext } from '../../context.js'
import { AppError, notFound, staleVersion } from '../../http/errors.js'
import type { ProductionModel } from './production.model.js'

const toApi = (row: ProductionModel): Production => ({
  id: row.id,
  version: row.version,
  name: row.name,
  firstPerformance: row.firstPerformance,
  lastPerformance: row.lastPerformance,
  state: row.state,
})

/** Every production of the venue, latest first performance first. */
export async function listProductions(ctx: ServiceContext): Promise<Production[]> {
  const rows = await ctx.db.models.Production.findAll({
    where: { venueId: ctx.actor.venueId },
    order: [
      ['firstPerformance', 'DESC'],
      ['name', 'ASC'],
    ],
    transaction: ctx.transaction,
  })
  return rows.map(toApi)
}

/** A production of this venue, or 404 (another venue's id names nothing here). */
export async function findOwnProduction(ctx: ServiceContext, id: string): Promise<Production> {
  const row = await ctx.db.models.Production.findOne({
    where: { id, venueId: ctx.actor.venueId },
    transaction: ctx.transaction,
  })
  if (!row) throw notFound('That production')
  return toApi(row)
}

async function refuseTakenName(tx: TransactionContext, name: string, exceptId?: string) {
  const clash = await tx.db.models.Production.findOne({
    where: { venueId: tx.actor.venueId, name },
    attributes: ['id'],
    transaction: tx.transaction,
  })
  if (clash && clash.id !== exceptId)
    throw new AppError(409, 'duplicate', `A production named "${name}" already exists`, { name: 'Already in use' })
}

export function createProduction(ctx: ServiceContext, body: ProductionInput): Promise<Production> {
  return inTransaction(ctx, async (tx) => {
    await refuseTakenName(tx, body.name)
    const row = await tx.db.models.Production.create(
      { ...body, venueId: tx.actor.venueId },
      { transaction: tx.transaction },
    )
    return toApi(row)
  })
}

/** Saves a production if nobody changed it since `version` was read (else 409). Answers from the row written. */
export function updateProduction(ctx: ServiceContext, id: string, body: ProductionUpdate): Promise<Production> {
  return inTransaction(ctx, async (tx) => {
    await findOwnProduction(tx, id)
    await refuseTakenName(tx, body.name, id)
    const { version, ...fields } = body
    const [count, rows] = await tx.db.models.Production.update(
      { ...fields, version: version + 1 },
      { where: { id, version, venueId: tx.actor.venueId }, transaction: tx.transaction, returning: true },
    )
    if (count === 0) throw staleVersion(`Production "${body.name}"`)
    return toApi(rows[0]!)
  })
}
