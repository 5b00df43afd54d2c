import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { seedVenue, type VenueFixture } from '../support/fixtures.js'
import { Client, startTestApp, type TestApp } from '../support/test-app.js'

let app: TestApp
let venue: VenueFixture

beforeAll(async () => {
  app = await startTestApp()
  venue = await seedVenue(app.handle.context, 'alpha')
})
afterAll(() => app.stop())

const sessionCookie = (res: { headers: Record<string, unknown> }) =>
  ((res.headers['set-cookie'] as string[] | undefined) ?? []).find((c) => c.startsWith('loftledger.sid='))

describe('GET /api/v1/session', () => {
  it('when nobody is signed in, then it answers a null user and a CSRF token', async () => {
    const res = await new Client(app.url).get('/api/v1/session').expect(200)
    expect(res.body.user).toBeNull()
    expect(res.body.csrfToken).toMatch(/^[\w-]{40,}$/)
  })
})

describe('POST /api/v1/session', () => {
  it('when the password matches, then it signs in with a new session id and answers the member', async () => {
    const client = new Client(app.url)
    const before = sessionCookie(await client.refreshToken())
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
    expect(after!.split(';')[0]).not.toBe(before!.split(';')[0])
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
  it('when a sign-in lacks the X-CSRF-Token header, then it is refused with 403', async () => {
    const client = new Client(app.url)
    await client.refreshToken()
    const res = await client.agent.post('/api/v1/session').send({ email: venue.emails.administrator, password: 'x' })
    expect(res.status).toBe(403)
    expect(res.body.error.code).toBe('csrf_failed')
  })

  it('when the token belongs to another session, then it is refused with 403', async () => {
    const victim = await new Client(app.url).refreshToken()
    const attacker = new Client(app.url)
    await attacker.refreshToken()
    attacker.csrfToken = victim.body.csrfToken
    const res = await attacker.signIn(venue.emails.administrator)
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
  it('when a member signs out, then the session ends and the API answers 401', async () => {
    const client = new Client(app.url)
    await client.signIn(venue.emails['stage-manager'])
    await client.delete('/api/v1/session').expect(204)
    expect((await client.get('/api/v1/session')).body.user).toBeNull()
    const res = await client.get('/api/v1/linesets')
    expect(res.status).toBe(401)
    expect(res.body.error.code).toBe('not_signed_in')
  })
})
