import bcrypt from 'bcryptjs'
import type { Role } from '../../shared/schemas/role.js'
import { ROLES } from '../../shared/schemas/role.js'
import { linesetInputSchemaFor, type LinesetInput } from '../../shared/schemas/lineset.js'
import { toSI } from '../../shared/units/systems.js'
import type { Database } from '../../server/db/models.js'
import { linesetFromApi } from '../../server/modules/linesets/lineset.mapper.js'

export const PASSWORD = 'correct-horse-battery'

/** A plain single-purchase lineset body in imperial units (invented test data). */
export const sampleLineset = (number: number, overrides: Partial<LinesetInput> = {}): LinesetInput => ({
  number,
  name: `Test set ${number}`,
  kind: 'counterweight-single',
  status: 'in-service',
  distanceFromPlasterLine: 2,
  battenLength: 40,
  pipeSize: 'custom',
  pipeWeightPerLength: 2.72,
  pickPoints: [0, 10, 20, 30, 40],
  liftLineWeightPerLength: 0.11,
  liftLineBreakingStrength: 7000,
  arborEmptyWeight: 90,
  arborCapacity: 2000,
  arborStackLength: 60,
  ratedLoad: 1000,
  pipeWeight: 110,
  travel: 50,
  ...overrides,
})

export interface VenueFixture {
  venueId: string
  emails: Record<Role, string>
  linesetId: string
  brickTypeId: string
  membershipIds: Record<Role, string>
}

/** A venue with one member of each role, one lineset and one brick type. */
export async function seedVenue(
  db: Database,
  key: string,
  unitSystem: 'imperial' | 'metric' = 'imperial',
): Promise<VenueFixture> {
  const passwordHash = await bcrypt.hash(PASSWORD, 4) // low cost: test speed only
  return db.sequelize.transaction(async (transaction) => {
    const venue = await db.models.Venue.create(
      {
        name: `Venue ${key}`,
        unitSystem,
        balanceTolerance: toSI(10, 'weight', 'imperial').toString(),
        ropeLockHolding: toSI(50, 'weight', 'imperial').toString(),
        wireRopeDesignFactor: '8',
      },
      { transaction },
    )
    const emails = {} as Record<Role, string>
    const membershipIds = {} as Record<Role, string>
    for (const role of ROLES) {
      const email = `${role}@${key}.test`
      const user = await db.models.User.create({ email, name: `${role} of ${key}`, passwordHash }, { transaction })
      const membership = await db.models.Membership.create(
        { userId: user.id, venueId: venue.id, role },
        { transaction },
      )
      emails[role] = email
      membershipIds[role] = membership.id
    }
    const body = linesetInputSchemaFor(unitSystem).parse(sampleLineset(1))
    const lineset = await db.models.Lineset.create(
      { ...linesetFromApi(body, unitSystem), venueId: venue.id, retiredAt: null },
      { transaction },
    )
    const brick = await db.models.BrickType.create(
      { venueId: venue.id, name: 'Full', material: 'Steel', unitWeight: '9', thickness: '0.05', quantityOwned: 100 },
      { transaction },
    )
    return { venueId: venue.id, emails, membershipIds, linesetId: lineset.id, brickTypeId: brick.id }
  })
}
