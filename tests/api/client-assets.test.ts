import { get } from 'node:http'
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { brotliDecompressSync, gunzipSync } from 'node:zlib'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { precompressFolder } from '../../scripts/lib/precompress.js'
import { sampleLineset, seedVenue } from '../support/fixtures.js'
import { signedIn, startTestApp, type TestApp } from '../support/test-app.js'

let app: TestApp
let clientDir: string
const script = `export const words = ${JSON.stringify('the batten flies in to its trim '.repeat(200))}\n`

beforeAll(async () => {
  clientDir = mkdtempSync(join(tmpdir(), 'loftledger-client-'))
  mkdirSync(join(clientDir, 'assets'))
  writeFileSync(join(clientDir, 'index.html'), `<!doctype html><title>Loftledger</title>${'<!-- - -->'.repeat(200)}`)
  writeFileSync(join(clientDir, 'assets', 'index-Ab12Cd34.js'), script)
  writeFileSync(join(clientDir, 'assets', 'roboto-Ef56.woff2'), Buffer.alloc(4000, 7))
  writeFileSync(join(clientDir, 'favicon.svg'), '<svg xmlns="http://www.w3.org/2000/svg"/>')
  precompressFolder(clientDir)
  app = await startTestApp({ env: { CLIENT_DIR: clientDir } })
})
afterAll(async () => {
  await app.stop()
  rmSync(clientDir, { recursive: true, force: true })
})

/** The answer exactly as sent: no client in between decompresses it. */
function raw(path: string, headers: Record<string, string> = {}) {
  return new Promise<{ status: number; headers: Record<string, string | string[] | undefined>; body: Buffer }>(
    (resolve, reject) => {
      get(`${app.url}${path}`, { headers }, (res) => {
        const chunks: Buffer[] = []
        res.on('data', (chunk: Buffer) => chunks.push(chunk))
        res.on('end', () => resolve({ status: res.statusCode!, headers: res.headers, body: Buffer.concat(chunks) }))
      }).on('error', reject)
    },
  )
}

describe('the built client goes out compressed and cached by its hashed name', () => {
  it('when the build has run, then every text file has a brotli and a gzip copy that unpack to the original', () => {
    const path = join(clientDir, 'assets', 'index-Ab12Cd34.js')
    expect(brotliDecompressSync(readFileSync(`${path}.br`)).toString()).toBe(script)
    expect(gunzipSync(readFileSync(`${path}.gz`)).toString()).toBe(script)
    expect(() => readFileSync(join(clientDir, 'assets', 'roboto-Ef56.woff2.br'))).toThrow()
  })

  it('when a browser takes brotli, then a hashed script comes as brotli, kept for a year, varying by encoding', async () => {
    const res = await raw('/assets/index-Ab12Cd34.js', { 'accept-encoding': 'gzip, deflate, br' })
    expect(res.status).toBe(200)
    expect(res.headers['content-encoding']).toBe('br')
    expect(res.headers['content-type']).toBe('text/javascript; charset=utf-8')
    expect(res.headers['vary']).toMatch(/Accept-Encoding/)
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable')
    expect(res.headers['x-content-type-options']).toBe('nosniff')
    expect(res.headers['content-security-policy']).toBeUndefined()
    expect(brotliDecompressSync(res.body).toString()).toBe(script)
  })

  it('when a browser takes only gzip, then it gets the gzip copy; when it takes neither, the file as it is', async () => {
    const gzip = await raw('/assets/index-Ab12Cd34.js', { 'accept-encoding': 'gzip' })
    expect(gzip.headers['content-encoding']).toBe('gzip')
    expect(gunzipSync(gzip.body).toString()).toBe(script)
    const plain = await raw('/assets/index-Ab12Cd34.js', { 'accept-encoding': 'identity' })
    expect(plain.headers['content-encoding']).toBeUndefined()
    expect(plain.body.toString()).toBe(script)
  })

  it('when a page path is asked, then index.html comes compressed, asked again each time, with the page policy', async () => {
    const res = await raw('/linesets/42', { 'accept-encoding': 'br' })
    expect(res.status).toBe(200)
    expect(res.headers['content-type']).toBe('text/html; charset=utf-8')
    expect(res.headers['cache-control']).toBe('no-cache')
    expect(res.headers['content-security-policy']).toMatch(/default-src 'self'/)
    expect(brotliDecompressSync(res.body).toString()).toMatch(/<title>Loftledger<\/title>/)
  })

  it('when a font is asked, then it goes as it is (woff2 is compressed already) and is kept for a year', async () => {
    const res = await raw('/assets/roboto-Ef56.woff2', { 'accept-encoding': 'br, gzip' })
    expect(res.headers['content-encoding']).toBeUndefined()
    expect(res.headers['content-type']).toBe('font/woff2')
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable')
  })

  it('when a file under assets/ does not exist, then the answer is 404, not the app', async () => {
    expect((await raw('/assets/index-Old99.js')).status).toBe(404)
  })
})

describe('API answers are compressed when large', () => {
  it('when a list runs past a kilobyte, then it comes gzip-compressed; a small session answer stays plain', async () => {
    const venue = await seedVenue(app.handle.context, 'assets')
    const admin = await signedIn(app.url, venue.emails.administrator)
    for (const number of [2, 3]) expect((await admin.post('/api/v1/linesets', sampleLineset(number))).status).toBe(201)
    const list = await admin.get('/api/v1/linesets').set('Accept-Encoding', 'gzip')
    expect(list.status).toBe(200)
    expect(list.headers['content-encoding']).toBe('gzip')
    expect(list.body).toHaveLength(3)
    const session = await raw('/api/v1/session', { 'accept-encoding': 'gzip' })
    expect(session.headers['content-encoding']).toBeUndefined()
  })
})
