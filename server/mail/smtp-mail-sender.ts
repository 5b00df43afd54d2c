import nodemailer from 'nodemailer'
import type { MailSender } from './mail-sender.js'

/**
 * How long one send may take at each stage. nodemailer's own defaults allow minutes; a message is claimed in
 * the outbox for longer than these add up to (see `CLAIM_SECONDS`), so no other process sends it meanwhile.
 */
export const SMTP_TIMEOUTS_MS = { connectionTimeout: 10_000, greetingTimeout: 10_000, socketTimeout: 30_000 }

/**
 * Sends through the SMTP server at `url` (`smtp://` or `smtps://`, options as query parameters: the local
 * sink's URL carries `ignoreTLS=true`, because its bundled certificate cannot be trusted).
 */
export function smtpMailSender(url: string, from: string): MailSender {
  const transport = nodemailer.createTransport({ url, ...SMTP_TIMEOUTS_MS })
  return {
    configured: true,
    async send(message) {
      try {
        await transport.sendMail({ from, to: [...[message.to].flat()], subject: message.subject, text: message.text })
      } catch (error) {
        throw new Error(`The mail server did not take the message: ${describe(error)}`)
      }
    },
    async close() {
      transport.close()
    },
  }
}

const describe = (error: unknown) => (error instanceof Error ? error.message : 'mail server unreachable')

/** Without SMTP_URL the app runs, and every attempt to send says why nothing can be. */
export const mailNotConfigured: MailSender = {
  configured: false,
  async send() {
    throw new Error('This server has no mail server configured (SMTP_URL)')
  },
  async close() {},
}
