#!/usr/bin/env node
// Installs what `npm start` and `npm test` need and is missing: npm packages, PostgreSQL's
// server from Debian's packages, and (with --browser) Debian's Chromium. Plain Node with no
// dependencies, because it runs before node_modules exists.
import { spawnSync } from 'node:child_process'
import { existsSync, readdirSync, statSync, mkdirSync, writeFileSync } from 'node:fs'
import { dirname, join } from 'node:path'
import { fileURLToPath } from 'node:url'

const root = join(dirname(fileURLToPath(import.meta.url)), '..')
const wantsBrowser = process.argv.includes('--browser')
// --packages-only: just the npm packages, for the type, lint and format checks that run before the tests.
const packagesOnly = process.argv.includes('--packages-only')
const isRoot = process.getuid?.() === 0

function fail(message) {
  console.error(`loftledger: ${message}`)
  process.exit(1)
}

function run(command, args, env = {}) {
  const result = spawnSync(command, args, { stdio: 'inherit', cwd: root, env: { ...process.env, ...env } })
  if (result.status !== 0) fail(`\`${command} ${args.join(' ')}\` failed (exit ${result.status})`)
}

function ensureNodeModules() {
  const lock = join(root, 'package-lock.json')
  const marker = join(root, 'node_modules', '.package-lock.json')
  if (existsSync(marker) && statSync(marker).mtimeMs >= statSync(lock).mtimeMs) return
  console.log('loftledger: installing npm packages (npm ci)...')
  run('npm', ['ci', '--no-audit', '--no-fund'])
}

let aptUpdated = false
function aptInstall(packages, why) {
  const hasApt = spawnSync('sh', ['-c', 'command -v apt-get'], { stdio: 'ignore' }).status === 0
  if (!isRoot || !hasApt)
    fail(`${why} is missing. Install it with: sudo apt-get install -y ${packages.join(' ')}  (then run this again)`)
  const env = { DEBIAN_FRONTEND: 'noninteractive' }
  if (!aptUpdated) run('apt-get', ['update', '-qq'], env)
  aptUpdated = true
  console.log(`loftledger: installing ${packages.join(' ')} from Debian's packages...`)
  run('apt-get', ['install', '-y', '-qq', '-o', 'Dpkg::Options::=--force-confold', ...packages], env)
}

function findPostgresBin() {
  const base = '/usr/lib/postgresql'
  if (!existsSync(base)) return null
  const versions = readdirSync(base)
    .filter((v) => existsSync(join(base, v, 'bin', 'postgres')))
    .sort((a, b) => Number(b) - Number(a))
  return versions.length ? join(base, versions[0], 'bin') : null
}

function ensurePostgres() {
  if (process.env.DATABASE_URL || findPostgresBin()) return
  // Loftledger runs its own private cluster; stop Debian's package from creating and starting a system one.
  const conf = '/etc/postgresql-common/createcluster.conf'
  if (isRoot && !existsSync(conf)) {
    mkdirSync('/etc/postgresql-common', { recursive: true })
    writeFileSync(conf, 'create_main_cluster = false\n')
  }
  aptInstall(['postgresql'], "PostgreSQL's server")
  if (!findPostgresBin()) fail('PostgreSQL was installed but no server binary was found under /usr/lib/postgresql')
}

function ensureChromium() {
  if (existsSync('/usr/bin/chromium')) return
  aptInstall(['chromium'], 'Chromium (for the browser tests)')
}

ensureNodeModules()
if (!packagesOnly) {
  ensurePostgres()
  if (wantsBrowser) ensureChromium()
}
