import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { mailNotConfigured, smtpMailSender } from '../../server/mail/smtp-mail-sender.js'
import { seedVenue } from '../support/fixtures.js'
import { Mailbox } from '../support/mailbox.js'
import { signedIn, startTestApp, type TestApp } from '../support/test-app.js'

describe('mail through the local SMTP sink', () => {
  let mailbox: Mailbox
  beforeAll(async () => {
    mailbox = await Mailbox.open()
  })
  afterAll(() => mailbox.close())

  it('when one message is sent through the real SMTP sink, then it arrives and reads back as written', async () => {
    const sender = smtpMailSender(mailbox.url, 'Loftledger <no-reply@loftledger.invalid>')
    // A long line and a non-ASCII character, so the message travels quoted-printable and must be decoded.
    const text = `Line one.\nA line long enough to be folded by the mail encoder: ${'x'.repeat(90)} — done.`
    await sender.send({ to: 'reader@example.test', subject: 'A test message', text })
    await sender.close()
    const received = await mailbox.latestTo('reader@example.test')
    expect(received.subject).toBe('A test message')
    expect(received.from).toBe('no-reply@loftledger.invalid')
    expect(received.text).toBe(text)
  })
})

describe('an app with no mail server', () => {
  let app: TestApp
  beforeAll(async () => {
    app = await startTestApp({ overrides: { mail: mailNotConfigured } })
  })
  afterAll(() => app.stop())

  it('when a person is invited, then it answers 503 and no invitation is kept, since nobody could be told', async () => {
    const venue = await seedVenue(app.handle.context, 'alpha')
    const admin = await signedIn(app.url, venue.emails.administrator)
    const res = await admin.post('/api/v1/people', { email: 'unmailed@alpha.test', name: 'U', role: 'stage-manager' })
    expect(res.status).toBe(503)
    expect(res.body.error.code).toBe('mail_unavailable')
    expect(await app.handle.db.models.Invitation.count()).toBe(0)
  })
})
