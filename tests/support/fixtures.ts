import bcrypt from 'bcryptjs'
import type { Role } from '../../shared/schemas/role.js'
import { ROLES } from '../../shared/schemas/role.js'
import { linesetInputSchemaFor, type LinesetInput } from '../../shared/schemas/lineset.js'
import type { SessionUser } from '../../shared/schemas/session.js'
import type { UnitSystem } from '../../shared/units/systems.js'
import type { AppContext } from '../../server/context.js'
import { createBrickType } from '../../server/modules/brick-types/brick-type.service.js'
import { createLineset } from '../../server/modules/linesets/lineset.service.js'
import { createAccount, joinVenue } from '../../server/modules/people/accounts.js'
import { createVenue } from '../../server/modules/venues/venue.service.js'

export const PASSWORD = 'correct-horse-battery'

/** A plain single-purchase lineset body typed in imperial units (invented test data). */
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
  unitSystem: 'imperial',
  ...overrides,
})

/** A brick type body in imperial units (invented test data). */
export const sampleBrickType = (name: string, overrides: Record<string, unknown> = {}) => ({
  name,
  material: 'Steel',
  unitWeight: 20,
  thickness: 2,
  quantityOwned: 5,
  unitSystem: 'imperial' as const,
  ...overrides,
})

export interface VenueFixture {
  venueId: string
  emails: Record<Role, string>
  members: Record<Role, SessionUser>
  linesetId: string
  brickTypeId: string
  membershipIds: Record<Role, string>
}

// The same policies in either system: 10 lb and 50 lb (NIST SP 811: 1 lb = 0.45359237 kg).
const POLICIES: Record<UnitSystem, { balanceTolerance: number; ropeLockHolding: number }> = {
  imperial: { balanceTolerance: 10, ropeLockHolding: 50 },
  metric: { balanceTolerance: 4.5359237, ropeLockHolding: 22.6796185 },
}

/**
 * A venue with one member of each role, one lineset (the sample's figures read in the venue's units) and
 * one brick type, made through the services as its administrator, so the ledger holds what it would.
 */
export async function seedVenue(
  app: AppContext,
  key: string,
  unitSystem: UnitSystem = 'imperial',
): Promise<VenueFixture> {
  const passwordHash = await bcrypt.hash(PASSWORD, 4) // low cost: test speed only
  return app.db.sequelize.transaction(async (transaction) => {
    const setup = { ...app, actor: null, transaction }
    const venue = await createVenue(setup, {
      name: `Venue ${key}`,
      unitSystem,
      wireRopeDesignFactor: 8,
      ...POLICIES[unitSystem],
    })
    const emails = {} as Record<Role, string>
    const members = {} as Record<Role, SessionUser>
    const membershipIds = {} as Record<Role, string>
    for (const role of ROLES) {
      const email = `${role}@${key}.test`
      const user = await createAccount(setup, { email, name: `${role} of ${key}`, passwordHash })
      const membership = await joinVenue(setup, { userId: user.id, venueId: venue.id, role })
      emails[role] = email
      members[role] = { id: user.id, email, name: user.name, role, venueId: venue.id }
      membershipIds[role] = membership.id
    }
    const asAdministrator = { ...app, actor: members.administrator, transaction }
    const lineset = await createLineset(
      asAdministrator,
      linesetInputSchemaFor(unitSystem).parse({ ...sampleLineset(1), unitSystem }),
    )
    const brick = await createBrickType(asAdministrator, {
      name: 'Full',
      material: 'Steel',
      ...(unitSystem === 'imperial' ? { unitWeight: 20, thickness: 2 } : { unitWeight: 9, thickness: 50 }),
      quantityOwned: 100,
      unitSystem,
    })
    return { venueId: venue.id, emails, members, membershipIds, linesetId: lineset.id, brickTypeId: brick.id }
  })
}
