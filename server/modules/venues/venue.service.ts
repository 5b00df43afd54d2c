import type { SessionUser } from '../../../shared/schemas/session.js'
import type { Venue, VenueSettingsUpdate } from '../../../shared/schemas/venue.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import { inTransaction, type ServiceContext, type TransactionContext } from '../../context.js'
import { apiFromStored, storedFromApi } from '../../db/quantities.js'
import { notFound, staleVersion } from '../../http/errors.js'
import type { VenueModel } from './venue.model.js'

function toApi(row: VenueModel): Venue {
  const system = row.unitSystem
  return {
    id: row.id,
    name: row.name,
    unitSystem: system,
    balanceTolerance: apiFromStored(row.balanceTolerance, 'weight', system)!,
    ropeLockHolding: apiFromStored(row.ropeLockHolding, 'weight', system)!,
    wireRopeDesignFactor: Number(row.wireRopeDesignFactor),
    version: row.version,
  }
}

/** The unit system the acting member's venue enters and shows its figures in. */
export async function venueUnitSystem(ctx: ServiceContext): Promise<UnitSystem> {
  const venue = await ctx.db.models.Venue.findByPk(ctx.actor.venueId, {
    attributes: ['unitSystem'],
    transaction: ctx.transaction,
  })
  if (!venue) throw notFound('The venue')
  return venue.unitSystem
}

export async function getVenue(ctx: ServiceContext): Promise<Venue> {
  const venue = await ctx.db.models.Venue.findByPk(ctx.actor.venueId, { transaction: ctx.transaction })
  if (!venue) throw notFound('The venue')
  return toApi(venue)
}

/**
 * Saves the venue's settings if nobody changed them since `version` was read. Policies arrive in the units
 * of the system being chosen, so switching to metric with a tolerance of 5 means 5 kg. Stored figures are
 * SI, so nothing else needs rewriting. Answers from the row written.
 */
export function updateVenue(ctx: ServiceContext, body: VenueSettingsUpdate): Promise<Venue> {
  return inTransaction(ctx, async ({ db, actor, transaction }) => {
    // Locked first, as every write that carries quantities locks it (see units.ts): a switch of units and
    // such a write are taken one after the other.
    const current = await db.models.Venue.findByPk(actor.venueId, { transaction, lock: transaction.LOCK.UPDATE })
    if (!current) throw notFound('The venue')
    const [count, rows] = await db.models.Venue.update(
      {
        name: body.name,
        unitSystem: body.unitSystem,
        balanceTolerance: storedFromApi(body.balanceTolerance, 'weight', body.unitSystem)!,
        ropeLockHolding: storedFromApi(body.ropeLockHolding, 'weight', body.unitSystem)!,
        wireRopeDesignFactor: String(body.wireRopeDesignFactor),
        version: body.version + 1,
      },
      { where: { id: actor.venueId, version: body.version }, transaction, returning: true },
    )
    if (count === 0) throw staleVersion('The venue settings')
    // Figures read before a switch of units were typed in the old units: make every such edit stale (409),
    // so a 40 (ft) sent after the venue went metric is never stored as 40 m.
    if (current.unitSystem !== body.unitSystem) {
      const where = { venueId: actor.venueId }
      await db.models.Lineset.increment('version', { where, transaction })
      await db.models.BrickType.increment('version', { where, transaction })
    }
    return toApi(rows[0]!)
  })
}

/** Opens a venue; its policies are given in the units of its own system. */
export async function createVenue(
  tx: TransactionContext<SessionUser | null>,
  settings: Omit<VenueSettingsUpdate, 'version'>,
): Promise<Venue> {
  const row = await tx.db.models.Venue.create(
    {
      name: settings.name,
      unitSystem: settings.unitSystem,
      balanceTolerance: storedFromApi(settings.balanceTolerance, 'weight', settings.unitSystem)!,
      ropeLockHolding: storedFromApi(settings.ropeLockHolding, 'weight', settings.unitSystem)!,
      wireRopeDesignFactor: String(settings.wireRopeDesignFactor),
    },
    { transaction: tx.transaction },
  )
  return toApi(row)
}
