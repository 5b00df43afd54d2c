import { randomBytes } from 'node:crypto'
import pg from 'pg'
import { inject } from 'vitest'

/** A fresh, migrated database for one test file, cloned from the run's template. */
export async function createTestDatabase(): Promise<string> {
  const adminUrl = inject('pgAdminUrl')
  const name = `loftledger_test_${randomBytes(6).toString('hex')}`
  const admin = new pg.Client({ connectionString: adminUrl })
  await admin.connect()
  await admin.query(`CREATE DATABASE ${name} TEMPLATE ${inject('pgTemplateDatabase')}`)
  await admin.end()
  const url = new URL(adminUrl)
  url.pathname = `/${name}`
  return url.toString()
}
