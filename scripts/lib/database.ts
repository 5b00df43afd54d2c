import pg from 'pg'

/** Creates a database on a server if it does not exist yet. */
export async function ensureDatabase(adminUrl: string, name: string) {
  const client = new pg.Client({ connectionString: adminUrl })
  await client.connect()
  try {
    const found = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [name])
    if (found.rowCount === 0) await client.query(`CREATE DATABASE "${name.replaceAll('"', '""')}"`)
  } finally {
    await client.end()
  }
}
