import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { FileStorage } from '../../server/files/file-storage.js'
import { localFolderStorage } from '../../server/files/local-folder-storage.js'
import { s3Storage } from '../../server/files/s3-storage.js'
import { seedVenue } from '../support/fixtures.js'
import { startLocalS3 } from '../support/local-s3.js'
import { signedIn, startTestApp } from '../support/test-app.js'
import { sampleImage } from '../support/upload-files.js'

const folder = mkdtempSync(join(tmpdir(), 'loftledger-storage-test-'))
afterAll(() => rmSync(folder, { recursive: true, force: true }))

let localS3: Awaited<ReturnType<typeof startLocalS3>>
beforeAll(async () => {
  localS3 = await startLocalS3()
})
afterAll(() => localS3?.stop())

// The one contract, proved against each home a venue can choose.
const homes: Array<[string, () => FileStorage]> = [
  ['a folder', () => localFolderStorage(folder)],
  ['an S3-compatible store (local stand-in)', () => s3Storage(localS3.options)],
]

describe.each(homes)('file storage in %s', (_name, open) => {
  it('when a file is put, read, checked and deleted by key, then each step sees the one before', async () => {
    const storage = open()
    const key = 'venue-1/attachment-1'
    expect(await storage.get(key)).toBeNull()
    expect(await storage.exists(key)).toBe(false)
    await storage.put(key, Buffer.from('%PDF- a drawing'), 'application/pdf')
    expect(await storage.exists(key)).toBe(true)
    expect((await storage.get(key))!.toString()).toBe('%PDF- a drawing')
    await storage.put(key, Buffer.from('replaced'))
    expect((await storage.get(key))!.toString()).toBe('replaced')
    await storage.delete(key)
    expect(await storage.get(key)).toBeNull()
    expect(await storage.exists(key)).toBe(false)
    await storage.delete(key) // deleting what is gone is not an error
  })

  it('when bytes of every value are stored, then they come back the same', async () => {
    const storage = open()
    const bytes = Buffer.from(Array.from({ length: 70_000 }, (_, i) => (i * 31) % 256))
    await storage.put('venue-1/every-byte', bytes)
    expect(Buffer.compare((await storage.get('venue-1/every-byte'))!, bytes)).toBe(0)
  })

  it('when a key would leave its place, then it is refused before anything is stored', async () => {
    const storage = open()
    for (const key of ['../escape', 'a/../../b', '/etc/passwd', '', 'a//b', '.hidden'])
      await expect(storage.put(key, Buffer.from('x')), key).rejects.toThrow(/Not a storage key/)
  })
})

describe('the app chooses its storage by configuration', () => {
  it("when the app starts with a storage folder, then its context's storage writes there", async () => {
    const app = await startTestApp({ env: { FILE_STORAGE_DIR: folder } })
    try {
      await app.handle.context.files.put('from-app/one.txt', Buffer.from('one'))
      expect((await localFolderStorage(folder).get('from-app/one.txt'))!.toString()).toBe('one')
    } finally {
      await app.stop()
    }
  })

  it('when FILE_STORAGE=s3 names the local stand-in, then an upload lands there, downloads the same and is deleted from it', async () => {
    const app = await startTestApp({ env: localS3.env })
    try {
      const venue = await seedVenue(app.handle.context, 'alpha')
      const operator = await signedIn(app.url, venue.emails['fly-operator'])
      const photo = await sampleImage('jpeg')
      const res = await operator.agent
        .post(`/api/v1/linesets/${venue.linesetId}/attachments`)
        .set('X-CSRF-Token', operator.csrfToken)
        .attach('file', photo, 'Arbor photo.jpg')
        .expect(201)
      const store = s3Storage(localS3.options)
      const key = `${venue.venueId}/${res.body.id}`
      expect(Buffer.compare((await store.get(key))!, photo)).toBe(0)
      expect(await store.exists(`${key}-thumbnail.webp`)).toBe(true)
      const content = await operator.get(`/api/v1/attachments/${res.body.id}/content`).buffer(true).expect(200)
      expect(Buffer.compare(content.body as Buffer, photo)).toBe(0)
      await operator.delete(`/api/v1/attachments/${res.body.id}`).expect(204)
      expect(await store.exists(key)).toBe(false)
      expect(await store.exists(`${key}-thumbnail.webp`)).toBe(false)
    } finally {
      await app.stop()
    }
  })
})
