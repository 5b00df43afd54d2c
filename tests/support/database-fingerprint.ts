import { QueryTypes, type Sequelize } from 'sequelize'

const IGNORED = ['sessions', 'rate_limit_hits', 'schema_migrations']

/**
 * A fingerprint of everything a request could have written: the row count, version sum and latest change of
 * every table but the session and rate-limit ones. Two equal fingerprints around a refused request prove it
 * wrote nothing.
 */
export async function databaseFingerprint(sequelize: Sequelize): Promise<string> {
  const columns = await sequelize.query<{ table_name: string; column_name: string }>(
    `SELECT c.table_name, c.column_name FROM information_schema.columns c
       JOIN information_schema.tables t ON t.table_name = c.table_name AND t.table_schema = c.table_schema
      WHERE c.table_schema = 'public' AND t.table_type = 'BASE TABLE'
      ORDER BY c.table_name, c.column_name`,
    { type: QueryTypes.SELECT },
  )
  const tables = new Map<string, Set<string>>()
  for (const { table_name: table, column_name: column } of columns) {
    if (IGNORED.includes(table)) continue
    tables.set(table, (tables.get(table) ?? new Set()).add(column))
  }
  const parts = [...tables].map(([table, names]) => {
    const version = names.has('version') ? 'coalesce(sum(version), 0)' : '0'
    const updated = names.has('updated_at') ? "coalesce(max(updated_at)::text, '-')" : "'-'"
    return `SELECT '${table}:' || count(*) || '/' || ${version} || '/' || ${updated} AS part FROM "${table}"`
  })
  const rows = await sequelize.query<{ part: string }>(parts.join(' UNION ALL '), { type: QueryTypes.SELECT })
  return rows.map((row) => row.part).join(' ')
}
