import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { SignedTokens } from '../../server/http/signed-tokens.js'
import { seedVenue, PASSWORD, type VenueFixture } from '../support/fixtures.js'
import { Client, startTestApp, type TestApp } from '../support/test-app.js'

// One trusted proxy hop, so each request can come from an address of its own (X-Forwarded-For). A first wait
// of a minute, so that a slow machine never lets a wait run out between two requests of one test; the tests
// that need a wait over end it in the database (letTheWaitPass).
const BEHIND_A_PROXY = { TRUST_PROXY: '1', SIGN_IN_FIRST_WAIT_SECONDS: '60' }

let app: TestApp
let alpha: VenueFixture
let beta: VenueFixture
let gamma: VenueFixture

beforeAll(async () => {
  app = await startTestApp({ env: BEHIND_A_PROXY })
  alpha = await seedVenue(app.handle.context, 'alpha')
  beta = await seedVenue(app.handle.context, 'beta')
  gamma = await seedVenue(app.handle.context, 'gamma') // its accounts take the failures that fill an address
})
afterAll(() => app.stop())

/** One sign-in attempt by this browser from the given address (documentation ranges, RFC 5737). */
async function attempt(client: Client, address: string, email: string, password = PASSWORD) {
  if (!client.csrfToken) await client.refreshToken()
  const res = await client.agent
    .post('/api/v1/session')
    .set('X-CSRF-Token', client.csrfToken)
    .set('X-Forwarded-For', address)
    .send({ email, password })
  if (res.body.csrfToken) client.csrfToken = res.body.csrfToken
  return res
}

/** Ten failed sign-ins from the address, five at each of two accounts (so no account streak has to wait). */
async function fillAddress(address: string, accounts: string[]) {
  const stranger = new Client(app.url)
  for (const email of accounts)
    for (let n = 1; n <= 5; n++) expect((await attempt(stranger, address, email, 'wrong-password')).status).toBe(401)
}

/** The account's streak has waited its time out: its wait is moved into the past, as the clock would. */
async function letTheWaitPass(email: string) {
  const name = new SignedTokens(app.config.sessionSecret, 'sign-in streak').digest(email)
  await app.handle.db.sequelize.query(
    `UPDATE rate_limit_hits SET reset_at = now() - interval '1 second' WHERE key = :key`,
    { replacements: { key: `sign-in-streak:account ${name}` } },
  )
}

describe('failed sign-ins are limited per address', () => {
  it('when one address fails 10 times in a minute, then its next try answers 429, even with the right password', async () => {
    await fillAddress('198.51.100.1', [gamma.emails.administrator, gamma.emails['technical-director']])
    const blocked = await attempt(new Client(app.url), '198.51.100.1', alpha.emails.administrator)
    expect(blocked.status).toBe(429)
    expect(blocked.body.error).toMatchObject({ code: 'too_many_attempts', message: expect.stringMatching(/address/) })
    expect(blocked.headers['ratelimit-policy']).toBeDefined()
    expect((await attempt(new Client(app.url), '198.51.100.2', alpha.emails.administrator)).status).toBe(200)
  })

  it('when the counters live in PostgreSQL, then a second app process on the same database sees them', async () => {
    const other = await startTestApp({ databaseUrl: app.databaseUrl, env: BEHIND_A_PROXY })
    try {
      const res = await attempt(new Client(other.url), '198.51.100.1', alpha.emails.administrator)
      expect(res.status).toBe(429)
    } finally {
      await other.stop()
    }
  })

  it('when an address is blocked, then a browser that signed in to its account before still signs in from it', async () => {
    const member = new Client(app.url)
    expect((await attempt(member, '198.51.100.3', alpha.emails['fly-operator'])).status).toBe(200)
    await member.delete('/api/v1/session').expect(204)
    await fillAddress('198.51.100.4', [gamma.emails['fly-operator'], gamma.emails['stage-manager']])
    expect((await attempt(new Client(app.url), '198.51.100.4', alpha.emails['fly-operator'])).status).toBe(429)
    await member.refreshToken()
    expect((await attempt(member, '198.51.100.4', alpha.emails['fly-operator'])).status).toBe(200)
  })
})

