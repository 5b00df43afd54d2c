import type { Venue, VenueSettingsUpdate } from '../../../shared/schemas/venue.js'
import type { SessionUser } from '../../../shared/schemas/session.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import type { Database } from '../../db/models.js'
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

/** The unit system a venue's figures are entered and shown in. */
export async function venueUnitSystem(db: Database, venueId: string): Promise<UnitSystem> {
  const venue = await db.models.Venue.findByPk(venueId, { attributes: ['unitSystem'] })
  if (!venue) throw notFound('The venue')
  return venue.unitSystem
}

export async function getVenue(db: Database, actor: SessionUser): Promise<Venue> {
  const venue = await db.models.Venue.findByPk(actor.venueId)
  if (!venue) throw notFound('The venue')
  return toApi(venue)
}

/**
 * Saves the venue's settings. Policies arrive in the units of the system being chosen, so switching
 * to metric with a tolerance of 5 means 5 kg. Stored figures are SI, so nothing else needs rewriting.
 */
export async function updateVenue(db: Database, actor: SessionUser, body: VenueSettingsUpdate): Promise<Venue> {
  await db.sequelize.transaction(async (transaction) => {
    const current = await db.models.Venue.findByPk(actor.venueId, { transaction, lock: transaction.LOCK.UPDATE })
    if (!current) throw notFound('The venue')
    if (current.version !== body.version) throw staleVersion('The venue settings')
    const unitsSwitched = current.unitSystem !== body.unitSystem
    await current.update(
      {
        name: body.name,
        unitSystem: body.unitSystem,
        balanceTolerance: storedFromApi(body.balanceTolerance, 'weight', body.unitSystem)!,
        ropeLockHolding: storedFromApi(body.ropeLockHolding, 'weight', body.unitSystem)!,
        wireRopeDesignFactor: String(body.wireRopeDesignFactor),
        version: body.version + 1,
      },
      { transaction },
    )
    // Figures read before a switch of units were typed in the old units: make every such edit stale (409),
    // so a 40 (ft) sent after the venue went metric is never stored as 40 m.
    if (unitsSwitched) {
      const where = { venueId: actor.venueId }
      await db.models.Lineset.increment('version', { where, transaction })
      await db.models.BrickType.increment('version', { where, transaction })
    }
  })
  return getVenue(db, actor)
}
