// One throwaway PostgreSQL cluster for the whole test run, and a migrated template database that each
// API test file clones into a database of its own (so files run in parallel without sharing rows).
import type { TestProject } from 'vitest/node'
import pg from 'pg'
import { connectDatabase } from '../../server/db/connection.js'
import { migrate } from '../../server/db/migrate.js'
import { startCluster, stopCluster } from '../../scripts/lib/postgres.js'

declare module 'vitest' {
  export interface ProvidedContext {
    pgAdminUrl: string
    pgTemplateDatabase: string
  }
}

export default async function setup(project: TestProject) {
  const { cluster, started } = startCluster({ name: 'postgres-test', port: Number(process.env.LOFTLEDGER_TEST_PG_PORT ?? 54339), fast: true })
  const template = `loftledger_template_${process.pid}`
  const admin = new pg.Client({ connectionString: cluster.adminUrl })
  await admin.connect()
  await admin.query(`DROP DATABASE IF EXISTS ${template}`)
  await admin.query(`CREATE DATABASE ${template}`)
  await admin.end()
  const connections = connectDatabase(cluster.urlFor(template))
  await migrate(connections.sequelize, cluster.urlFor(template))
  await connections.close()

  project.provide('pgAdminUrl', cluster.adminUrl)
  project.provide('pgTemplateDatabase', template)

  return async () => {
    const cleanup = new pg.Client({ connectionString: cluster.adminUrl })
    await cleanup.connect()
    const { rows } = await cleanup.query<{ datname: string }>(
      `SELECT datname FROM pg_database WHERE datname LIKE 'loftledger_test_%' OR datname = $1`,
      [template],
    )
    for (const { datname } of rows) await cleanup.query(`DROP DATABASE IF EXISTS "${datname}" WITH (FORCE)`)
    await cleanup.end()
    if (started) stopCluster(cluster)
  }
}
