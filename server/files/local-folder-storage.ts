import { mkdir, readFile, rename, rm, writeFile } from 'node:fs/promises'
import { dirname, join, resolve, sep } from 'node:path'
import { randomBytes } from 'node:crypto'
import type { FileStorage } from './file-storage.js'

// Keys are made by the app, never typed by a person; anything else is a bug, refused before it reaches the disk.
const SAFE_KEY = /^[A-Za-z0-9][A-Za-z0-9_.-]*(\/[A-Za-z0-9][A-Za-z0-9_.-]*)*$/

/** Files under one folder on this machine, one file per key. */
export function localFolderStorage(folder: string): FileStorage {
  const root = resolve(folder)
  const pathFor = (key: string) => {
    const path = join(root, ...key.split('/'))
    // Every part starts with a letter or digit, so none is `.` or `..`; the prefix check says it twice.
    if (!SAFE_KEY.test(key) || !path.startsWith(root + sep))
      throw new Error(`Not a storage key: ${JSON.stringify(key)}`)
    return path
  }
  return {
    async put(key, bytes) {
      const path = pathFor(key)
      await mkdir(dirname(path), { recursive: true })
      // Written beside it and renamed, so a reader never sees half a file.
      const partial = `${path}.${randomBytes(6).toString('hex')}.partial`
      await writeFile(partial, bytes)
      await rename(partial, path)
    },
    async get(key) {
      try {
        return await readFile(pathFor(key))
      } catch (error) {
        if ((error as NodeJS.ErrnoException).code === 'ENOENT') return null
        throw error
      }
    },
    async remove(key) {
      await rm(pathFor(key), { force: true })
    },
  }
}
