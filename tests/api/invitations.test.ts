import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { seedVenue, PASSWORD, type VenueFixture } from '../support/fixtures.js'
import { inviteAndAccept, NEW_PASSWORD } from '../support/invitations.js'
import { Client, signedIn, startTestApp, type TestApp } from '../support/test-app.js'

let app: TestApp
let alpha: VenueFixture
let beta: VenueFixture
let alphaAdmin: Client

beforeAll(async () => {
  app = await startTestApp()
  alpha = await seedVenue(app.handle.context, 'alpha')
  beta = await seedVenue(app.handle.context, 'beta')
  alphaAdmin = await signedIn(app.url, alpha.emails.administrator)
})
afterAll(() => app.stop())

const membershipsOf = async (email: string) => {
  const user = await app.handle.db.models.User.findOne({ where: { email } })
  return user ? app.handle.db.models.Membership.count({ where: { userId: user.id } }) : 0
}
const inAlpha = async (email: string) => {
  const user = await app.handle.db.models.User.findOne({ where: { email } })
  return user ? app.handle.db.models.Membership.count({ where: { userId: user.id, venueId: alpha.venueId } }) : 0
}
const visitor = async () => {
  const client = new Client(app.url)
  await client.refreshToken()
  return client
}

describe('adding a person reveals nothing about accounts elsewhere', () => {
  it("when an administrator adds another venue's technical director and an unknown address, then both answers have the same shape and neither joins", async () => {
    const known = beta.emails['technical-director']
    const unknown = 'nobody.yet@elsewhere.test'
    const [a, b] = await Promise.all([
      alphaAdmin.post('/api/v1/people', { email: known, name: 'Typed name', role: 'fly-operator' }),
      alphaAdmin.post('/api/v1/people', { email: unknown, name: 'Typed name', role: 'fly-operator' }),
    ])
    expect([a.status, b.status]).toEqual([201, 201])
    const shape = (body: Record<string, unknown>) => ({ ...body, id: '-', email: '-', createdAt: '-', expiresAt: '-' })
    expect(shape(a.body)).toEqual(shape(b.body))
    expect(Object.keys(a.body).sort()).toEqual(['createdAt', 'email', 'expiresAt', 'id', 'name', 'role', 'state'])
    // Never the stored account's name or id.
    expect(a.body.name).toBe('Typed name')
    expect(JSON.stringify(a.body)).not.toContain(beta.members['technical-director'].id)
    expect(JSON.stringify(a.body)).not.toContain(beta.members['technical-director'].name)
    expect(await inAlpha(known)).toBe(0)
    expect(await membershipsOf(unknown)).toBe(0)
    const people = (await alphaAdmin.get('/api/v1/people').expect(200)).body as Array<{ email: string }>
    expect(people.map((p) => p.email)).not.toContain(known)
    // Both addresses got the same invitation, each with its own link.
    expect((await app.mailbox.latestTo(known)).subject).toBe((await app.mailbox.latestTo(unknown)).subject)
    expect(await app.mailbox.invitationTokenFor(known)).not.toBe(await app.mailbox.invitationTokenFor(unknown))
  })

  it('when an address already has a role in this venue, then it answers 409 on the e-mail field', async () => {
    const res = await alphaAdmin.post('/api/v1/people', {
      email: alpha.emails['stage-manager'],
      name: 'Again',
      role: 'stage-manager',
    })
    expect(res.status).toBe(409)
    expect(res.body.error.fields).toEqual({ email: 'Already a member' })
  })
})

