import { mkdtempSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createTestDatabase } from '../support/database.js'
import { startTestApp, type TestApp } from '../support/test-app.js'

let plain: TestApp
let overHttps: TestApp
let clientDir: string

beforeAll(async () => {
  clientDir = mkdtempSync(join(tmpdir(), 'loftledger-client-'))
  writeFileSync(join(clientDir, 'index.html'), '<!doctype html><title>Loftledger</title>')
  writeFileSync(join(clientDir, 'app.js'), 'console.log("loftledger")')
  const databaseUrl = await createTestDatabase()
  plain = await startTestApp({ databaseUrl, env: { CLIENT_DIR: clientDir } })
  overHttps = await startTestApp({ databaseUrl, env: { SECURE_COOKIES: 'true' } })
})
afterAll(async () => {
  await plain.stop()
  await overHttps.stop()
  rmSync(clientDir, { recursive: true, force: true })
})

describe('API answers are never kept by a browser or proxy', () => {
  it.each([
    ['a session read', 'get', '/api/v1/session', 200],
    ['a signed-out read', 'get', '/api/v1/people', 401],
    ['a refused write', 'post', '/api/v1/linesets', 403],
    ['an unknown API route', 'get', '/api/v1/nothing-here', 404],
    ['an unknown API version', 'get', '/api/v0/session', 404],
  ] as const)('when the answer is %s, then it carries Cache-Control: no-store', async (_, method, path, status) => {
    const res = await request(plain.url)[method](path)
    expect(res.status).toBe(status)
    expect(res.headers['cache-control']).toBe('no-store')
  })

  it('when a static client file is served, then it keeps its caching', async () => {
    const res = await request(plain.url).get('/app.js').expect(200)
    expect(res.headers['cache-control']).toBe('public, max-age=3600')
    const page = await request(plain.url).get('/linesets').expect(200)
    expect(page.headers['cache-control']).not.toMatch(/no-store/)
  })
})

describe('HSTS only when served over HTTPS', () => {
  it("when the config does not say HTTPS, then no Strict-Transport-Security is sent (helmet's other headers are)", async () => {
    for (const path of ['/api/v1/session', '/linesets']) {
      const res = await request(plain.url).get(path)
      expect(res.headers['strict-transport-security'], path).toBeUndefined()
      expect(res.headers['x-content-type-options']).toBe('nosniff')
      expect(res.headers['content-security-policy']).not.toMatch(/upgrade-insecure-requests/)
    }
  })

  it('when secure cookies say the app is served over HTTPS, then Strict-Transport-Security is sent', async () => {
    const res = await request(overHttps.url).get('/api/v1/session').expect(200)
    expect(res.headers['strict-transport-security']).toBe('max-age=31536000; includeSubDomains')
    expect(res.headers['content-security-policy']).toMatch(/upgrade-insecure-requests/)
  })

  it('when served over HTTPS, then the CSRF cookie takes the __Host- prefix and the Secure flag', async () => {
    const res = await request(overHttps.url).get('/api/v1/session').expect(200)
    const cookie = (res.headers['set-cookie'] as unknown as string[]).find((c) =>
      c.startsWith('__Host-loftledger.csrf='),
    )
    expect(cookie).toMatch(/; Path=\/; .*HttpOnly; Secure; SameSite=Strict/)
  })
})

describe('API answers carry the policy for data, pages the policy for pages', () => {
  it('when an API answer is sent, then nothing may load or frame it, and it has no ETag (it is never stored)', async () => {
    const res = await request(plain.url).get('/api/v1/session').expect(200)
    expect(res.headers['content-security-policy']).toBe("default-src 'none';frame-ancestors 'none'")
    expect(res.headers['x-frame-options']).toBe('DENY')
    expect(res.headers['x-content-type-options']).toBe('nosniff')
    expect(res.headers['cross-origin-resource-policy']).toBe('same-origin')
    expect(res.headers.etag).toBeUndefined()
  })

  it("when a page of the app is sent, then it carries the app's policy and may be revalidated by its ETag", async () => {
    const page = await request(plain.url).get('/linesets').expect(200)
    expect(page.headers['content-security-policy']).toMatch(/default-src 'self'/)
    expect(page.headers['content-security-policy']).toMatch(/script-src 'self'/)
    expect(page.headers['cross-origin-opener-policy']).toBe('same-origin')
    expect(page.headers.etag).toBeDefined()
  })

  it('when a script is sent, then it keeps nosniff but no page policy', async () => {
    const res = await request(plain.url).get('/app.js').expect(200)
    expect(res.headers['x-content-type-options']).toBe('nosniff')
    expect(res.headers['content-security-policy']).toBeUndefined()
  })
})
