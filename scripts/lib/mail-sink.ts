import type { AddressInfo } from 'node:net'
import { SMTPServer } from 'smtp-server'

/** One message the sink took, decoded far enough to read: headers, and the text body. */
export interface ReceivedMail {
  from: string
  to: string[]
  subject: string
  text: string
  raw: string
}

export interface MailSink {
  /** The SMTP_URL to send through (STARTTLS off: the package's bundled certificate has expired). */
  url: string
  port: number
  close(): Promise<void>
}

function decodeQuotedPrintable(body: string) {
  const bytes = body
    .replace(/=\r?\n/g, '')
    .replace(/=([0-9A-F]{2})/gi, (_match, hex: string) => String.fromCharCode(parseInt(hex, 16)))
  return Buffer.from(bytes, 'latin1').toString('utf8')
}

/** Reads a single-part plain-text message, the only kind the app writes. */
export function readMail(raw: string, envelope: { from: string; to: string[] }): ReceivedMail {
  const split = raw.search(/\r?\n\r?\n/)
  const head = raw.slice(0, split).replace(/\r?\n[ \t]+/g, ' ')
  const body = raw.slice(split).replace(/^\r?\n\r?\n/, '')
  const header = (name: string) => new RegExp(`^${name}:\\s*(.*)$`, 'im').exec(head)?.[1]?.trim() ?? ''
  const encoding = header('Content-Transfer-Encoding').toLowerCase()
  const text =
    encoding === 'quoted-printable'
      ? decodeQuotedPrintable(body)
      : encoding === 'base64'
        ? Buffer.from(body, 'base64').toString('utf8')
        : body
  return { ...envelope, subject: header('Subject'), text: text.replace(/\r\n/g, '\n').trimEnd(), raw }
}

/**
 * A local SMTP server that takes every message and hands it to `onMail` before saying it is accepted,
 * so once a send has returned, the message is there. For `npm start` without SMTP_URL, and for the tests.
 */
export function startMailSink(onMail: (mail: ReceivedMail) => void, port = 0): Promise<MailSink> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = []
      stream.on('data', (chunk: Buffer) => chunks.push(chunk))
      stream.on('end', () => {
        const envelope = {
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
          to: session.envelope.rcptTo.map((address) => address.address),
        }
        onMail(readMail(Buffer.concat(chunks).toString('utf8'), envelope))
        callback()
      })
    },
  })
  return new Promise((resolve, reject) => {
    server.once('error', reject)
    server.listen(port, '127.0.0.1', () => {
      const { port: bound } = server.server.address() as AddressInfo
      resolve({
        url: `smtp://127.0.0.1:${bound}?ignoreTLS=true`,
        port: bound,
        close: () => new Promise<void>((done) => server.close(() => done())),
      })
    })
  })
}
