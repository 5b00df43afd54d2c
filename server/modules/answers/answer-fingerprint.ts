import { createHash } from 'node:crypto'
import { readdir, readFile } from 'node:fs/promises'
import { join, relative } from 'node:path'
import { fileURLToPath } from 'node:url'

const ROOT = fileURLToPath(new URL('../../../', import.meta.url))
const SOURCE_DIRS = ['server', 'shared']
const SOURCE_FILE = /\.(ts|js|mjs)$/

async function sourceFiles(): Promise<string[]> {
  const found = await Promise.all(
    SOURCE_DIRS.map(async (dir) =>
      (await readdir(join(ROOT, dir), { recursive: true }))
        .filter((name) => SOURCE_FILE.test(name))
        .map((name) => join(ROOT, dir, name)),
    ),
  )
  return [...found.flat(), join(ROOT, 'package-lock.json')].sort()
}

async function fingerprintOfSources(): Promise<string> {
  const hash = createHash('sha256')
  for (const file of await sourceFiles()) {
    hash.update(relative(ROOT, file)).update('\0')
    hash.update(await readFile(file).catch(() => Buffer.alloc(0))).update('\0')
  }
  return hash.digest('hex').slice(0, 16)
}

let fingerprint: Promise<string> | undefined

/**
 * What this build's answers are made by: a digest of the server's and the shared code and the locked packages.
 * A stored answer carries it in its key, so a new release (or an old one still running beside it during a
 * deploy) never serves answers in another release's shape: the data's epoch alone cannot see a code change.
 * Read once per process; it describes the code, not any data.
 */
export const answerFingerprint = () => (fingerprint ??= fingerprintOfSources())
