// `npm run venue:open -- --venue "Name" --units metric --email you@example.org --name "Your Name"`
// Opens a venue and its first administrator on DATABASE_URL (with SESSION_SECRET, as for the server):
// the way in for a deployment on its own PostgreSQL, where no demo is seeded. The password comes from LOFTLEDGER_ADMIN_PASSWORD or, when
// that is unset, from the first line of standard input, so it never sits in the shell's history.
import { createInterface } from 'node:readline/promises'
import { parseArgs } from 'node:util'
import { validationErrorBody } from '../shared/errors/fields.js'
import { venueOpeningSchema } from '../shared/schemas/venue-opening.js'
import { loadConfig } from '../server/config.js'
import { createApp } from '../server/app.js'
import { migrate } from '../server/db/migrate.js'
import { AppError } from '../server/http/errors.js'
import { openVenue } from '../server/modules/venues/venue-opening.service.js'
import { loadDotEnv } from './lib/local-env.js'

async function readPassword(): Promise<string> {
  if (process.env.LOFTLEDGER_ADMIN_PASSWORD) return process.env.LOFTLEDGER_ADMIN_PASSWORD
  const lines = createInterface({ input: process.stdin, terminal: false })
  if (process.stdin.isTTY) process.stderr.write('Password for the first administrator: ')
  for await (const line of lines) return line
  return ''
}

async function main() {
  loadDotEnv()
  const { values } = parseArgs({
    options: {
      venue: { type: 'string' },
      units: { type: 'string' },
      email: { type: 'string' },
      name: { type: 'string' },
    },
  })
  const parsed = venueOpeningSchema.safeParse({
    venueName: values.venue,
    unitSystem: values.units ?? 'imperial',
    email: values.email,
    name: values.name,
    password: await readPassword(),
  })
  if (!parsed.success) {
    console.error(JSON.stringify(validationErrorBody(parsed.error.issues), null, 2))
    return 2
  }
  const config = loadConfig(process.env)
  const handle = createApp(config)
  try {
    await migrate(handle.db.sequelize, config.databaseUrl)
    const administrator = await openVenue({ ...handle.context, actor: null }, parsed.data)
    console.log(`loftledger: opened "${parsed.data.venueName}"; ${administrator.email} signs in as its administrator`)
    return 0
  } catch (error) {
    if (!(error instanceof AppError)) throw error
    console.error(`loftledger: ${error.message}`)
    return 2
  } finally {
    await handle.close()
  }
}

main().then((code) => (process.exitCode = code))
