/** One plain-text e-mail, to one address or several. */
export interface MailMessage {
  to: string | readonly string[]
  subject: string
  text: string
}

/** Sends e-mail; the app holds one, built from config, and tests may hand it another. */
export interface MailSender {
  /** False when the server has no mail server at all, so nothing it queues could ever be delivered. */
  readonly configured: boolean
  /**
   * Resolves once the mail server has taken the message; rejects with the reason when it refused or could
   * not be reached. Services never call this: they queue mail in the outbox (server/modules/outbox/).
   */
  send(message: MailMessage): Promise<void>
  close(): Promise<void>
}
