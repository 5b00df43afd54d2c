// `npm start`: the private PostgreSQL cluster, a local mail sink, migrations, demo data, the built client and
// the server, in one process that stops all of it on Ctrl-C.
import { mkdirSync, writeFileSync } from 'node:fs'
import { createServer } from 'node:net'
import { join, relative } from 'node:path'
import { loadConfig } from '../server/config.js'
import { connectDatabase } from '../server/db/connection.js'
import { migrate } from '../server/db/migrate.js'
import { DEMO_PASSWORD, DEMO_PEOPLE } from '../server/db/seeders/demo-people.js'
import { seedDemoIfEmpty } from '../server/db/seeders/demo.js'
import { ListenError, startServer } from '../server/index.js'
import { buildClientIfStale } from './lib/client-build.js'
import { ensureDatabase } from './lib/database.js'
import { shouldSeedDemo } from './lib/demo-seeding.js'
import { loadDotEnv, localSessionSecret } from './lib/local-env.js'
import { startMailSink, type MailSink, type ReceivedMail } from './lib/mail-sink.js'
import { projectRoot } from './lib/paths.js'
import { startCluster, stopCluster, type Cluster } from './lib/postgres.js'

const say = (line: string) => console.log(`loftledger: ${line}`)

function portIsFree(host: string, port: number) {
  return new Promise<boolean>((resolve) => {
    const probe = createServer()
    probe.once('error', () => resolve(false))
    probe.listen(port, host, () => probe.close(() => resolve(true)))
  })
}

/** Keeps each message the local sink takes as a file and says where, so its links can be followed. */
function keepMail(mail: ReceivedMail) {
  const folder = join(projectRoot, '.data', 'mail')
  mkdirSync(folder, { recursive: true })
  const file = join(folder, `${new Date().toISOString().replace(/[:.]/g, '-')}.eml`)
  writeFileSync(file, mail.raw)
  say(`mail to ${mail.to.join(', ')}: "${mail.subject}" (kept in ${relative(projectRoot, file)})`)
  for (const link of mail.text.match(/https?:\/\/\S+/g) ?? []) console.log(`  ${link}`)
}

async function main() {
  loadDotEnv()
  const host = process.env.HOST ?? '127.0.0.1'
  const port = Number(process.env.PORT ?? 3000)
  if (!(await portIsFree(host, port)))
    throw new ListenError(
      `Port ${port} on ${host} is already in use; stop whatever uses it or set PORT to another port`,
    )

  const privateCluster = !process.env.DATABASE_URL
  const seedDemo = shouldSeedDemo({ privateCluster, seedDemo: process.env.SEED_DEMO })
  let mailSink: MailSink | null = null
  if (!process.env.SMTP_URL) {
    mailSink = await startMailSink(keepMail)
    process.env.SMTP_URL = mailSink.url
    say(`no SMTP_URL: e-mail goes to a local sink on 127.0.0.1:${mailSink.port} and is printed here`)
  }
  let cluster: Cluster | null = null
  if (privateCluster) {
    say('starting the private PostgreSQL cluster...')
    const name = process.env.LOFTLEDGER_CLUSTER ?? 'postgres'
    cluster = startCluster({ name, port: Number(process.env.LOFTLEDGER_PG_PORT ?? 54329), password: true }).cluster
    await ensureDatabase(cluster.adminUrl, 'loftledger')
    process.env.DATABASE_URL = cluster.urlFor('loftledger')
    process.env.SESSION_SECRET ??= localSessionSecret(cluster.root)
  }
  const stopDatabase = () => {
    if (cluster) stopCluster(cluster)
  }
  const stopMail = () => mailSink?.close()

  try {
    const config = loadConfig({ ...process.env, CLIENT_DIR: process.env.CLIENT_DIR ?? join(projectRoot, 'dist') })
    const setup = connectDatabase(config.databaseUrl)
    await migrate(setup.sequelize, config.databaseUrl)
    await setup.close()
    if (await buildClientIfStale(config.clientDir)) say('built the client')

    const running = await startServer(config)
    if (!seedDemo) say('not seeding the demo venue (its passwords are public; SEED_DEMO=true seeds it)')
    else if (await seedDemoIfEmpty(running.handle.context)) say('seeded the demo venue')
    say(`serving on ${running.url}`)
    if (seedDemo) {
      say(`demo sign-ins (password ${DEMO_PASSWORD}):`)
      for (const person of DEMO_PEOPLE) console.log(`  ${person.email.padEnd(18)} ${person.role}`)
    }
    say('press Ctrl-C to stop')

    let stopping = false
    const stop = async () => {
      if (stopping) return
      stopping = true
      say('stopping...')
      await running.stop()
      await stopMail()
      stopDatabase()
      say('stopped')
      process.exit(0)
    }
    process.on('SIGINT', stop)
    process.on('SIGTERM', stop)
  } catch (error) {
    await stopMail()
    stopDatabase()
    throw error
  }
}

main().catch((error) => {
  console.error(
    `loftledger: ${error instanceof ListenError ? error.message : error instanceof Error ? error.message : String(error)}`,
  )
  process.exit(1)
})
