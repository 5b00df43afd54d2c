import { request } from 'node:http'
import { QueryTypes } from 'sequelize'
import type { BoardQuery } from '../../shared/schemas/board.js'
import type { ServiceContext } from '../../server/context.js'
import { getBoard } from '../../server/modules/board/board.service.js'
import { listLinesets } from '../../server/modules/linesets/lineset.service.js'
import type { VenueFixture } from './fixtures.js'
import type { Client, TestApp } from './test-app.js'

/** A member's context for calling the services directly: the answer computed fresh, never from the store. */
const asMember = (app: TestApp, venue: VenueFixture): ServiceContext => ({
  ...app.handle.context,
  actor: venue.members['stage-manager'],
})

/** The lineset list as JSON text, computed now from the data. */
export const freshList = async (app: TestApp, venue: VenueFixture) =>
  JSON.stringify(await listLinesets(asMember(app, venue)))

/** The board as JSON text, computed now from the data. */
export const freshBoard = async (app: TestApp, venue: VenueFixture, query: BoardQuery = {}) =>
  JSON.stringify(await getBoard(asMember(app, venue), query))

/** An answer's text as served uncompressed. */
export async function servedText(client: Client, path: string) {
  const res = await client.get(path).set('Accept-Encoding', 'identity')
  if (res.status !== 200) throw new Error(`GET ${path}: ${res.status} ${res.text}`)
  return res.text
}

/** The names (`linesets`, `board`, `board:<id>`) of the venue's stored answers that are current. */
export async function currentStoredNames(app: TestApp, venueId: string) {
  const found = await app.handle.db.sequelize.query<{ name: string }>(
    `SELECT substring(c.key FROM position(':' IN c.key) + 1) AS name
       FROM answer_cache c JOIN answer_epochs e USING (venue_id)
      WHERE c.venue_id = $1 AND c.epoch = e.epoch ORDER BY name`,
    { bind: [venueId], type: QueryTypes.SELECT },
  )
  return found.map((row) => row.name)
}

/** An answer's raw bytes and headers, asked with exactly this Accept-Encoding (nothing decoded on the way). */
export function rawGet(url: string, cookie: string, acceptEncoding: string) {
  return new Promise<{ status: number; headers: Record<string, unknown>; bytes: Buffer }>((resolve, reject) => {
    const asked = request(url, { headers: { Cookie: cookie, 'Accept-Encoding': acceptEncoding } }, (res) => {
      const chunks: Buffer[] = []
      res.on('data', (chunk: Buffer) => chunks.push(chunk))
      res.on('end', () => resolve({ status: res.statusCode!, headers: res.headers, bytes: Buffer.concat(chunks) }))
      res.on('error', reject)
    })
    asked.on('error', reject)
    asked.end()
  })
}
