/**
 * `npm run bench:api`: the API's speed under load. A throwaway PostgreSQL cluster (the app's own settings) and
 * database, a venue of 80 linesets with hangs and 5,000 ledger entries, the real server in a process of its own,
 * and autocannon at 10 connections over loopback against a bare Express route (the yardstick, measured in the
 * same run) and the app's routes. Besides req/s, median and p95 (from every answer's time), it reports the CPU
 * milliseconds per answer of the server process and of PostgreSQL: on a shared machine those move less with
 * other people's load than the times do. `BENCH_SECONDS` sets each target's duration (10); `BENCH_PROFILE=DIR` runs the
 * server with `--cpu-prof` into DIR. Last, the stream: open boards, changes made through the API, and the time from
 * each write's answer to its event's arrival on every board.
 */
import { randomBytes } from 'node:crypto'
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { runCalculation } from '../shared/engine/calculate.js'
import { createApp } from '../server/app.js'
import { loadConfig } from '../server/config.js'
import { migrate } from '../server/db/migrate.js'
import { freePort } from '../tests/support/free-port.js'
import { ensureDatabase } from './lib/database.js'
import { BENCH_LEDGER_ENTRIES, BENCH_LINESETS, seedBenchVenue } from './lib/bench-api-seed.js'
import { driveLoad, type LoadFigures, type LoadTarget } from './lib/bench-load.js'
import { startAppServer, startBareServer } from './lib/bench-server.js'
import { signInOverHttp } from './lib/bench-sign-in.js'
import { projectRoot } from './lib/paths.js'
import { cpuMsOf, treeCpuMs } from './lib/process-cpu.js'
import { startCluster, stopCluster } from './lib/postgres.js'
import { calculationOfItems } from './lib/bench-calculation.js'
import { measureDelivery } from './lib/bench-stream.js'
import { measureFirstReadsAfterChange } from './lib/bench-after-change.js'

const SECONDS = Number(process.env.BENCH_SECONDS ?? 10)
/** Runs only the targets whose name holds this (and the bare route), e.g. when profiling one. */
const ONLY = process.env.BENCH_ONLY ?? ''
const LIST_P95_TARGET_MS = 25
const CALCULATION_RATIO_TARGET = 0.5
const STREAM_P95_TARGET_MS = 200
const STREAM_MAX_TARGET_MS = 2000
const OPEN_BOARDS = 20
const STREAM_CHANGES = 40
const AFTER_CHANGE_ROUNDS = 20

/**
 * Median milliseconds of `runCalculation` (schema and engine, no HTTP, no thread) over 200 runs after 1,000: a
 * calculation thread under load runs hot code, and the first few hundred runs still pay for compiling it.
 */
function engineAlone(body: unknown): number {
  for (let i = 0; i < 1000; i++) runCalculation(body)
  const times = Array.from({ length: 200 }, () => {
    const start = process.hrtime.bigint()
    runCalculation(body)
    return Number(process.hrtime.bigint() - start) / 1e6
  }).sort((a, b) => a - b)
  return times[100]!
}

const say = (line: string) => console.log(`bench:api: ${line}`)
const row = (f: LoadFigures) =>
  `${f.name.padEnd(34)} ${f.requestsPerSecond.toFixed(0).padStart(7)} req/s   median ${f.medianMs
    .toFixed(2)
    .padStart(7)} ms   p95 ${f.p95Ms.toFixed(2).padStart(7)} ms   ${(f.bytesPerAnswer / 1024).toFixed(1)} KB` +
  `   CPU/answer: server ${f.cpuMsPerAnswer[0]!.toFixed(2)} ms, PostgreSQL ${f.cpuMsPerAnswer[1]!.toFixed(2)} ms` +
  (f.failures ? `   ${f.failures} FAILED` : '')

async function firstLinesetId(url: string, headers: Record<string, string>) {
  const answer = await fetch(`${url}/api/v1/board`, { headers })
  const board = (await answer.json()) as { linesets: { id: string }[] }
  return board.linesets[0]!.id
}

