import type { UnitSystem } from '../../../shared/units/systems.js'
import type { TransactionContext } from '../../context.js'
import { AppError, notFound } from '../../http/errors.js'

/**
 * The one check every write carrying quantities makes: the figures were typed in the venue's current unit
 * system. It holds the venue row (FOR SHARE) until the caller's transaction ends, so a switch of units
 * cannot slip in between this check and the write.
 *
 * @returns the venue's unit system, for converting the figures to SI.
 * @throws AppError 409 `units_changed` when they were typed in another system.
 */
export async function unitsTypedIn(tx: TransactionContext, typedIn: UnitSystem): Promise<UnitSystem> {
  const venue = await tx.db.models.Venue.findByPk(tx.actor.venueId, {
    attributes: ['unitSystem'],
    transaction: tx.transaction,
    lock: tx.transaction.LOCK.SHARE,
  })
  if (!venue) throw notFound('The venue')
  if (venue.unitSystem !== typedIn)
    throw new AppError(
      409,
      'units_changed',
      `This venue now works in ${venue.unitSystem} units, but these figures were typed in ${typedIn} units. ` +
        'Nothing was saved: reload the page and enter them again.',
    )
  return venue.unitSystem
}
