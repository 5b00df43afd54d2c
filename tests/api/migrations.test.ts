import { describe, expect, it } from 'vitest'
import { connectDatabase } from '../../server/db/connection.js'
import { createMigrator } from '../../server/db/migrate.js'
import { migrations } from '../../server/db/migrations/index.js'
import { createTestDatabase } from '../support/database.js'

const SCHEMA = `
  SELECT table_name || '.' || column_name || ' ' || data_type || ' ' || is_nullable AS line
    FROM information_schema.columns WHERE table_schema = 'public'
  UNION ALL
  SELECT conrelid::regclass || ' ' || pg_get_constraintdef(oid) FROM pg_constraint WHERE connamespace = 'public'::regnamespace
  UNION ALL
  SELECT indexdef FROM pg_indexes WHERE schemaname = 'public'
  ORDER BY 1`

describe('migrations', () => {
  it('when the latest migration is undone and applied again, then the schema is the same as before', async () => {
    const { sequelize, close } = connectDatabase(await createTestDatabase()) // cloned from the migrated template
    try {
      const schema = async () => (await sequelize.query(SCHEMA, { plain: false, raw: true }))[0]
      const before = await schema()
      const migrator = createMigrator(sequelize)
      await migrator.down()
      expect((await migrator.executed()).map((m) => m.name)).toEqual(migrations.slice(0, -1).map((m) => m.name))
      await migrator.up()
      expect(await schema()).toEqual(before)
    } finally {
      await close()
    }
  })
})
