import { randomBytes } from 'node:crypto'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { cookieHeader, cookiesSet } from '../support/cookies.js'
import { seedVenue, type VenueFixture } from '../support/fixtures.js'
import { Client, signedIn, startTestApp, type TestApp } from '../support/test-app.js'

let app: TestApp
let venue: VenueFixture

beforeAll(async () => {
  app = await startTestApp()
  venue = await seedVenue(app.handle.context, 'alpha')
})
afterAll(() => app.stop())

const sessionCookie = (res: { headers: Record<string, unknown> }) =>
  ((res.headers['set-cookie'] as string[] | undefined) ?? []).find((c) => c.startsWith('loftledger.sid='))

const storedSessions = async () => {
  const [rows] = await app.handle.db.sequelize.query('SELECT count(*)::int AS count FROM sessions')
  return (rows as { count: number }[])[0]!.count
}

describe('GET /api/v1/session', () => {
  it('when nobody is signed in, then it answers a null user and a CSRF token, and sets no session cookie', async () => {
    const res = await new Client(app.url).get('/api/v1/session').expect(200)
    expect(res.body.user).toBeNull()
    expect(res.body.csrfToken).toMatch(/^[\w-]{40,}$/)
    expect(sessionCookie(res)).toBeUndefined()
  })

  it('when 200 anonymous requests read the session, then no session row is written', async () => {
    const before = await storedSessions()
    for (let i = 0; i < 200; i++) await request(app.url).get('/api/v1/session').expect(200)
    expect(await storedSessions()).toBe(before)
  })

  it('when one browser reads the session again (another tab), then it gets the same token', async () => {
    const client = new Client(app.url)
    const first = (await client.refreshToken()).body.csrfToken
    expect((await client.refreshToken()).body.csrfToken).toBe(first)
  })
})

describe('POST /api/v1/session', () => {
  it('when the password matches, then it signs in with a new session id and answers the member', async () => {
    const client = new Client(app.url)
    const anonymous = await client.refreshToken()
    expect(sessionCookie(anonymous)).toBeUndefined()
    const sessionsBefore = await storedSessions()
    const res = await client.signIn(venue.emails['fly-operator'])
    expect(res.status).toBe(200)
    expect(res.body.user).toEqual({
      id: expect.any(String),
      email: 'fly-operator@alpha.test',
      name: 'fly-operator of alpha',
      role: 'fly-operator',
      venueId: venue.venueId,
    })
    const after = sessionCookie(res)
    expect(after).toBeDefined()
    expect(await storedSessions()).toBe(sessionsBefore + 1)
    expect(res.body.csrfToken).not.toBe(anonymous.body.csrfToken)
    expect(after).toMatch(/HttpOnly/)
    expect(after).toMatch(/SameSite=Lax/)
    const session = await client.get('/api/v1/session').expect(200)
    expect(session.body.user.role).toBe('fly-operator')
  })

  it('when the e-mail is given in capitals, then it still signs in', async () => {
    const res = await new Client(app.url).signIn('STAGE-MANAGER@ALPHA.TEST')
    expect(res.status).toBe(200)
  })

  it('when the password is wrong, then it answers 401 with a clear message and no session', async () => {
    const client = new Client(app.url)
    const res = await client.signIn(venue.emails.administrator, 'wrong-password')
    expect(res.status).toBe(401)
    expect(res.body.error).toEqual({ code: 'bad_credentials', message: expect.stringMatching(/do not match/) })
    expect((await client.get('/api/v1/session')).body.user).toBeNull()
  })

  it('when the e-mail is unknown, then it answers the same 401', async () => {
    const res = await new Client(app.url).signIn('nobody@alpha.test')
    expect(res.status).toBe(401)
    expect(res.body.error.code).toBe('bad_credentials')
  })

  it('when the body is not valid, then it answers 400 naming the fields', async () => {
    const client = new Client(app.url)
    await client.refreshToken()
    const res = await client.post('/api/v1/session', { email: 'not-an-address' })
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields)).toEqual(['email', 'password'])
  })
})

