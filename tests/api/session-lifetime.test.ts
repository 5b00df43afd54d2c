import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { SESSION_LIFETIME_MS, SESSION_ROLL_AFTER_MS } from '../../server/http/session.js'
import { seedVenue, type VenueFixture } from '../support/fixtures.js'
import { signedIn, startTestApp, type Client, type TestApp } from '../support/test-app.js'

// A session's lifetime is enforced by the row in PostgreSQL: these tests move a row's expiry the way time would
// and check what the next request gets, so nothing here waits for a clock.
let app: TestApp
let venue: VenueFixture

beforeAll(async () => {
  app = await startTestApp()
  venue = await seedVenue(app.handle.context, 'alpha')
})
afterAll(() => app.stop())

interface StoredSession {
  sid: string
  sess: { cookie: { expires: string } }
  /** The row's expiry, in seconds since the epoch. */
  expiresAt: number
}

/** The one stored session of a member (each test signs a different member in, or signs them out first). */
async function sessionOf(userId: string): Promise<StoredSession> {
  const [rows] = await app.handle.db.sequelize.query(
    `SELECT sid, sess, extract(epoch FROM expire)::float8 AS "expiresAt" FROM sessions
     WHERE sess #>> '{passport,user,userId}' = :userId`,
    { replacements: { userId } },
  )
  expect(rows).toHaveLength(1)
  return rows[0] as StoredSession
}

/** Moves a session's expiry (the row's and the one its cookie data carries) by `seconds`, as time passing would. */
async function shiftExpiry(stored: StoredSession, seconds: number) {
  const expires = new Date(Date.parse(stored.sess.cookie.expires) + seconds * 1000).toISOString()
  await app.handle.db.sequelize.query(
    `UPDATE sessions SET expire = expire + make_interval(secs => :seconds), sess = :sess WHERE sid = :sid`,
    {
      replacements: {
        seconds,
        sid: stored.sid,
        sess: JSON.stringify({ ...stored.sess, cookie: { ...stored.sess.cookie, expires } }),
      },
    },
  )
}

const setsSessionCookie = (res: { headers: Record<string, unknown> }) =>
  ((res.headers['set-cookie'] as string[] | undefined) ?? []).some((c) => c.startsWith('loftledger.sid='))

async function signedInAs(role: keyof VenueFixture['members']): Promise<Client> {
  return signedIn(app.url, venue.emails[role])
}

describe('a session in use', () => {
  it('when a member reads again soon after signing in, then the session row is not written and no cookie is sent again', async () => {
    const client = await signedInAs('stage-manager')
    const before = await sessionOf(venue.members['stage-manager'].id)
    for (let i = 0; i < 5; i++) {
      const res = await client.get('/api/v1/linesets').expect(200)
      expect(setsSessionCookie(res)).toBe(false)
    }
    expect(await sessionOf(venue.members['stage-manager'].id)).toEqual(before)
    await client.delete('/api/v1/session').expect(204)
  })

  it('when a request comes after more than the roll interval, then the expiry moves forward a whole lifetime and the cookie is sent again', async () => {
    const client = await signedInAs('fly-operator')
    const id = venue.members['fly-operator'].id
    const hoursAgo = (SESSION_ROLL_AFTER_MS + 60 * 60 * 1000) / 1000
    await shiftExpiry(await sessionOf(id), -hoursAgo)
    const aged = await sessionOf(id)
    const res = await client.get('/api/v1/linesets').expect(200)
    expect(setsSessionCookie(res)).toBe(true)
    const rolled = await sessionOf(id)
    expect(rolled.sid).toBe(aged.sid)
    expect(rolled.expiresAt - aged.expiresAt).toBeGreaterThan(hoursAgo - 60)
    expect(Date.parse(rolled.sess.cookie.expires) - Date.parse(aged.sess.cookie.expires)).toBeGreaterThan(
      (hoursAgo - 60) * 1000,
    )
    await client.get('/api/v1/linesets').expect(200)
    await client.delete('/api/v1/session').expect(204)
  })
})

describe('a session that has ended', () => {
  it('when its expiry has passed, then the API answers 401 and the session is not brought back', async () => {
    const client = await signedInAs('technical-director')
    const id = venue.members['technical-director'].id
    await shiftExpiry(await sessionOf(id), -SESSION_LIFETIME_MS / 1000 - 60)
    const res = await client.get('/api/v1/linesets')
    expect(res.status).toBe(401)
    expect(res.body.error.code).toBe('not_signed_in')
    expect((await client.get('/api/v1/session').expect(200)).body.user).toBeNull()
    expect((await sessionOf(id)).expiresAt * 1000).toBeLessThan(Date.now())
  })

  it('when its row is removed (revoked), then the very next request answers 401', async () => {
    const client = await signedInAs('administrator')
    await client.get('/api/v1/people').expect(200)
    const { sid } = await sessionOf(venue.members.administrator.id)
    await app.handle.db.sequelize.query('DELETE FROM sessions WHERE sid = :sid', { replacements: { sid } })
    const res = await client.get('/api/v1/people')
    expect(res.status).toBe(401)
    expect(res.body.error.code).toBe('not_signed_in')
  })
})

describe("a member's role", () => {
  it('when an administrator changes it, then the next request of a session already signed in carries the new role', async () => {
    const admin = await signedInAs('administrator')
    const member = await signedInAs('fly-operator')
    const membershipId = venue.membershipIds['fly-operator']
    await member.get('/api/v1/people').expect(403)
    const promoted = await admin.put(`/api/v1/people/${membershipId}`, { role: 'administrator', version: 0 })
    expect(promoted.status, promoted.text).toBe(200)
    expect((await member.get('/api/v1/session').expect(200)).body.user.role).toBe('administrator')
    await member.get('/api/v1/people').expect(200)
    await admin.put(`/api/v1/people/${membershipId}`, { role: 'fly-operator', version: 1 }).expect(200)
    expect((await member.get('/api/v1/session').expect(200)).body.user.role).toBe('fly-operator')
    await member.get('/api/v1/people').expect(403)
  })
})
