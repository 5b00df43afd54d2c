import { brotliDecompressSync, gunzipSync } from 'node:zlib'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { sessionCookie } from '../support/event-stream.js'
import { currentStoredNames, freshBoard, freshList, rawGet, servedText } from '../support/answers.js'
import { startTwoVenues, type TwoVenues } from '../support/venue-suite.js'

let venues: TwoVenues
beforeAll(async () => {
  venues = await startTwoVenues('metric')
})
afterAll(() => venues.app.stop())

const reader = () => venues.atAlpha['stage-manager']
const sql = (text: string, bind: unknown[] = []) => venues.app.handle.db.sequelize.query(text, { bind })

describe('stored answers', () => {
  it('when the list and the board are read twice, then the second answer comes from the store and equals one computed fresh, byte for byte', async () => {
    const { app, alpha } = venues
    for (const [path, fresh] of [
      ['/api/v1/linesets', () => freshList(app, alpha)],
      ['/api/v1/board', () => freshBoard(app, alpha)],
    ] as const) {
      const first = await servedText(reader(), path)
      const second = await servedText(reader(), path)
      expect(second).toBe(first)
      expect(second).toBe(await fresh())
    }
    expect(await currentStoredNames(app, alpha.venueId)).toEqual(['board', 'linesets'])
  })

  it('when a stored answer is current, then it is what is sent, without computing it again', async () => {
    const { app, alpha } = venues
    await servedText(reader(), '/api/v1/board')
    // Only a served copy can carry this mark: nothing computes it.
    await sql(
      `UPDATE answer_cache SET body = convert_to('{"marked":true}', 'UTF8') WHERE venue_id = $1 AND key LIKE '%:board'`,
      [alpha.venueId],
    )
    expect(await servedText(reader(), '/api/v1/board')).toBe('{"marked":true}')
    await sql('DELETE FROM answer_cache WHERE venue_id = $1', [alpha.venueId])
    expect(await servedText(reader(), '/api/v1/board')).toBe(await freshBoard(app, alpha))
  })

  it('when a production filter is read, then its board is stored apart, and another venue asking for that production still gets 404', async () => {
    const { app, alpha, atAlpha, atBeta } = venues
    const production = (
      await atAlpha['technical-director']
        .post('/api/v1/productions', {
          name: 'Harbour Lights',
          firstPerformance: '2026-11-02',
          lastPerformance: '2026-12-20',
          state: 'running',
        })
        .expect(201)
    ).body
    const path = `/api/v1/board?productionId=${production.id}`
    await servedText(reader(), path)
    expect(await servedText(reader(), path)).toBe(await freshBoard(app, alpha, { productionId: production.id }))
    expect(await currentStoredNames(app, alpha.venueId)).toContain(`board:${production.id}`)
    expect((await atBeta['technical-director'].get(path)).status).toBe(404)
    expect((await atBeta['technical-director'].get(path)).status).toBe(404)
  })
})

const decoded = (bytes: Buffer, encoding: unknown) =>
  (encoding === 'br' ? brotliDecompressSync(bytes) : encoding === 'gzip' ? gunzipSync(bytes) : bytes).toString('utf8')

describe('stored answers and encodings', () => {
  it('when brotli, gzip or neither is accepted, then each comes back as the same JSON, stored or not', async () => {
    const { app, alpha } = venues
    const cookie = await sessionCookie(app.url, alpha.emails['stage-manager'])
    const asked = { br: 'br', gzip: 'gzip', identity: 'identity', 'gzip, br': 'br', 'br;q=0, gzip': 'gzip' }
    for (const [path, fresh] of [
      ['/api/v1/linesets', () => freshList(app, alpha)],
      ['/api/v1/board', () => freshBoard(app, alpha)],
    ] as const)
      for (const first of Object.keys(asked)) {
        await sql('DELETE FROM answer_cache WHERE venue_id = $1', [alpha.venueId]) // the first read computes
        for (const acceptEncoding of [first, ...Object.keys(asked).filter((other) => other !== first)]) {
          const sent = asked[acceptEncoding as keyof typeof asked]
          const res = await rawGet(`${app.url}${path}`, cookie, acceptEncoding)
          expect(res.status).toBe(200)
          expect(res.headers['content-encoding'] ?? 'identity', acceptEncoding).toBe(sent)
          expect(res.headers['content-type']).toBe('application/json; charset=utf-8')
          expect(String(res.headers.vary)).toMatch(/Accept-Encoding/i)
          expect(res.headers['cache-control']).toBe('no-store')
          expect(decoded(res.bytes, res.headers['content-encoding']), acceptEncoding).toBe(await fresh())
        }
      }
  })
})

describe('stored answers of two venues', () => {
  it("when one venue changes, then the other's stored answers stay current and each venue reads only its own", async () => {
    const { app, alpha, beta, atAlpha, atBeta } = venues
    const theirs = atBeta['stage-manager']
    const before = {
      list: await servedText(theirs, '/api/v1/linesets'),
      board: await servedText(theirs, '/api/v1/board'),
    }
    await servedText(reader(), '/api/v1/board')
    await atAlpha['technical-director']
      .post(`/api/v1/linesets/${alpha.linesetId}/lockout`, { reason: 'Worn sheave' })
      .expect(201)

    expect(await currentStoredNames(app, beta.venueId)).toEqual(expect.arrayContaining(['board', 'linesets']))
    expect(await currentStoredNames(app, alpha.venueId)).not.toContain('board')
    expect(await servedText(theirs, '/api/v1/linesets')).toBe(before.list)
    expect(await servedText(theirs, '/api/v1/board')).toBe(before.board)
    expect(before.list).toBe(await freshList(app, beta))
    expect(before.board).toBe(await freshBoard(app, beta))
    const ours = await servedText(reader(), '/api/v1/board')
    expect(ours).toBe(await freshBoard(app, alpha))
    expect(ours).toContain(alpha.linesetId)
    expect(before.board).not.toContain(alpha.linesetId)
    expect(ours).not.toContain(beta.linesetId)
  })
})
