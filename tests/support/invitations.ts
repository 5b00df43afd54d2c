import type { Role } from '../../shared/schemas/role.js'
import { Client, type TestApp } from './test-app.js'

export const NEW_PASSWORD = 'a-long-new-password'

/** Sends an invitation as `admin` and answers it from the mailed link, as the invited person would. */
export async function inviteAndAccept(
  app: TestApp,
  admin: Client,
  person: { email: string; name: string; role: Role },
  answer: { password?: string; name?: string } = { password: NEW_PASSWORD },
) {
  const invited = await admin.post('/api/v1/people', person)
  if (invited.status !== 201) throw new Error(`invitation failed: ${invited.status} ${JSON.stringify(invited.body)}`)
  const token = await app.mailbox.invitationTokenFor(person.email)
  const member = new Client(app.url)
  await member.refreshToken()
  const accepted = await member.post('/api/v1/invitations/accept', { token, ...answer })
  if (accepted.status !== 200) throw new Error(`accepting failed: ${accepted.status} ${JSON.stringify(accepted.body)}`)
  member.csrfToken = accepted.body.csrfToken
  return { member, invitation: invited.body, user: accepted.body.user, token }
}
