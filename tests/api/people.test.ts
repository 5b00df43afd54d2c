import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { seedVenue, type VenueFixture } from '../support/fixtures.js'
import { inviteAndAccept, NEW_PASSWORD } from '../support/invitations.js'
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

const memberWith = async (email: string) =>
  (await admin.get('/api/v1/people').expect(200)).body.find((p: { email: string }) => p.email === email)

describe('people and roles', () => {
  it('when an administrator adds a person and they accept, then that person can sign in with the role given', async () => {
    const { invitation } = await inviteAndAccept(app, admin, {
      email: 'New.Rigger@Alpha.test',
      name: 'New Rigger',
      role: 'fly-operator',
    })
    expect(invitation).toMatchObject({ email: 'new.rigger@alpha.test', role: 'fly-operator', state: 'pending' })
    const signIn = await new Client(app.url).signIn('new.rigger@alpha.test', NEW_PASSWORD)
    expect(signIn.body.user.role).toBe('fly-operator')
    expect(await memberWith('new.rigger@alpha.test')).toMatchObject({ name: 'New Rigger', version: 0 })
  })

  it("when a role changes, then the member's next request already carries the new role", async () => {
    const member = await signedIn(app.url, venue.emails['stage-manager'])
    await member.get('/api/v1/people').expect(403)
    const person = await memberWith(venue.emails['stage-manager'])
    const promoted = await admin.put(`/api/v1/people/${person.id}`, { role: 'administrator', version: person.version })
    expect(promoted.status).toBe(200)
    expect(promoted.body).toMatchObject({ role: 'administrator', version: person.version + 1, name: person.name })
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

  it('when a member is removed, then their session no longer reaches the API', async () => {
    const { member } = await inviteAndAccept(app, admin, {
      email: 'temp@alpha.test',
      name: 'Temp',
      role: 'stage-manager',
    })
    await member.get('/api/v1/linesets').expect(200)
    const added = await memberWith('temp@alpha.test')
    await admin.delete(`/api/v1/people/${added.id}`).expect(204)
    expect((await member.get('/api/v1/linesets')).status).toBe(401)
  })
})

describe('two administrators at once', () => {
  it('when two administrators demote each other at the same moment, then one change wins and the venue keeps an administrator', async () => {
    const { member: other } = await inviteAndAccept(app, admin, {
      email: 'second.admin@alpha.test',
      name: 'Second Admin',
      role: 'administrator',
    })
    const second = await memberWith('second.admin@alpha.test')
    const first = await memberWith(venue.emails.administrator)
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
