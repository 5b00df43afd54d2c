import bcrypt from 'bcryptjs'
import type { SessionUser } from '../../../shared/schemas/session.js'
import type { VenueOpening } from '../../../shared/schemas/venue-opening.js'
import { toSI, fromSI } from '../../../shared/units/systems.js'
import { inTransaction, type ServiceContext } from '../../context.js'
import { AppError } from '../../http/errors.js'
import { createAccount, hashPassword, joinVenue } from '../people/accounts.js'
import { createVenue } from './venue.service.js'

// Starting policies a technical director then sets: 10 lb of tolerance, the often-quoted 50 lb a rope lock
// holds, and the 8:1 design factor commonly used for wire-rope lift lines (common practice; TRADE.md).
const STARTING_TOLERANCE_LB = 10
const STARTING_ROPE_LOCK_LB = 50
const STARTING_DESIGN_FACTOR = 8

const inVenueUnits = (pounds: number, system: VenueOpening['unitSystem']) =>
  Number(fromSI(toSI(pounds, 'weight', 'imperial'), 'weight', system).toDecimalPlaces(2))

/**
 * Opens a venue with its first administrator, in one transaction. An address that already has an account
 * joins only with that account's own password (its owner's consent); a new address gets an account.
 *
 * @returns the administrator, as they will sign in
 */
export function openVenue(ctx: ServiceContext<null>, opening: VenueOpening): Promise<SessionUser> {
  return inTransaction(ctx, async (tx) => {
    const venue = await createVenue(tx, {
      name: opening.venueName,
      unitSystem: opening.unitSystem,
      balanceTolerance: inVenueUnits(STARTING_TOLERANCE_LB, opening.unitSystem),
      ropeLockHolding: inVenueUnits(STARTING_ROPE_LOCK_LB, opening.unitSystem),
      wireRopeDesignFactor: STARTING_DESIGN_FACTOR,
    })
    let account = await tx.db.models.User.findOne({ where: { email: opening.email }, transaction: tx.transaction })
    if (account && !(await bcrypt.compare(opening.password, account.passwordHash)))
      throw new AppError(409, 'account_password_required', 'That address has an account: give its own password', {
        password: 'Not the password of the existing account',
      })
    account ??= await createAccount(tx, {
      email: opening.email,
      name: opening.name,
      passwordHash: await hashPassword(opening.password),
    })
    await joinVenue(tx, { userId: account.id, venueId: venue.id, role: 'administrator' })
    return { id: account.id, email: account.email, name: account.name, role: 'administrator', venueId: venue.id }
  })
}
