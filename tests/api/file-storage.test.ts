import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { afterAll, describe, expect, it } from 'vitest'
import { localFolderStorage } from '../../server/files/local-folder-storage.js'
import { startTestApp } from '../support/test-app.js'

const folder = mkdtempSync(join(tmpdir(), 'loftledger-storage-test-'))
afterAll(() => rmSync(folder, { recursive: true, force: true }))

describe('file storage in a folder', () => {
  const storage = localFolderStorage(folder)

  it('when a file is put, read and removed by key, then each step sees the one before', async () => {
    const key = 'venue-1/attachment-1.pdf'
    expect(await storage.get(key)).toBeNull()
    await storage.put(key, Buffer.from('%PDF- a drawing'))
    expect((await storage.get(key))!.toString()).toBe('%PDF- a drawing')
    await storage.put(key, Buffer.from('replaced'))
    expect((await storage.get(key))!.toString()).toBe('replaced')
    await storage.delete(key)
    expect(await storage.get(key)).toBeNull()
    await storage.delete(key) // removing what is gone is not an error
  })

  it('when a key would leave the folder, then it is refused before the disk is touched', async () => {
    for (const key of ['../escape', 'a/../../b', '/etc/passwd', '', 'a//b', '.hidden'])
      await expect(storage.put(key, Buffer.from('x')), key).rejects.toThrow(/Not a storage key/)
  })

  it("when the app starts with a storage folder, then its context's storage writes there", async () => {
    const app = await startTestApp({ env: { FILE_STORAGE_DIR: folder } })
    try {
      await app.handle.context.files.put('from-app/one.txt', Buffer.from('one'))
      expect((await storage.get('from-app/one.txt'))!.toString()).toBe('one')
    } finally {
      await app.stop()
    }
  })
})
