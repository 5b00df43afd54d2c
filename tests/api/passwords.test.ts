import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { DEMO_PASSWORD } from '../../server/db/seeders/demo-people.js'
import { seedVenue } from '../support/fixtures.js'
import { Client, signedIn, startTestApp, type TestApp } from '../support/test-app.js'

let app: TestApp
let admin: Client

beforeAll(async () => {
  app = await startTestApp()
  const venue = await seedVenue(app.handle.context, 'alpha')
  admin = await signedIn(app.url, venue.emails.administrator)
})
afterAll(() => app.stop())

// A new account is made by accepting an invitation; its password is chosen there.
async function newAccount(password: string, email = 'new.rigger@alpha.test') {
  await admin.post('/api/v1/people', { email, name: 'New Rigger', role: 'fly-operator' }).expect(201)
  const token = await app.mailbox.invitationTokenFor(email)
  const visitor = new Client(app.url)
  await visitor.refreshToken()
  return visitor.post('/api/v1/invitations/accept', { token, password })
}

describe("a new account's password", () => {
  it.each([
    ['too short', 'eleven-char', 'At least 12 characters'],
    ['the published demo password', DEMO_PASSWORD, 'The demo password is public; choose another'],
    ['all one character', 'z'.repeat(16), 'Must not be one character repeated'],
    ['all blanks', ' '.repeat(16), 'Must not be all spaces'],
    ['more than 72 bytes (bcrypt would ignore the rest)', 'p'.repeat(40) + '€'.repeat(11), 'At most 72 bytes'],
    ["the person's own e-mail address", 'New.Rigger@alpha.test', "Must not be the account's e-mail address"],
  ])(
    'when it is %s, then it is refused with 400 naming the password field and no account is made',
    async (_, password, reason) => {
      const res = await newAccount(password)
      expect(res.status).toBe(400)
      expect(res.body.error.code).toBe('validation_failed')
      expect(Object.keys(res.body.error.fields)).toEqual(['password'])
      expect(res.body.error.fields.password).toContain(reason)
      expect(await app.handle.db.models.User.count({ where: { email: 'new.rigger@alpha.test' } })).toBe(0)
    },
  )

  it('when it keeps the rule, then the account is made and signs in with it, and only with all of it', async () => {
    const password = 'a'.repeat(60) + 'brick-stack' // 71 bytes: every byte counts
    expect((await newAccount(password)).status).toBe(200)
    expect((await new Client(app.url).signIn('new.rigger@alpha.test', password)).status).toBe(200)
    expect((await new Client(app.url).signIn('new.rigger@alpha.test', password.slice(0, -1))).status).toBe(401)
  })
})