describe('CSRF protection', () => {
  const signInBody = () => ({ email: venue.emails.administrator, password: 'correct-horse-battery' })

  it('when a sign-in lacks the X-CSRF-Token header, then it is refused with 403', async () => {
    const client = new Client(app.url)
    await client.refreshToken()
    const res = await client.agent.post('/api/v1/session').send(signInBody())
    expect(res.status).toBe(403)
    expect(res.body.error.code).toBe('csrf_failed')
  })

  it('when a sign-in carries a forged token in both the header and the cookie, then it is refused with 403', async () => {
    const forged = randomBytes(64).toString('base64url')
    const res = await request(app.url)
      .post('/api/v1/session')
      .set('Cookie', cookieHeader({ 'loftledger.csrf': forged }))
      .set('X-CSRF-Token', forged)
      .send(signInBody())
    expect(res.status).toBe(403)
    expect(res.body.error.code).toBe('csrf_failed')
  })

  it('when a sign-in carries a token without its cookie, then it is refused with 403', async () => {
    const { csrfToken } = (await request(app.url).get('/api/v1/session')).body
    const res = await request(app.url).post('/api/v1/session').set('X-CSRF-Token', csrfToken).send(signInBody())
    expect(res.status).toBe(403)
  })

  it("when the header carries another browser's token, then it is refused with 403", async () => {
    const victim = await new Client(app.url).refreshToken()
    const attacker = new Client(app.url)
    await attacker.refreshToken()
    attacker.csrfToken = victim.body.csrfToken
    const res = await attacker.signIn(venue.emails.administrator)
    expect(res.status).toBe(403)
  })

  it('when a sign-in carries the token from the session answer, then it signs in', async () => {
    const client = new Client(app.url)
    await client.refreshToken()
    expect((await client.signIn(venue.emails.administrator)).status).toBe(200)
  })

  it('when the token of one signed-in session is sent in another, even with its cookie, then it is refused with 403', async () => {
    const first = await new Client(app.url).signIn(venue.emails.administrator)
    const second = await new Client(app.url).signIn(venue.emails['technical-director'])
    const tokenOfFirst = first.body.csrfToken
    const res = await request(app.url)
      .delete(`/api/v1/linesets/${venue.linesetId}`)
      .set(
        'Cookie',
        cookieHeader({ 'loftledger.sid': cookiesSet(second)['loftledger.sid']!, 'loftledger.csrf': tokenOfFirst }),
      )
      .set('X-CSRF-Token', tokenOfFirst)
    expect(res.status).toBe(403)
    expect(res.body.error.code).toBe('csrf_failed')
  })

  it('when a token made before sign-in is sent after it, then it is refused with 403', async () => {
    const client = new Client(app.url)
    const before = (await client.refreshToken()).body.csrfToken
    await client.signIn(venue.emails.administrator)
    const res = await client.agent.delete('/api/v1/session').set('X-CSRF-Token', before)
    expect(res.status).toBe(403)
  })

  it('when a signed-in change lacks the token, then it is refused with 403 and nothing changes', async () => {
    const client = new Client(app.url)
    await client.signIn(venue.emails.administrator)
    const res = await client.agent.delete(`/api/v1/linesets/${venue.linesetId}`)
    expect(res.status).toBe(403)
    expect((await client.get(`/api/v1/linesets/${venue.linesetId}`)).status).toBe(200)
  })
})

describe('DELETE /api/v1/session', () => {
  it('when a member signs out, then the session ends, its row is gone, and the API answers 401', async () => {
    const client = new Client(app.url)
    await client.signIn(venue.emails['stage-manager'])
    const before = await storedSessions()
    await client.delete('/api/v1/session').expect(204)
    expect(await storedSessions()).toBe(before - 1)
    expect((await client.get('/api/v1/session')).body.user).toBeNull()
    const res = await client.get('/api/v1/linesets')
    expect(res.status).toBe(401)
    expect(res.body.error.code).toBe('not_signed_in')
  })
})

describe('signing out when not signed in', () => {
  it('when an anonymous browser signs out, then it answers 204 and stores nothing', async () => {
    const client = new Client(app.url)
    await client.refreshToken()
    const before = await storedSessions()
    await client.delete('/api/v1/session').expect(204)
    expect(await storedSessions()).toBe(before)
  })

  it('when a signed-in member signs out, then the sign-in answer of their next session still works', async () => {
    const client = await signedIn(app.url, venue.emails['stage-manager'])
    await client.delete('/api/v1/session').expect(204)
    await client.refreshToken()
    expect((await client.signIn(venue.emails['stage-manager'])).status).toBe(200)
  })
})
