import { startMailSink, type MailSink, type ReceivedMail } from '../../scripts/lib/mail-sink.js'

/** The messages a test app's own SMTP sink took, in order. The sink answers only once it holds a message. */
export class Mailbox {
  readonly messages: ReceivedMail[] = []
  private sink: MailSink | null = null
  /**
   * Resolves once every delivery the app has started is done (sent, or failed and recorded), so what the
   * sink holds is final; a test app sets it to its outbox's `idle`. Mail is delivered after commit, not
   * before the answer.
   */
  settle: () => Promise<void> = async () => {}

  static async open() {
    const mailbox = new Mailbox()
    mailbox.sink = await startMailSink((mail) => mailbox.messages.push(mail))
    return mailbox
  }

  get url() {
    return this.sink!.url
  }

  get port() {
    return this.sink!.port
  }

  /** Every message to `address` so far, once deliveries under way are done. */
  async allTo(address: string): Promise<ReceivedMail[]> {
    await this.settle()
    return this.messages.filter((mail) => mail.to.includes(address.toLowerCase()))
  }

  /** The latest message to `address`, once deliveries under way are done. */
  async latestTo(address: string): Promise<ReceivedMail> {
    const found = (await this.allTo(address)).at(-1)
    if (!found)
      throw new Error(`no mail to ${address}; mail so far went to ${this.messages.map((m) => m.to).join(', ')}`)
    return found
  }

  /** The invitation token in the latest message to `address`. */
  async invitationTokenFor(address: string): Promise<string> {
    const match = /\/invitation\/([A-Za-z0-9_-]+)/.exec((await this.latestTo(address)).text)
    if (!match) throw new Error(`no invitation link in the mail to ${address}`)
    return match[1]!
  }

  close() {
    return this.sink?.close()
  }
}
