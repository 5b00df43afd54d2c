import bcrypt from 'bcryptjs'
import { linesetInputSchemaFor } from '../../../shared/schemas/lineset.js'
import { toSI } from '../../../shared/units/systems.js'
import { linesetFromApi } from '../../modules/linesets/lineset.mapper.js'
import type { Database } from '../models.js'
import { DEMO_BRICK_TYPES, DEMO_LINESETS } from './demo-linesets.js'
import { DEMO_PASSWORD, DEMO_PEOPLE } from './demo-people.js'

export const DEMO_VENUE_NAME = 'Fennwick Street Playhouse'

/** Seeds the invented demo venue, in one transaction, when the database has no venue yet. */
export async function seedDemoIfEmpty(db: Database): Promise<boolean> {
  if ((await db.models.Venue.count()) > 0) return false
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, 12)
  await db.sequelize.transaction(async (transaction) => {
    const venue = await db.models.Venue.create(
      {
        name: DEMO_VENUE_NAME,
        unitSystem: 'imperial',
        balanceTolerance: toSI(10, 'weight', 'imperial').toString(),
        ropeLockHolding: toSI(50, 'weight', 'imperial').toString(),
        wireRopeDesignFactor: '8',
      },
      { transaction },
    )
    for (const person of DEMO_PEOPLE) {
      const user = await db.models.User.create(
        { email: person.email, name: person.name, passwordHash },
        { transaction },
      )
      await db.models.Membership.create({ userId: user.id, venueId: venue.id, role: person.role }, { transaction })
    }
    for (const lineset of DEMO_LINESETS) {
      const valid = linesetInputSchemaFor('imperial').parse(lineset) // demo data obeys the same contract as the form
      await db.models.Lineset.create(
        { ...linesetFromApi(valid, 'imperial'), venueId: venue.id, retiredAt: null },
        { transaction },
      )
    }
    for (const brick of DEMO_BRICK_TYPES) {
      await db.models.BrickType.create(
        {
          ...brick,
          venueId: venue.id,
          unitWeight: toSI(brick.unitWeight, 'weight', 'imperial').toString(),
          thickness: toSI(brick.thickness, 'shortLength', 'imperial').toString(),
        },
        { transaction },
      )
    }
  })
  return true
}
