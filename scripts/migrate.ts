// `npm run migrate`: applies pending migrations to DATABASE_URL (for deployments on an existing server).
import { connectDatabase } from '../server/db/connection.js'
import { migrate } from '../server/db/migrate.js'
import { loadDotEnv } from './lib/local-env.js'

loadDotEnv()
const url = process.env.DATABASE_URL
if (!url) {
  console.error('loftledger: set DATABASE_URL (npm start migrates its private cluster by itself)')
  process.exit(2)
}
const { sequelize, close } = connectDatabase(url)
migrate(sequelize, url)
  .then((applied) => console.log(`loftledger: applied ${applied.length} migration(s)`))
  .catch((error) => {
    console.error(`loftledger: migration failed: ${error instanceof Error ? error.message : error}`)
    process.exitCode = 1
  })
  .finally(close)
