// A throwaway PostgreSQL cluster of this test run's own (so parallel runs on one machine never touch each
// other's data), and a migrated template database that each API test file clones into a database of its own.
import { readdirSync, rmSync } from 'node:fs'
import { join } from 'node:path'
import pg from 'pg'
import type { TestProject } from 'vitest/node'
import { connectDatabase } from '../../server/db/connection.js'
import { migrate } from '../../server/db/migrate.js'
import { dataRoot, startCluster, stopCluster } from '../../scripts/lib/postgres.js'
import { freePort } from './free-port.js'

declare module 'vitest' {
  export interface ProvidedContext {
    pgAdminUrl: string
    pgTemplateDatabase: string
  }
}

const isAlive = (pid: number) => {
  try {
    process.kill(pid, 0)
    return true
  } catch {
    return false
  }
}

/** Clusters left by runs that died before their teardown: stop them and free their folders. */
function removeAbandonedClusters(root: string) {
  for (const name of readdirSync(root)) {
    const match = /^postgres-test-(\d+)$/.exec(name)
    if (!match || isAlive(Number(match[1]))) continue
    const folder = join(root, name)
    try {
      stopCluster({ dataDir: join(folder, 'data') })
    } catch {
      // Already stopped or half-made; removing the folder is all that is left to do.
    }
    rmSync(folder, { recursive: true, force: true })
  }
}

export default async function setup(project: TestProject) {
  removeAbandonedClusters(dataRoot())
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
