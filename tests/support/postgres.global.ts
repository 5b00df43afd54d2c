// A throwaway PostgreSQL cluster of this test run's own (so parallel runs on one machine never touch each
// other's data), and a migrated template database that each API test file clones into a database of its own.
import { rmSync } from 'node:fs'
import pg from 'pg'
import type { TestProject } from 'vitest/node'
import { connectDatabase } from '../../server/db/connection.js'
import { migrate } from '../../server/db/migrate.js'
import { startCluster, stopCluster } from '../../scripts/lib/postgres.js'
import { freePort } from './free-port.js'

declare module 'vitest' {
  export interface ProvidedContext {
    pgAdminUrl: string
    pgTemplateDatabase: string
  }
}

export default async function setup(project: TestProject) {
  const { cluster } = startCluster({ name: `postgres-test-${process.pid}`, port: await freePort(), fast: true })
  const template = 'loftledger_template'
  const admin = new pg.Client({ connectionString: cluster.adminUrl })
  await admin.connect()
  await admin.query(`CREATE DATABASE ${template}`)
  await admin.end()
  const connections = connectDatabase(cluster.urlFor(template))
  await migrate(connections.sequelize, cluster.urlFor(template))
  await connections.close()

  project.provide('pgAdminUrl', cluster.adminUrl)
  project.provide('pgTemplateDatabase', template)

  return () => {
    stopCluster(cluster)
    rmSync(cluster.root, { recursive: true, force: true })
  }
}
