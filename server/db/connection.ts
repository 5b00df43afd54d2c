import pg from 'pg'
import { Sequelize } from 'sequelize'

// NUMERIC stays a string end to end: quantities are exact decimals, never floats.
pg.types.setTypeParser(pg.types.builtins.NUMERIC, (value) => value)

export interface DatabaseConnections {
  sequelize: Sequelize
  /** A small pg pool for the session store, separate so a long query never starves sign-in. */
  sessionPool: pg.Pool
  close(): Promise<void>
}

/** Opens the ORM and the session pool against one PostgreSQL database. */
export function connectDatabase(databaseUrl: string): DatabaseConnections {
  const sequelize = new Sequelize(databaseUrl, {
    dialect: 'postgres',
    logging: false,
    pool: { max: 10, min: 0, acquire: 10_000, idle: 10_000 },
    dialectOptions: { connectionTimeoutMillis: 5_000 },
    define: { underscored: true },
  })
  const sessionPool = new pg.Pool({ connectionString: databaseUrl, max: 4, connectionTimeoutMillis: 5_000 })
  // An idle client whose server went away must not crash the process; the next query reconnects.
  sessionPool.on('error', () => {})
  return {
    sequelize,
    sessionPool,
    async close() {
      await Promise.allSettled([sequelize.close(), sessionPool.end()])
    },
  }
}