describe('accepting an invitation', () => {
  it('when a new address accepts with a name and password, then it joins with the role offered and is signed in there', async () => {
    const { member, user } = await inviteAndAccept(
      app,
      alphaAdmin,
      { email: 'new.flyman@alpha.test', name: 'Typed by admin', role: 'fly-operator' },
      { name: 'Chosen Name', password: NEW_PASSWORD },
    )
    expect(user).toMatchObject({ email: 'new.flyman@alpha.test', name: 'Chosen Name', role: 'fly-operator' })
    expect(user.venueId).toBe(alpha.venueId)
    await member.get('/api/v1/linesets').expect(200)
    const pending = (await alphaAdmin.get('/api/v1/invitations').expect(200)).body as Array<{ email: string }>
    expect(pending.map((i) => i.email)).not.toContain('new.flyman@alpha.test')
  })

  it('when a new address chooses a short password, then it answers 400 on the password field and nobody joins', async () => {
    await alphaAdmin.post('/api/v1/people', { email: 'short@alpha.test', name: 'Short', role: 'stage-manager' })
    const token = await app.mailbox.invitationTokenFor('short@alpha.test')
    const res = await (await visitor()).post('/api/v1/invitations/accept', { token, password: 'too-short' })
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual({ password: 'At least 12 characters' })
    expect(await membershipsOf('short@alpha.test')).toBe(0)
  })

  it("when another venue's member is invited, then joining takes their password or their own session, and their account is otherwise untouched", async () => {
    const email = beta.emails['stage-manager']
    await alphaAdmin
      .post('/api/v1/people', { email, name: 'Whatever the admin typed', role: 'fly-operator' })
      .expect(201)
    const token = await app.mailbox.invitationTokenFor(email)
    const stranger = await visitor()
    const preview = (await stranger.post('/api/v1/invitations/lookup', { token }).expect(200)).body
    expect(preview).toMatchObject({ email, venueName: 'Venue alpha', role: 'fly-operator', hasAccount: true })

    const without = await stranger.post('/api/v1/invitations/accept', { token })
    expect(without.status).toBe(401)
    expect(without.body.error.code).toBe('account_password_required')
    const wrong = await stranger.post('/api/v1/invitations/accept', { token, password: 'not-the-password' })
    expect(wrong.status).toBe(401)
    expect(await inAlpha(email)).toBe(0)

    const owner = await signedIn(app.url, email) // signed in to beta, as the invited address
    const accepted = await owner.post('/api/v1/invitations/accept', { token })
    expect(accepted.status).toBe(200)
    expect(accepted.body.user).toMatchObject({ email, role: 'fly-operator', venueId: alpha.venueId })
    expect(accepted.body.user.name).toBe(beta.members['stage-manager'].name)
    expect(await membershipsOf(email)).toBe(2)
    const signIn = await new Client(app.url).signIn(email, PASSWORD)
    expect(signIn.status).toBe(200) // the same password as before
  })

  it('when a link is used twice, then the second use answers 410', async () => {
    const { token } = await inviteAndAccept(app, alphaAdmin, {
      email: 'once@alpha.test',
      name: 'Once',
      role: 'stage-manager',
    })
    const again = await (await visitor()).post('/api/v1/invitations/accept', { token, password: NEW_PASSWORD })
    expect(again.status).toBe(410)
    expect(again.body.error.code).toBe('invitation_unusable')
    expect((await (await visitor()).post('/api/v1/invitations/lookup', { token })).status).toBe(410)
  })

  it('when the same link is accepted ten times at once, then exactly one succeeds and one account joins once', async () => {
    await alphaAdmin.post('/api/v1/people', { email: 'race@alpha.test', name: 'Race', role: 'stage-manager' })
    const token = await app.mailbox.invitationTokenFor('race@alpha.test')
    const clients = await Promise.all(Array.from({ length: 10 }, visitor))
    const answers = await Promise.all(
      clients.map((client) => client.post('/api/v1/invitations/accept', { token, password: NEW_PASSWORD })),
    )
    const statuses = answers.map((res) => res.status).sort()
    expect(statuses.filter((status) => status === 200)).toHaveLength(1)
    expect(statuses.every((status) => status === 200 || status === 410)).toBe(true)
    expect(await app.handle.db.models.User.count({ where: { email: 'race@alpha.test' } })).toBe(1)
    expect(await inAlpha('race@alpha.test')).toBe(1)
  })

  it('when an invitation is withdrawn, then its link stops working and it leaves the list', async () => {
    const sent = (
      await alphaAdmin.post('/api/v1/people', { email: 'withdrawn@alpha.test', name: 'W', role: 'stage-manager' })
    ).body
    const token = await app.mailbox.invitationTokenFor('withdrawn@alpha.test')
    await alphaAdmin.delete(`/api/v1/invitations/${sent.id}`).expect(204)
    expect((await alphaAdmin.delete(`/api/v1/invitations/${sent.id}`)).status).toBe(404)
    const res = await (await visitor()).post('/api/v1/invitations/accept', { token, password: NEW_PASSWORD })
    expect(res.status).toBe(410)
    const pending = (await alphaAdmin.get('/api/v1/invitations').expect(200)).body as Array<{ id: string }>
    expect(pending.map((i) => i.id)).not.toContain(sent.id)
  })

  it('when an address is invited again, then only the newest link works', async () => {
    await alphaAdmin.post('/api/v1/people', { email: 'twice@alpha.test', name: 'T', role: 'stage-manager' }).expect(201)
    const first = await app.mailbox.invitationTokenFor('twice@alpha.test')
    await alphaAdmin.post('/api/v1/people', { email: 'twice@alpha.test', name: 'T', role: 'fly-operator' }).expect(201)
    const second = await app.mailbox.invitationTokenFor('twice@alpha.test')
    expect((await (await visitor()).post('/api/v1/invitations/lookup', { token: first })).status).toBe(410)
    const preview = await (await visitor()).post('/api/v1/invitations/lookup', { token: second })
    expect(preview.body.role).toBe('fly-operator')
  })

  it("when an administrator withdraws another venue's invitation, then it answers 404 and the invitation stands", async () => {
    const betaAdmin = await signedIn(app.url, beta.emails.administrator)
    const sent = (
      await betaAdmin.post('/api/v1/people', { email: 'beta.guest@beta.test', name: 'G', role: 'stage-manager' })
    ).body
    expect((await alphaAdmin.delete(`/api/v1/invitations/${sent.id}`)).status).toBe(404)
    const pending = (await betaAdmin.get('/api/v1/invitations').expect(200)).body as Array<{ id: string }>
    expect(pending.map((i) => i.id)).toContain(sent.id)
  })
})

describe('an invitation past its expiry', () => {
  let later: TestApp
  let offset = 0
  beforeAll(async () => {
    later = await startTestApp({ overrides: { clock: { now: () => new Date(Date.now() + offset) } } })
  })
  afterAll(() => later.stop())

  it('when the link is used eight days after it was sent, then it is refused with 410 and nobody joins', async () => {
    const venue = await seedVenue(later.handle.context, 'gamma')
    const admin = await signedIn(later.url, venue.emails.administrator)
    const sent = (await admin.post('/api/v1/people', { email: 'late@gamma.test', name: 'L', role: 'stage-manager' }))
      .body
    expect(new Date(sent.expiresAt).getTime() - new Date(sent.createdAt).getTime()).toBeGreaterThan(6.9 * 86_400_000)
    const token = await later.mailbox.invitationTokenFor('late@gamma.test')
    offset = 8 * 24 * 60 * 60 * 1000
    const client = new Client(later.url)
    await client.refreshToken()
    expect((await client.post('/api/v1/invitations/lookup', { token })).status).toBe(410)
    const res = await client.post('/api/v1/invitations/accept', { token, password: NEW_PASSWORD })
    expect(res.status).toBe(410)
    expect(await later.handle.db.models.User.count({ where: { email: 'late@gamma.test' } })).toBe(0)
  })
})
