import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createTestDatabase } from '../support/database.js'
import { seedVenue, type VenueFixture } from '../support/fixtures.js'
import { TcpProxy } from '../support/tcp-proxy.js'
import { Client, signedIn, startTestApp, type TestApp } from '../support/test-app.js'

describe('a session survives a server restart', () => {
  let databaseUrl: string
  let venue: VenueFixture

  beforeAll(async () => {
    databaseUrl = await createTestDatabase()
  })

  it('when the server stops and a new one starts on the same database, then the signed-in cookie still works', async () => {
    const first = await startTestApp({ databaseUrl })
    venue = await seedVenue(first.handle.context, 'alpha')
    const client = await signedIn(first.url, venue.emails['stage-manager'])
    const cookie = (await client.get('/api/v1/session')).request.cookies
    await first.stop()

    const second = await startTestApp({ databaseUrl })
    try {
      const res = await new Client(second.url).agent.get('/api/v1/session').set('Cookie', cookie)
      expect(res.status).toBe(200)
      expect(res.body.user).toMatchObject({ email: venue.emails['stage-manager'], role: 'stage-manager' })
      const linesets = await new Client(second.url).agent.get('/api/v1/linesets').set('Cookie', cookie)
      expect(linesets.status).toBe(200)
    } finally {
      await second.stop()
    }
  })
})

describe('a database outage', () => {
  let app: TestApp
  let proxy: TcpProxy
  let client: Client

  beforeAll(async () => {
    const direct = new URL(await createTestDatabase())
    proxy = new TcpProxy(direct.hostname, Number(direct.port))
    await proxy.open()
    const viaProxy = new URL(direct)
    viaProxy.port = String(proxy.port)
    app = await startTestApp({ databaseUrl: viaProxy.toString() })
    const venue = await seedVenue(app.handle.context, 'alpha')
    client = await signedIn(app.url, venue.emails['technical-director'])
  })
  afterAll(async () => {
    await proxy.open()
    await app.stop()
    await proxy.cut()
  })

  it('when the database goes away, then the API answers 503 in the error shape, and recovers by itself once it is back', async () => {
    await client.get('/api/v1/linesets').expect(200)
    await proxy.cut()
    for (const path of ['/api/v1/linesets', '/api/v1/session']) {
      const res = await client.get(path)
      expect(res.status, path).toBe(503)
      expect(res.body.error.code).toBe('database_unavailable')
      expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts:\d+/)
    }
    const anonymous = await new Client(app.url).get('/api/v1/session')
    expect(anonymous.status, 'a signed-out GET /session').toBe(503)
    expect(anonymous.body.error.code).toBe('database_unavailable')
    expect(anonymous.headers['set-cookie']).toBeUndefined() // no token for a session that cannot be stored
    await proxy.open()
    let status = 0
    for (let attempt = 0; attempt < 20 && status !== 200; attempt++) {
      status = (await client.get('/api/v1/linesets')).status
      if (status !== 200) await new Promise((r) => setTimeout(r, 250))
    }
    expect(status).toBe(200)
  })
})