async function main() {
  const { cluster } = startCluster({ name: `postgres-bench-${process.pid}`, port: await freePort() })
  const files = mkdtempSync(join(tmpdir(), 'loftledger-bench-'))
  try {
    await ensureDatabase(cluster.adminUrl, 'loftledger_bench')
    const env = {
      NODE_ENV: 'production',
      SECURE_COOKIES: 'false', // plain HTTP on loopback
      HOST: '127.0.0.1',
      PORT: String(await freePort()),
      DATABASE_URL: cluster.urlFor('loftledger_bench'),
      SESSION_SECRET: randomBytes(32).toString('hex'),
      FILE_STORAGE_DIR: files,
      ...(existsSync(join(projectRoot, 'dist', 'index.html')) ? { CLIENT_DIR: join(projectRoot, 'dist') } : {}),
    }
    const seeding = createApp(loadConfig(env))
    await migrate(seeding.db.sequelize, env.DATABASE_URL)
    say(`seeding ${BENCH_LINESETS} linesets with hangs and ${BENCH_LEDGER_ENTRIES} ledger entries...`)
    const person = await seedBenchVenue(seeding.context)
    await seeding.close()

    const profile = process.env.BENCH_PROFILE
    const server = await startAppServer(env, profile ? ['--cpu-prof', `--cpu-prof-dir=${profile}`] : [])
    const bare = await startBareServer()
    try {
      const headers = await signInOverHttp(server.url, person.email, person.password)
      const json = { ...headers, 'content-type': 'application/json' }
      const browser = { ...headers, 'accept-encoding': 'gzip, deflate, br, zstd' }
      say(`${SECONDS} s per target after a 2 s warm-up, 10 connections, loopback${profile ? ', profiled' : ''}`)
      const targets: LoadTarget[] = [
        { name: 'GET /api/v1/session', url: `${server.url}/api/v1/session`, headers },
        { name: 'GET /api/v1/linesets', url: `${server.url}/api/v1/linesets`, headers },
        { name: 'GET /api/v1/board', url: `${server.url}/api/v1/board`, headers },
        // What a browser asks for: the same answers, compressed as the app compresses them.
        { name: 'GET /api/v1/linesets, compressed', url: `${server.url}/api/v1/linesets`, headers: browser },
        { name: 'GET /api/v1/board, compressed', url: `${server.url}/api/v1/board`, headers: browser },
        { name: 'bare Express JSON route', url: `${bare.url}/bare` },
        {
          name: 'POST /api/v1/calculations (20 items)',
          url: `${server.url}/api/v1/calculations`,
          method: 'POST',
          headers: json,
          body: JSON.stringify(calculationOfItems(20)),
        },
      ]
      const postmaster = Number(readFileSync(join(cluster.dataDir, 'postmaster.pid'), 'utf8').split('\n')[0])
      const figures = new Map<string, LoadFigures>()
      for (const target of targets.filter((t) => t.name.includes(ONLY) || t.name.startsWith('bare'))) {
        const probe = await fetch(target.url, { method: target.method, headers: target.headers, body: target.body })
        await probe.arrayBuffer()
        if (probe.status === 404) {
          say(`${target.name}: skipped (404: the route is not on this branch yet)`)
          continue
        }
        if (!probe.ok) throw new Error(`${target.name} answered ${probe.status} before the run`)
        const serverPid = target.url.startsWith(bare.url) ? bare.pid : server.pid
        const result = await driveLoad(target, SECONDS, () => [cpuMsOf(serverPid), treeCpuMs(postmaster)])
        figures.set(target.name, result)
        console.log(row(result))
      }
      const list = figures.get('GET /api/v1/linesets')
      const calculation = figures.get('POST /api/v1/calculations (20 items)')
      const ratio = calculation
        ? calculation.requestsPerSecond / figures.get('bare Express JSON route')!.requestsPerSecond
        : NaN
      say(`calculations / bare: ${ratio.toFixed(2)} (target >= ${CALCULATION_RATIO_TARGET})`)
      if (calculation) {
        const engine = engineAlone(calculationOfItems(20))
        say(
          `the engine alone on the same body, in this process: median ${engine.toFixed(2)} ms, so one calculation ` +
            `thread serves at most ~${(1000 / engine).toFixed(0)} calculations/s`,
        )
      }
      for (const name of ['GET /api/v1/linesets', 'GET /api/v1/board']) {
        const f = figures.get(name)
        if (f) say(`${name} p95 ${f.p95Ms.toFixed(1)} ms (target < ${LIST_P95_TARGET_MS} ms)`)
      }
      if (!ONLY || ['GET /api/v1/linesets', 'GET /api/v1/board'].some((name) => name.includes(ONLY))) {
        const paths = ['/api/v1/linesets', '/api/v1/board']
        const after = await measureFirstReadsAfterChange(
          server.url,
          headers,
          await firstLinesetId(server.url, headers),
          paths,
          AFTER_CHANGE_ROUNDS,
        )
        say(
          "the list and the board above are the venue's stored answers (migration 0011), served until its data " +
            `changes; the first read after each of ${after.changes} changes, one request at a time, computes and ` +
            'stores them afresh: ' +
            paths
              .map((path) => {
                const f = after.byPath[path]!
                return `GET ${path} median ${f.medianMs.toFixed(1)} ms, slowest ${f.maxMs.toFixed(1)} ms`
              })
              .join('; '),
        )
      }
      const delivery =
        !ONLY || 'GET /api/v1/board/stream'.includes(ONLY)
          ? await measureDelivery(
              server.url,
              headers,
              await firstLinesetId(server.url, headers),
              OPEN_BOARDS,
              STREAM_CHANGES,
            )
          : null
      if (delivery)
        say(
          `a change through the API reaching ${delivery.streams} open boards (${delivery.changes} changes, from the ` +
            `write's answer to the event's arrival): median ${delivery.medianMs.toFixed(1)} ms, p95 ` +
            `${delivery.p95Ms.toFixed(1)} ms, slowest ${delivery.maxMs.toFixed(1)} ms; from sending the write: median ` +
            `${delivery.fromRequest.medianMs.toFixed(1)} ms, p95 ${delivery.fromRequest.p95Ms.toFixed(1)} ms, slowest ` +
            `${delivery.fromRequest.maxMs.toFixed(1)} ms (targets: p95 < ` +
            `${STREAM_P95_TARGET_MS} ms, every one < ${STREAM_MAX_TARGET_MS} ms)`,
        )
      // Judged from sending the write: the stricter of the two, and what the person making the change sees.
      const slowStream =
        delivery &&
        (delivery.fromRequest.p95Ms >= STREAM_P95_TARGET_MS || delivery.fromRequest.maxMs >= STREAM_MAX_TARGET_MS)
      const missed =
        !list ||
        list.p95Ms >= LIST_P95_TARGET_MS ||
        (figures.get('GET /api/v1/board')?.p95Ms ?? 0) >= LIST_P95_TARGET_MS ||
        !(ratio >= CALCULATION_RATIO_TARGET) ||
        Boolean(slowStream)
      say(missed ? 'a target was missed' : 'targets met')
      process.exitCode = [...figures.values()].some((f) => f.failures) ? 1 : 0
    } finally {
      await bare.stop()
      await server.stop()
    }
  } finally {
    stopCluster(cluster)
    rmSync(cluster.root, { recursive: true, force: true })
    rmSync(files, { recursive: true, force: true })
  }
}

await main()
