import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import request from 'supertest'
import type { AppOverrides } from '../../server/app-context.js'
import { loadConfig, type Config } from '../../server/config.js'
import { startServer, type RunningServer } from '../../server/index.js'
import { createTestDatabase } from './database.js'
import { PASSWORD } from './fixtures.js'
import { Mailbox } from './mailbox.js'

export interface TestApp extends RunningServer {
  databaseUrl: string
  config: Config
  /** What the app mailed, through a real SMTP sink of its own. */
  mailbox: Mailbox
}

/**
 * Starts the real server on a free port against a database of its own (or the one given), with its own SMTP
 * sink and a temporary file-storage folder; `overrides` replace parts of the application context.
 */
export async function startTestApp(
  options: { databaseUrl?: string; env?: Record<string, string>; overrides?: AppOverrides } = {},
): Promise<TestApp> {
  const databaseUrl = options.databaseUrl ?? (await createTestDatabase())
  const mailbox = await Mailbox.open()
  const files = mkdtempSync(join(tmpdir(), 'loftledger-files-'))
  const config = loadConfig({
    NODE_ENV: 'test',
    PORT: '0',
    DATABASE_URL: databaseUrl,
    SESSION_SECRET: 'test-secret-test-secret-test-secret-0123',
    SMTP_URL: mailbox.url,
    FILE_STORAGE_DIR: files,
    ...options.env,
  })
  const running = await startServer(config, options.overrides)
  mailbox.settle = () => running.handle.context.outbox.idle()
  const stop = async () => {
    await running.stop()
    await mailbox.close()
    rmSync(files, { recursive: true, force: true })
  }
  return { ...running, stop, databaseUrl, config, mailbox }
}

/** A cookie-keeping client that sends the session's CSRF token on every unsafe request. */
export class Client {
  readonly agent: ReturnType<typeof request.agent>
  csrfToken = ''

  constructor(readonly baseUrl: string) {
    this.agent = request.agent(baseUrl)
  }

  async refreshToken() {
    const res = await this.agent.get('/api/v1/session').expect(200)
    this.csrfToken = res.body.csrfToken
    return res
  }

  async signIn(email: string, password = PASSWORD) {
    if (!this.csrfToken) await this.refreshToken()
    const res = await this.agent.post('/api/v1/session').set('X-CSRF-Token', this.csrfToken).send({ email, password })
    if (res.body.csrfToken) this.csrfToken = res.body.csrfToken
    return res
  }

  get(path: string) {
    return this.agent.get(path)
  }
  post(path: string, body?: object) {
    return this.agent.post(path).set('X-CSRF-Token', this.csrfToken).send(body)
  }
  put(path: string, body?: object) {
    return this.agent.put(path).set('X-CSRF-Token', this.csrfToken).send(body)
  }
  delete(path: string, body?: object) {
    const req = this.agent.delete(path).set('X-CSRF-Token', this.csrfToken)
    return body ? req.send(body) : req
  }
}

/** A client already signed in as `email`. */
export async function signedIn(baseUrl: string, email: string, password = PASSWORD) {
  const client = new Client(baseUrl)
  const res = await client.signIn(email, password)
  if (res.status !== 200) throw new Error(`sign-in as ${email} failed: ${res.status} ${JSON.stringify(res.body)}`)
  return client
}
