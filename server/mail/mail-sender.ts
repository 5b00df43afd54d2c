/** One plain-text e-mail to one address. */
export interface MailMessage {
  to: string
  subject: string
  text: string
}

/** Sends e-mail; the app holds one, built from config, and tests may hand it another. */
export interface MailSender {
  /** Resolves once the mail server has taken the message; rejects when it refused or could not be reached. */
  send(message: MailMessage): Promise<void>
  close(): Promise<void>
}