describe('sign-ins are limited per account, by a growing wait rather than a lock-out', () => {
  const guessFrom = (n: number, email: string, password = 'wrong-password') =>
    attempt(new Client(app.url), `203.0.113.${n}`, email, password)

  it('when five guesses at one account come from five addresses, then the sixth must wait, even with the right password', async () => {
    const email = alpha.emails['stage-manager']
    for (let n = 1; n <= 5; n++) expect((await guessFrom(n, email)).status, `guess ${n}`).toBe(401)
    const sixth = await guessFrom(6, email, PASSWORD)
    expect(sixth.status).toBe(429)
    expect(sixth.body.error).toEqual({
      code: 'too_many_attempts',
      message: 'Too many failed sign-ins for this e-mail address; try again in 60 seconds',
    })
    expect(sixth.headers['retry-after']).toBe('60')
  })

  it('when the wait has passed, then the right password from a fresh browser at a fresh address signs in and ends the streak', async () => {
    const email = alpha.emails['stage-manager'] // the streak the previous test built
    await letTheWaitPass(email)
    expect((await guessFrom(7, email, PASSWORD)).status).toBe(200)
    for (let n = 8; n <= 12; n++) expect((await guessFrom(n, email)).status, `guess ${n}`).toBe(401)
  })

  it('when twenty guesses at one account arrive at once from twenty addresses, then only five have the password checked', async () => {
    const email = beta.emails.administrator
    const answers = await Promise.all(Array.from({ length: 20 }, (_, n) => guessFrom(100 + n, email)))
    const statuses = answers.map((res) => res.status)
    expect(statuses.filter((status) => status === 401)).toHaveLength(5)
    expect(statuses.filter((status) => status === 429)).toHaveLength(15)
  })

  it('when the waits go on, then each is twice the one before', async () => {
    const email = beta.emails['stage-manager']
    for (let n = 1; n <= 5; n++) await guessFrom(130 + n, email)
    const waits: (string | undefined)[] = []
    for (let n = 0; n < 3; n++) {
      await letTheWaitPass(email)
      expect((await guessFrom(140 + n, email)).status).toBe(401)
      waits.push((await guessFrom(150 + n, email)).headers['retry-after'])
    }
    expect(waits).toEqual(['120', '240', '480'])
  })

  it("when a stranger has made the account wait, then the person's own browser signs in at once, from a fresh address too", async () => {
    const email = beta.emails['fly-operator']
    const member = new Client(app.url)
    expect((await attempt(member, '203.0.113.160', email)).status).toBe(200)
    await member.delete('/api/v1/session').expect(204)
    for (let n = 1; n <= 6; n++) await guessFrom(160 + n, email)
    expect((await guessFrom(170, email, PASSWORD)).status).toBe(429)
    await member.refreshToken()
    expect((await attempt(member, '203.0.113.171', email)).status).toBe(200)
  })

  it("when a browser that signed in before guesses wrong, then its own streak slows it and the account's does not", async () => {
    const email = beta.emails['technical-director']
    const member = new Client(app.url)
    expect((await attempt(member, '203.0.113.180', email)).status).toBe(200)
    await member.delete('/api/v1/session').expect(204)
    await member.refreshToken()
    for (let n = 1; n <= 5; n++) expect((await attempt(member, '203.0.113.181', email, 'wrong')).status).toBe(401)
    expect((await attempt(member, '203.0.113.181', email)).status).toBe(429)
    expect((await guessFrom(182, email, PASSWORD)).status).toBe(200)
  })

  it('when the e-mail has no account, then guesses are slowed the same way, so the answer tells nothing', async () => {
    for (let n = 1; n <= 5; n++) expect((await guessFrom(190 + n, 'nobody@nowhere.test')).status).toBe(401)
    const sixth = await guessFrom(196, 'nobody@nowhere.test')
    expect(sixth.status).toBe(429)
    expect(sixth.body.error.message).toMatch(/for this e-mail address/)
  })

  it('when streaks are stored, then the rows name a digest, never the e-mail address typed', async () => {
    const [rows] = await app.handle.db.sequelize.query(`SELECT key FROM rate_limit_hits WHERE key LIKE '%@%'`)
    expect(rows).toEqual([])
  })
})
