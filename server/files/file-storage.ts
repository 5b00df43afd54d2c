/**
 * Where uploaded files live, addressed by a key the app makes such as `venue-id/attachment-id`. One small
 * interface with two homes: a folder on this machine (the default) or an S3-compatible object store.
 */
export interface FileStorage {
  /** Stores `bytes` under `key` whole, or not at all; a reader never sees half a file. */
  put(key: string, bytes: Buffer, contentType?: string): Promise<void>
  /** The file's bytes, or null when nothing is stored under `key`. */
  get(key: string): Promise<Buffer | null>
  /** Removes the file; removing a missing key is not an error. */
  delete(key: string): Promise<void>
  exists(key: string): Promise<boolean>
}

// Keys are made by the app, never typed by a person; anything else is a bug, refused before it is stored.
const SAFE_KEY = /^[A-Za-z0-9][A-Za-z0-9_.-]*(\/[A-Za-z0-9][A-Za-z0-9_.-]*)*$/

/** Throws unless `key` is one the app could have made (no `..`, no leading `/`, no empty part). */
export function checkStorageKey(key: string): string {
  if (!SAFE_KEY.test(key)) throw new Error(`Not a storage key: ${JSON.stringify(key)}`)
  return key
}
