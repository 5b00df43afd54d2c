import { randomBytes } from 'node:crypto'
import { existsSync, readFileSync, writeFileSync } from 'node:fs'
import { join } from 'node:path'
import { projectRoot } from './paths.js'

/** Reads `.env` in the checkout, if any, without overriding variables already set. */
export function loadDotEnv() {
  const file = join(projectRoot, '.env')
  if (existsSync(file)) process.loadEnvFile(file)
}

/** A session secret kept beside the private cluster, so sign-ins survive restarts of `npm start`. */
export function localSessionSecret(folder: string): string {
  const file = join(folder, 'session.secret')
  if (!existsSync(file)) writeFileSync(file, randomBytes(48).toString('base64url'), { mode: 0o600 })
  return readFileSync(file, 'utf8').trim()
}
