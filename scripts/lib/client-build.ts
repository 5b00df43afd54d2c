import { existsSync, readdirSync, statSync } from 'node:fs'
import { join } from 'node:path'
import { projectRoot } from './paths.js'

const SOURCES = ['src', 'shared', 'public', 'index.html', 'vite.config.ts', 'package-lock.json']

function newestChange(path: string): number {
  if (!existsSync(path)) return 0
  const stat = statSync(path)
  if (!stat.isDirectory()) return stat.mtimeMs
  return readdirSync(path).reduce((newest, name) => Math.max(newest, newestChange(join(path, name))), stat.mtimeMs)
}

/** Builds the client into `outDir` unless a build newer than every source is already there. */
export async function buildClientIfStale(outDir = join(projectRoot, 'dist')) {
  const built = join(outDir, 'index.html')
  const sourcesChanged = Math.max(...SOURCES.map((s) => newestChange(join(projectRoot, s))))
  if (existsSync(built) && statSync(built).mtimeMs >= sourcesChanged) return false
  const { build } = await import('vite')
  await build({ root: projectRoot, logLevel: 'warn', build: { outDir, emptyOutDir: true } })
  return true
}
