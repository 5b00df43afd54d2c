import { startMailSink, type MailSink, type ReceivedMail } from '../../scripts/lib/mail-sink.js'

/** The messages a test app's own SMTP sink took, in order. The sink answers only once it holds a message. */
export class Mailbox {
  readonly messages: ReceivedMail[] = []
  private sink: MailSink | null = null

  static async open() {
    const mailbox = new Mailbox()
    mailbox.sink = await startMailSink((mail) => mailbox.messages.push(mail))
    return mailbox
  }

  get url() {
    return this.sink!.url
  }

  /** The latest message to `address`. */
  latestTo(address: string): ReceivedMail {
    const found = this.messages.filter((mail) => mail.to.includes(address.toLowerCase())).at(-1)
    if (!found)
      throw new Error(`no mail to ${address}; mail so far went to ${this.messages.map((m) => m.to).join(', ')}`)
    return found
  }

  /** The invitation token in the latest message to `address`. */
  invitationTokenFor(address: string): string {
    const match = /\/invitation\/([A-Za-z0-9_-]+)/.exec(this.latestTo(address).text)
    if (!match) throw new Error(`no invitation link in the mail to ${address}`)
    return match[1]!
  }

  close() {
    return this.sink?.close()
  }
}
