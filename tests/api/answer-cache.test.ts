import { brotliDecompressSync, gunzipSync } from 'node:zlib'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { sessionCookie } from '../support/event-stream.js'
import { currentStoredNames, freshBoard, freshList, rawGet, servedText } from '../support/answers.js'
import { startTwoVenues, type TwoVenues } from '../support/venue-suite.js'
import { hungLineset, saveRevision } from '../support/tickets.js'

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
