import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { seedVenue, type VenueFixture } from '../support/fixtures.js'
import { Client, signedIn, startTestApp, type TestApp } from '../support/test-app.js'

let app: TestApp
let venue: VenueFixture
let admin: Client

beforeAll(async () => {
  app = await startTestApp()
  venue = await seedVenue(app.handle.context, 'alpha')
  admin = await signedIn(app.url, venue.emails.administrator)
})
afterAll(() => app.stop())

describe('people and roles', () => {
  it('when an administrator adds a person, then that person can sign in with the role given', async () => {
    const res = await admin.post('/api/v1/people', {
      email: 'New.Rigger@Alpha.test',
      name: 'New Rigger',
      role: 'fly-operator',
      password: 'a-long-password',
    })
    expect(res.status).toBe(201)
    expect(res.body).toMatchObject({ email: 'new.rigger@alpha.test', role: 'fly-operator', version: 0 })
    const signIn = await new Client(app.url).signIn('new.rigger@alpha.test', 'a-long-password')
    expect(signIn.body.user.role).toBe('fly-operator')
  })

  it("when a role changes, then the member's next request already carries the new role", async () => {
    const member = await signedIn(app.url, venue.emails['stage-manager'])
    await member.get('/api/v1/people').expect(403)
    const person = (await admin.get('/api/v1/people')).body.find(
      (p: { email: string }) => p.email === venue.emails['stage-manager'],
    )
    await admin.put(`/api/v1/people/${person.id}`, { role: 'administrator', version: person.version }).expect(200)
    await member.get('/api/v1/people').expect(200)
    await admin.put(`/api/v1/people/${person.id}`, { role: 'stage-manager', version: person.version + 1 }).expect(200)
  })

  it('when the last administrator would lose the role or an administrator removes themself, then it answers 409', async () => {
    const res = await admin.put(`/api/v1/people/${venue.membershipIds.administrator}`, {
      role: 'fly-operator',
      version: 0,
    })
    expect(res.status).toBe(409)
    expect(res.body.error.code).toBe('last_administrator')
    const self = await admin.delete(`/api/v1/people/${venue.membershipIds.administrator}`)
    expect(self.status).toBe(409)
  })

  it('when a new account has no password, then it answers 400 naming the password field', async () => {
    const res = await admin.post('/api/v1/people', {
      email: 'nopass@alpha.test',
      name: 'No Pass',
      role: 'stage-manager',
    })
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual({ password: 'Enter a password for the new account' })
  })

  it('when a member is removed, then their session no longer reaches the API', async () => {
    const added = (
      await admin.post('/api/v1/people', {
        email: 'temp@alpha.test',
        name: 'Temp',
        role: 'stage-manager',
        password: 'a-long-password',
      })
    ).body
    const tempClient = await signedIn(app.url, 'temp@alpha.test', 'a-long-password')
    await tempClient.get('/api/v1/linesets').expect(200)
    await admin.delete(`/api/v1/people/${added.id}`).expect(204)
    expect((await tempClient.get('/api/v1/linesets')).status).toBe(401)
  })
})

describe('two administrators at once', () => {
  it('when two administrators demote each other at the same moment, then one change wins and the venue keeps an administrator', async () => {
    const second = (
      await admin
        .post('/api/v1/people', {
          email: 'second.admin@alpha.test',
          name: 'Second Admin',
          role: 'administrator',
          password: 'a-long-password',
        })
        .expect(201)
    ).body
    const other = await signedIn(app.url, 'second.admin@alpha.test', 'a-long-password')
    const first = (await admin.get('/api/v1/people')).body.find(
      (p: { id: string }) => p.id === venue.membershipIds.administrator,
    )
    const [a, b] = await Promise.all([
      admin.put(`/api/v1/people/${second.id}`, { role: 'stage-manager', version: second.version }),
      other.put(`/api/v1/people/${first.id}`, { role: 'stage-manager', version: first.version }),
    ])
    // The loser is refused either as the last administrator (409) or, if the winner's change landed before
    // the loser's request was let in, because they are no longer an administrator (403).
    const statuses = [a.status, b.status].sort()
    expect(statuses[0]).toBe(200)
    expect([403, 409]).toContain(statuses[1])
    const administrators = await app.handle.db.models.Membership.count({
      where: { venueId: venue.venueId, role: 'administrator' },
    })
    expect(administrators).toBe(1)
  })
})
