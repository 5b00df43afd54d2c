import pg from 'pg'
import type { QueryInterface, Sequelize } from 'sequelize'
import { SequelizeStorage, Umzug } from 'umzug'
import { migrations } from './migrations/index.js'

const MIGRATION_LOCK = 7236110

/** The migrator: schema changes happen only here, never through `sync()`. Each migration runs in a transaction. */
export function createMigrator(sequelize: Sequelize) {
  const context: QueryInterface = sequelize.getQueryInterface()
  const inTransaction = (sql: string) => sequelize.transaction((transaction) => sequelize.query(sql, { transaction }))
  return new Umzug({
    migrations: migrations.map((m) => ({
      name: m.name,
      up: () => inTransaction(m.up),
      down: () => inTransaction(m.down),
    })),
    context,
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  })
}

/** Applies every pending migration. Several app processes may start at once: a PostgreSQL advisory lock lets one migrate. */
export async function migrate(sequelize: Sequelize, databaseUrl: string) {
  const lockHolder = new pg.Client({ connectionString: databaseUrl })
  await lockHolder.connect()
  try {
    await lockHolder.query('SELECT pg_advisory_lock($1)', [MIGRATION_LOCK])
    return await createMigrator(sequelize).up()
  } finally {
    await lockHolder.query('SELECT pg_advisory_unlock($1)', [MIGRATION_LOCK]).catch(() => {})
    await lockHolder.end()
  }
}
