/** Where uploaded files live, addressed by a key such as `venue-id/attachment-id`. */
export interface FileStorage {
  put(key: string, bytes: Buffer): Promise<void>
  /** The file's bytes, or null when nothing is stored under `key`. */
  get(key: string): Promise<Buffer | null>
  /** Removes the file; removing a missing key is not an error. */
  remove(key: string): Promise<void>
}
