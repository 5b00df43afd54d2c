import { QueryTypes } from 'sequelize'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { FileStorage } from '../../server/files/file-storage.js'
import { localFolderStorage } from '../../server/files/local-folder-storage.js'
import { seedVenue, type VenueFixture } from '../support/fixtures.js'
import { signedIn, startTestApp, type Client, type TestApp } from '../support/test-app.js'
import { sampleImage } from '../support/upload-files.js'
import { mkdtempSync, readdirSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'

// Nothing half-written: a store that fails writes no row, and a row that cannot be written leaves no file.

const folder = mkdtempSync(join(tmpdir(), 'loftledger-failing-store-'))
const real = localFolderStorage(folder)
/** What the next put does before (or instead of) storing. */
let beforePut: (key: string) => Promise<void> = async () => {}
const storage: FileStorage = {
  ...real,
  async put(key, bytes, type) {
    await beforePut(key)
    await real.put(key, bytes, type)
  },
}

let app: TestApp
let venue: VenueFixture
let operator: Client
beforeAll(async () => {
  app = await startTestApp({ overrides: { files: storage } })
  venue = await seedVenue(app.handle.context, 'alpha')
  operator = await signedIn(app.url, venue.emails['fly-operator'])
})
afterAll(async () => {
  await app.stop()
  rmSync(folder, { recursive: true, force: true })
})

const count = async (sql: string) =>
  Number((await app.handle.db.sequelize.query<{ n: string }>(sql, { type: QueryTypes.SELECT }))[0]!.n)
const state = async () => ({
  rows: await count('SELECT count(*) AS n FROM attachments'),
  ledger: await count("SELECT count(*) AS n FROM lineset_events WHERE event_type LIKE 'attachment-%'"),
  files: readdirSync(folder, { recursive: true }).filter((path) => !String(path).endsWith(venue.venueId)).length,
})
const send = async () =>
  operator.agent
    .post(`/api/v1/linesets/${venue.linesetId}/attachments`)
    .set('X-CSRF-Token', operator.csrfToken)
    .attach('file', await sampleImage('png'), 'Hang photo.png')

describe('uploads that fail part way', () => {
  it('when the store refuses the file, then it answers 503 in words and writes no row and no ledger entry', async () => {
    beforePut = async () => {
      throw new Error('store is down')
    }
    const before = await state()
    const res = await send()
    expect(res.status).toBe(503)
    expect(res.body.error.code).toBe('storage_unavailable')
    expect(await state()).toEqual(before)
  })

  it('when the file is stored but its thumbnail is not, then the stored file is removed again', async () => {
    beforePut = async (key) => {
      if (key.endsWith('-thumbnail.webp')) throw new Error('store is full')
    }
    const before = await state()
    expect((await send()).status).toBe(503)
    expect(await state()).toEqual(before)
  })

  it('when both files are stored but the database refuses the row, then both files are removed and nothing is written', async () => {
    const sequelize = app.handle.db.sequelize
    beforePut = async () => {
      await sequelize.query('ALTER TABLE attachments ADD CONSTRAINT refuse_every_row CHECK (false) NOT VALID')
      beforePut = async () => {}
    }
    const before = await state()
    try {
      const res = await send()
      expect(res.status).toBe(500)
      expect(res.body.error.code).toBe('internal_error')
      expect(await state()).toEqual(before)
    } finally {
      await sequelize.query('ALTER TABLE attachments DROP CONSTRAINT IF EXISTS refuse_every_row')
    }
    beforePut = async () => {}
    expect((await send()).status).toBe(201)
    expect(await state()).toEqual({ rows: before.rows + 1, ledger: before.ledger + 1, files: before.files + 2 })
  })
})
