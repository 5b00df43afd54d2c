import { dirname, join } from 'node:path'
import { fileURLToPath } from 'node:url'

/** The checkout's root folder. */
export const projectRoot = join(dirname(fileURLToPath(import.meta.url)), '..', '..')
