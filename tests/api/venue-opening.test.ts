import { spawnSync } from 'node:child_process'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { projectRoot } from '../../scripts/lib/paths.js'
import { venueOpeningSchema } from '../../shared/schemas/venue-opening.js'
import { openVenue } from '../../server/modules/venues/venue-opening.service.js'
import { seedVenue, PASSWORD, type VenueFixture } from '../support/fixtures.js'
import { signedIn, startTestApp, type TestApp } from '../support/test-app.js'

let app: TestApp
let alpha: VenueFixture

beforeAll(async () => {
  app = await startTestApp()
  alpha = await seedVenue(app.handle.context, 'alpha')
})
afterAll(() => app.stop())

const opening = (overrides: Record<string, unknown> = {}) =>
  venueOpeningSchema.parse({
    venueName: 'Quayside Hall',
    unitSystem: 'metric',
    email: 'first.admin@quayside.test',
    name: 'First Admin',
    password: 'a-winch-that-holds-fast',
    ...overrides,
  })

describe('opening a venue from the command line', () => {
  it('when a venue is opened with a new address, then its administrator signs in to it with metric starting policies', async () => {
    await openVenue({ ...app.handle.context, actor: null }, opening())
    const admin = await signedIn(app.url, 'first.admin@quayside.test', 'a-winch-that-holds-fast')
    const venue = (await admin.get('/api/v1/venue').expect(200)).body
    // 10 lb and 50 lb in kg (NIST SP 811: 1 lb = 0.45359237 kg), rounded to 0.01; 8:1 is common practice.
    expect(venue).toMatchObject({
      name: 'Quayside Hall',
      unitSystem: 'metric',
      balanceTolerance: 4.54,
      ropeLockHolding: 22.68,
    })
    expect(venue.wireRopeDesignFactor).toBe(8)
    expect((await admin.get('/api/v1/people').expect(200)).body).toHaveLength(1)
  })

  it("when the address already has an account, then it joins only with that account's own password", async () => {
    const email = alpha.emails['technical-director']
    const refused = openVenue(
      { ...app.handle.context, actor: null },
      opening({ venueName: 'Other Hall', email, password: 'not-their-password-at-all' }),
    )
    await expect(refused).rejects.toMatchObject({ status: 409, code: 'account_password_required' })
    expect(await app.handle.db.models.Venue.count({ where: { name: 'Other Hall' } })).toBe(0)
    await openVenue(
      { ...app.handle.context, actor: null },
      opening({ venueName: 'Other Hall', email, password: PASSWORD }),
    )
    expect(
      await app.handle.db.models.Membership.count({
        where: { userId: (await app.handle.db.models.User.findOne({ where: { email } }))!.id },
      }),
    ).toBe(2)
  })

  it('when `npm run venue:open` is run against the database, then the administrator can sign in; a bad password exits 2 naming the field', async () => {
    const run = (password: string) =>
      spawnSync(
        process.execPath,
        [
          '--import',
          'tsx',
          'scripts/open-venue.ts',
          '--venue',
          'Cli Hall',
          '--email',
          'cli@cli.test',
          '--name',
          'Cli Admin',
        ],
        {
          cwd: projectRoot,
          encoding: 'utf8',
          input: `${password}\n`,
          env: {
            ...process.env,
            DATABASE_URL: app.databaseUrl,
            SESSION_SECRET: app.config.sessionSecret,
            LOFTLEDGER_ADMIN_PASSWORD: '',
          },
        },
      )
    const refused = run('short')
    expect(refused.status).toBe(2)
    expect(refused.stderr).toContain('"password"')
    const opened = run('a-grid-iron-of-our-own')
    expect(opened.status, opened.stderr).toBe(0)
    expect(opened.stdout).toContain('opened "Cli Hall"')
    await signedIn(app.url, 'cli@cli.test', 'a-grid-iron-of-our-own')
  })

  it('when the password breaks the rule, then the opening is refused on the password field', () => {
    const parsed = venueOpeningSchema.safeParse({
      venueName: 'X',
      unitSystem: 'imperial',
      email: 'a@b.test',
      name: 'A',
      password: 'short',
    })
    expect(parsed.error?.issues.map((issue) => issue.path.join('.'))).toEqual(['password'])
  })
})
