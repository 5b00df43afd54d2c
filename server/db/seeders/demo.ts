import bcrypt from 'bcryptjs'
import { brickTypeInputSchemaFor } from '../../../shared/schemas/brick-type.js'
import { itemTypeInputSchemaFor, type ItemCategory } from '../../../shared/schemas/item-type.js'
import { productionInputSchema } from '../../../shared/schemas/production.js'
import { linesetInputSchemaFor } from '../../../shared/schemas/lineset.js'
import type { Role } from '../../../shared/schemas/role.js'
import type { SessionUser } from '../../../shared/schemas/session.js'
import type { AppContext } from '../../context.js'
import { createBrickType } from '../../modules/brick-types/brick-type.service.js'
import { createItemType } from '../../modules/item-types/item-type.service.js'
import { createLineset } from '../../modules/linesets/lineset.service.js'
import { createAccount, joinVenue, PASSWORD_HASH_ROUNDS } from '../../modules/people/accounts.js'
import { createProduction } from '../../modules/productions/production.service.js'
import { createVenue } from '../../modules/venues/venue.service.js'
import { DEMO_BRICK_TYPES, DEMO_LINESETS } from './demo-linesets.js'
import { seedDemoArbors, seedDemoLockout } from './demo-arbor-seeding.js'
import { seedDemoHangs } from './demo-hang-seeding.js'
import { DEMO_ITEM_TYPES } from './demo-item-types.js'
import { demoProduction } from './demo-production.js'
import { DEMO_PASSWORD, DEMO_PEOPLE } from './demo-people.js'

export const DEMO_VENUE_NAME = 'Fennwick Street Playhouse'

/**
 * Seeds the invented demo venue, in one transaction, when the database has no venue yet. Linesets and
 * bricks go through the services, as its administrator, so each lineset has its ledger entry like any other.
 */
export async function seedDemoIfEmpty(app: AppContext): Promise<boolean> {
  if ((await app.db.models.Venue.count()) > 0) return false
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, PASSWORD_HASH_ROUNDS)
  await app.db.sequelize.transaction(async (transaction) => {
    const setup = { ...app, actor: null, transaction }
    const venue = await createVenue(setup, {
      name: DEMO_VENUE_NAME,
      unitSystem: 'imperial',
      balanceTolerance: 10,
      ropeLockHolding: 50,
      wireRopeDesignFactor: 8,
    })
    const members = new Map<Role, SessionUser>()
    for (const person of DEMO_PEOPLE) {
      const user = await createAccount(setup, { email: person.email, name: person.name, passwordHash })
      await joinVenue(setup, { userId: user.id, venueId: venue.id, role: person.role })
      if (!members.has(person.role))
        members.set(person.role, {
          id: user.id,
          email: user.email,
          name: user.name,
          role: person.role,
          venueId: venue.id,
        })
    }
    const asAdministrator = { ...app, actor: members.get('administrator')!, transaction }
    // Demo data obeys the same contract as the forms.
    const linesets = new Map<number, string>()
    for (const lineset of DEMO_LINESETS)
      linesets.set(
        lineset.number,
        (await createLineset(asAdministrator, linesetInputSchemaFor('imperial').parse(lineset))).id,
      )
    for (const brick of DEMO_BRICK_TYPES)
      await createBrickType(asAdministrator, brickTypeInputSchemaFor('imperial').parse(brick))
    const library = new Map<string, { id: string; category: ItemCategory }>()
    for (const item of DEMO_ITEM_TYPES)
      library.set(item.name, await createItemType(asAdministrator, itemTypeInputSchemaFor('imperial').parse(item)))
    const show = await createProduction(asAdministrator, productionInputSchema.parse(demoProduction(app.clock.now())))
    const asFlyOperator = { ...app, actor: members.get('fly-operator')!, transaction }
    await seedDemoHangs(asFlyOperator, linesets, library, show.id)
    const asDirector = { ...app, actor: members.get('technical-director')!, transaction }
    await seedDemoArbors(asDirector)
    await seedDemoLockout(asDirector, linesets)
  })
  return true
}
