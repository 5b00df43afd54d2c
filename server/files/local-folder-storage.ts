import { access, mkdir, readFile, rename, rm, writeFile } from 'node:fs/promises'
import { dirname, join, resolve, sep } from 'node:path'
import { randomBytes } from 'node:crypto'
import { checkStorageKey, type FileStorage } from './file-storage.js'

/** Files under one folder on this machine, one file per key. */
export function localFolderStorage(folder: string): FileStorage {
  const root = resolve(folder)
  const pathFor = (key: string) => {
    const path = join(root, ...checkStorageKey(key).split('/'))
    // Every part starts with a letter or digit, so none is `.` or `..`; the prefix check says it twice.
    if (!path.startsWith(root + sep)) throw new Error(`Not a storage key: ${JSON.stringify(key)}`)
    return path
  }
  return {
    async put(key, bytes) {
      const path = pathFor(key)
      await mkdir(dirname(path), { recursive: true })
      // Written beside it and renamed, so a reader never sees half a file.
      const partial = `${path}.${randomBytes(6).toString('hex')}.partial`
      try {
        await writeFile(partial, bytes)
        await rename(partial, path)
      } catch (error) {
        await rm(partial, { force: true })
        throw error
      }
    },
    async get(key) {
      try {
        return await readFile(pathFor(key))
      } catch (error) {
        if ((error as NodeJS.ErrnoException).code === 'ENOENT') return null
        throw error
      }
    },
    async delete(key) {
      await rm(pathFor(key), { force: true })
    },
    async exists(key) {
      return access(pathFor(key)).then(
        () => true,
        () => false,
      )
    },
  }
}
