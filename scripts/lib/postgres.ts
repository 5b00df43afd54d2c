// The project's private PostgreSQL cluster: created, started and stopped by Loftledger's own
// scripts, listening on 127.0.0.1 only, never the system cluster or a system service.
import { execFileSync, spawnSync } from 'node:child_process'
import { createHash, randomBytes } from 'node:crypto'
import { chmodSync, chownSync, existsSync, mkdirSync, readFileSync, readdirSync, writeFileSync } from 'node:fs'
import { join } from 'node:path'
import { projectRoot } from './paths.js'

const isRoot = process.getuid?.() === 0

export interface ClusterOptions {
  /** Folder name under the data root, e.g. `postgres` for the app, `postgres-test` for tests. */
  name: string
  port: number
  /** Tests only: fsync off trades crash safety for speed. Never for the app's own data. */
  fast?: boolean
  /** Require a password on TCP (the app's cluster); tests use trust on loopback. */
  password?: boolean
}

export interface Cluster {
  root: string
  dataDir: string
  port: number
  /** Connection string for the `postgres` maintenance database. */
  adminUrl: string
  urlFor(database: string): string
}

/** Where PostgreSQL's server binaries are; Debian keeps one folder per major version. */
export function postgresBinDir(): string {
  const base = '/usr/lib/postgresql'
  const versions = existsSync(base) ? readdirSync(base).filter((v) => existsSync(join(base, v, 'bin', 'postgres'))) : []
  const newest = versions.sort((a, b) => Number(b) - Number(a))[0]
  if (!newest)
    throw new Error("PostgreSQL's server is not installed (run `npm start` as root, or apt-get install postgresql)")
  return join(base, newest, 'bin')
}

function asPostgres(command: string, args: string[]) {
  return isRoot ? { command: 'runuser', args: ['-u', 'postgres', '--', command, ...args] } : { command, args }
}

function runPg(binary: string, args: string[]) {
  const { command, args: fullArgs } = asPostgres(join(postgresBinDir(), binary), args)
  const result = spawnSync(command, fullArgs, { encoding: 'utf8' })
  return { ok: result.status === 0, output: `${result.stdout ?? ''}${result.stderr ?? ''}` }
}

/** Can the postgres system user reach this folder? A checkout under /root (mode 700) cannot. */
function postgresCanReach(folder: string) {
  if (!isRoot) return true
  return spawnSync('runuser', ['-u', 'postgres', '--', 'test', '-x', folder, '-a', '-r', folder]).status === 0
}

/**
 * The one place that decides where cluster data lives: `.data/` in the checkout when the
 * postgres user can reach it, else a folder under /tmp named after the checkout.
 */
export function dataRoot(): string {
  const inCheckout = join(projectRoot, '.data')
  mkdirSync(inCheckout, { recursive: true, mode: 0o755 })
  chmodSync(inCheckout, 0o755)
  if (postgresCanReach(inCheckout)) return inCheckout
  const hash = createHash('sha1').update(projectRoot).digest('hex').slice(0, 10)
  const fallback = join('/tmp', `loftledger-${hash}`)
  mkdirSync(fallback, { recursive: true, mode: 0o755 })
  return fallback
}

function ownByPostgres(folder: string) {
  mkdirSync(folder, { recursive: true, mode: 0o700 })
  if (isRoot) {
    const uid = Number(execFileSync('id', ['-u', 'postgres']).toString().trim())
    const gid = Number(execFileSync('id', ['-g', 'postgres']).toString().trim())
    chownSync(folder, uid, gid)
  }
  chmodSync(folder, 0o700)
}

function passwordFile(root: string) {
  return join(root, 'superuser.password')
}

function initCluster(root: string, dataDir: string, options: ClusterOptions) {
  ownByPostgres(root)
  const args = ['-D', dataDir, '-U', 'postgres', '-E', 'UTF8', '--locale=C.UTF-8', '--auth-local=trust']
  if (options.password) {
    const secret = randomBytes(24).toString('base64url')
    writeFileSync(passwordFile(root), `${secret}\n`, { mode: 0o600 })
    const pwfile = join(root, 'initdb.pw')
    writeFileSync(pwfile, `${secret}\n`, { mode: 0o600 })
    if (isRoot) ownByPostgresFile(pwfile)
    args.push('--auth-host=scram-sha-256', `--pwfile=${pwfile}`)
    const result = runPg('initdb', args)
    spawnSync('rm', ['-f', pwfile])
    if (!result.ok) throw new Error(`initdb failed:\n${result.output}`)
  } else {
    args.push('--auth-host=trust')
    const result = runPg('initdb', args)
    if (!result.ok) throw new Error(`initdb failed:\n${result.output}`)
  }
}

function ownByPostgresFile(file: string) {
  const uid = Number(execFileSync('id', ['-u', 'postgres']).toString().trim())
  chownSync(file, uid, 0)
}

function isRunning(dataDir: string) {
  return existsSync(join(dataDir, 'postmaster.pid')) && runPg('pg_ctl', ['-D', dataDir, 'status']).ok
}

/**
 * Creates the cluster on first use and starts it when it is not running.
 * @returns the cluster, and whether this call started it (so the caller knows to stop it).
 */
export function startCluster(options: ClusterOptions): { cluster: Cluster; started: boolean } {
  const root = join(dataRoot(), options.name)
  const dataDir = join(root, 'data')
  if (!existsSync(join(dataDir, 'PG_VERSION'))) initCluster(root, dataDir, options)
  let started = false
  if (!isRunning(dataDir)) {
    const settings = [`-c listen_addresses=127.0.0.1`, `-p ${options.port}`, `-k ${root}`]
    if (options.fast) settings.push('-c fsync=off', '-c synchronous_commit=off', '-c full_page_writes=off')
    // pg_ctl puts the server in a session of its own, so a Ctrl-C at the terminal reaches only us; we stop it.
    const result = runPg('pg_ctl', [
      '-D',
      dataDir,
      '-l',
      join(root, 'server.log'),
      '-w',
      '-t',
      '60',
      '-o',
      settings.join(' '),
      'start',
    ])
    if (!result.ok) throw new Error(`PostgreSQL did not start (see ${join(root, 'server.log')}):\n${result.output}`)
    started = true
  }
  const port = runningPort(dataDir) ?? options.port
  const secret =
    options.password && existsSync(passwordFile(root)) ? readFileSync(passwordFile(root), 'utf8').trim() : ''
  const auth = secret ? `postgres:${encodeURIComponent(secret)}` : 'postgres'
  const urlFor = (database: string) => `postgres://${auth}@127.0.0.1:${port}/${database}`
  return { cluster: { root, dataDir, port, adminUrl: urlFor('postgres'), urlFor }, started }
}

/** The port a running cluster actually listens on (line 4 of postmaster.pid). */
function runningPort(dataDir: string): number | null {
  try {
    const lines = readFileSync(join(dataDir, 'postmaster.pid'), 'utf8').split('\n')
    const port = Number(lines[3])
    return Number.isInteger(port) && port > 0 ? port : null
  } catch {
    return null
  }
}

/** Stops the cluster with a fast shutdown (active sessions are ended, data is flushed). */
export function stopCluster(cluster: Pick<Cluster, 'dataDir'>) {
  if (!isRunning(cluster.dataDir)) return
  const result = runPg('pg_ctl', ['-D', cluster.dataDir, '-m', 'fast', '-w', 'stop'])
  if (!result.ok) throw new Error(`PostgreSQL did not stop:\n${result.output}`)
}
