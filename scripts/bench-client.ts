/**
 * The client's weight and start-up speed, as a person on a slow phone meets them: the built client served by the
 * real server with the demo venue on a throwaway database, opened in Debian's Chromium with an empty cache.
 * Prints the bytes that cross the wire (encoded sizes, as sent) to show the sign-in page and to reach the
 * linesets list after signing in, and the sign-in page's times with the CPU slowed 4x: until its fields take typing
 * and a press of Sign in (the plain form index.html carries), and until the app's own form has taken over.
 * `npm run bench:client -- --requests` also lists every request with its size.
 * Targets: at most 300 KB to reach the linesets list; the sign-in page interactive within 1 s.
 */
import { rmSync } from 'node:fs'
import { join } from 'node:path'
import { DEMO_PASSWORD } from '../server/db/seeders/demo-people.js'
import { seedDemoIfEmpty } from '../server/db/seeders/demo.js'
import { loadConfig } from '../server/config.js'
import { startServer } from '../server/index.js'
import { launchBenchChromium, measureWire, timeToInteractive, type SignInTimes } from './lib/client-weight.js'
import { buildClientIfStale } from './lib/client-build.js'
import { ensureDatabase } from './lib/database.js'
import { freePort } from './lib/free-port.js'
import { projectRoot } from './lib/paths.js'
import { startCluster, stopCluster } from './lib/postgres.js'

const WIRE_TARGET_KB = 300
const INTERACTIVE_TARGET_MS = 1000
const RUNS = 5

const kb = (bytes: number) => `${(bytes / 1024).toFixed(1)} KB`
const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!

async function main() {
  const clientDir = join(projectRoot, 'dist')
  await buildClientIfStale(clientDir)
  const { cluster } = startCluster({ name: `postgres-bench-${process.pid}`, port: await freePort(), fast: true })
  let stopServer = async () => {}
  let closeBrowser = async () => {}
  try {
    await ensureDatabase(cluster.adminUrl, 'loftledger_bench')
    const config = loadConfig({
      NODE_ENV: 'test',
      PORT: '0',
      DATABASE_URL: cluster.urlFor('loftledger_bench'),
      SESSION_SECRET: 'bench-secret-bench-secret-bench-secret-01',
      CLIENT_DIR: clientDir,
      FILE_STORAGE_DIR: join(cluster.root, 'files'),
    })
    const running = await startServer(config)
    stopServer = running.stop
    await seedDemoIfEmpty(running.handle.context)
    const browser = await launchBenchChromium()
    closeBrowser = () => browser.close()

    const wire = await measureWire(browser, running.url, { email: 'fly@demo.test', password: DEMO_PASSWORD })
    const runs: SignInTimes[] = []
    for (let run = 0; run < RUNS; run += 1) runs.push(await timeToInteractive(browser, `${running.url}/sign-in`, 4))
    const times = runs.map((run) => run.interactive)
    const appTimes = runs.map((run) => run.appReady)
    const interactive = median(times)
    console.log('Client weight (encoded bytes over the wire, empty cache, demo data)')
    console.log(`  sign-in page shown:                     ${kb(wire.signIn)} in ${wire.signInRequests} requests`)
    console.log(`  signing in and reaching the linesets list: +${kb(wire.toList - wire.signIn)}`)
    console.log(`  total from a fresh start to the list:   ${kb(wire.toList)} (target <= ${WIRE_TARGET_KB} KB)`)
    for (const [kind, bytes] of Object.entries(wire.byKind)) console.log(`    ${kind.padEnd(12)} ${kb(bytes)}`)
    if (process.argv.includes('--requests'))
      for (const { path, bytes } of wire.requests) console.log(`      ${kb(bytes).padStart(10)}  ${path}`)
    console.log(`Sign-in page interactive at 4x CPU slowdown, loopback (${RUNS} runs, empty cache)`)
    console.log(`  fields take typing and a press of Sign in (the plain form in index.html):`)
    console.log(`    median ${interactive.toFixed(0)} ms, each: ${times.map((t) => t.toFixed(0)).join(', ')} ms`)
    console.log(`    target <= ${INTERACTIVE_TARGET_MS} ms`)
    console.log(`  the app's own form has taken over (a held press is sent then):`)
    console.log(
      `    median ${median(appTimes).toFixed(0)} ms, each: ${appTimes.map((t) => t.toFixed(0)).join(', ')} ms`,
    )
    const met = wire.toList <= WIRE_TARGET_KB * 1024 && interactive <= INTERACTIVE_TARGET_MS
    console.log(met ? 'Both targets met.' : 'A target is missed.')
    process.exitCode = met ? 0 : 1
  } finally {
    await closeBrowser()
    await stopServer()
    stopCluster(cluster)
    rmSync(cluster.root, { recursive: true, force: true })
  }
}

await main()
