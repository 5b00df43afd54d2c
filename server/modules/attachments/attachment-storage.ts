import type { FileStorage } from '../../files/file-storage.js'
import { AppError } from '../../http/errors.js'

const unavailable = () =>
  new AppError(503, 'storage_unavailable', 'The file store is not reachable right now; try again shortly')

/** Runs a storage call, a failure of the store itself reaching the person as 503 in words. */
export async function fromStorage<T>(work: () => Promise<T>): Promise<T> {
  try {
    return await work()
  } catch (error) {
    console.warn(`loftledger: file storage failed (${(error as Error)?.message ?? error})`)
    throw unavailable()
  }
}

/**
 * Removes stored files, never throwing: used when a write failed after the files were stored (so nothing is
 * left behind) and after a delete has committed (a file left over harms no one; a row without its file would).
 */
export async function removeQuietly(files: FileStorage, keys: ReadonlyArray<string | null>) {
  for (const key of keys) {
    if (!key) continue
    await files.delete(key).catch((error: unknown) => {
      console.warn(`loftledger: could not remove stored file ${key} (${(error as Error)?.message ?? error})`)
    })
  }
}
