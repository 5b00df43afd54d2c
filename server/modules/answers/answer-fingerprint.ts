import { createHash, randomUUID } from 'node:crypto'
import { readdir, readFile } from 'node:fs/promises'
import { join, relative } from 'node:path'
import { fileURLToPath } from 'node:url'

const ROOT = fileURLToPath(new URL('../../../', import.meta.url))
const SOURCE_DIRS = ['server', 'shared']
const SOURCE_FILE = /\.(ts|js|mjs)$/

async function sourceFiles(): Promise<string[]> {
  const found = await Promise.all(
    SOURCE_DIRS.map(async (dir) =>
      (await readdir(join(ROOT, dir), { recursive: true }).catch(() => [] as string[]))
        .filter((name) => SOURCE_FILE.test(name))
        .map((name) => join(ROOT, dir, name)),
    ),
  )
  return found.flat().sort()
}

async function fingerprintOfSources(): Promise<string> {
  const files = await sourceFiles()
  // No sources beside this module (a bundled deployment): this process's answers are its own.
  if (files.length === 0) return randomUUID().replaceAll('-', '').slice(0, 16)
  const named = [...files, join(ROOT, 'package-lock.json')]
  const contents = await Promise.all(named.map((file) => readFile(file).catch(() => Buffer.alloc(0))))
  const hash = createHash('sha256')
  named.forEach((file, index) => hash.update(relative(ROOT, file)).update('\0').update(contents[index]!).update('\0'))
  return hash.digest('hex').slice(0, 16)
}

let fingerprint: Promise<string> | undefined

/**
 * What this build's answers are made by: a digest of the server's and the shared code and the locked packages.
 * A stored answer carries it in its key, so a new release (or an old one still running beside it during a
 * deploy) never serves answers in another release's shape: the data's epoch alone cannot see a code change.
 * Read once per process (about 0.1 s; `createApp` starts it); it describes the code, not any data. Never fails.
 */
export const answerFingerprint = () => (fingerprint ??= fingerprintOfSources())
