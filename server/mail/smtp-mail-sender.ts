import nodemailer from 'nodemailer'
import { AppError } from '../http/errors.js'
import type { MailSender } from './mail-sender.js'

/**
 * Sends through the SMTP server at `url` (`smtp://` or `smtps://`, options as query parameters: the local
 * sink's URL carries `ignoreTLS=true`, because its bundled certificate cannot be trusted).
 */
export function smtpMailSender(url: string, from: string): MailSender {
  const transport = nodemailer.createTransport(url)
  return {
    async send(message) {
      try {
        await transport.sendMail({ from, ...message })
      } catch (error) {
        throw new AppError(
          503,
          'mail_unavailable',
          `The e-mail could not be sent (${error instanceof Error ? error.message : 'mail server unreachable'}); try again shortly`,
        )
      }
    },
    async close() {
      transport.close()
    },
  }
}

/** Without SMTP_URL the app runs, and anything that must send mail is refused with a clear 503. */
export const mailNotConfigured: MailSender = {
  async send() {
    throw new AppError(
      503,
      'mail_unavailable',
      'This server has no mail server configured (SMTP_URL), so it cannot send e-mail',
    )
  },
  async close() {},
}
