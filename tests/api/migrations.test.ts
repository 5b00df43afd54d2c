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

describe('migration 0005: arbor contents and the brick stock', () => {
  it('when brick types exist before it, then every brick they own lands in storage and the identity holds', async () => {
    const { sequelize, close } = connectDatabase(await createTestDatabase())
    try {
      const migrator = createMigrator(sequelize)
      await migrator.down({ to: '0005-arbor-contents-brick-stock' })
      await sequelize.query(`
        INSERT INTO venues (id, name, unit_system, balance_tolerance, rope_lock_holding)
          VALUES ('00000000-0000-4000-8000-000000000001', 'Before', 'metric', 4.5, 22.7);
        INSERT INTO brick_types (venue_id, name, material, unit_weight, thickness, quantity_owned)
          VALUES ('00000000-0000-4000-8000-000000000001', 'Old full', 'Steel', 9, 0.05, 320);`)
      await migrator.up()
      const [rows] = await sequelize.query(
        'SELECT quantity_owned, on_arbors, reserved, in_storage FROM brick_types WHERE name = $1',
        { bind: ['Old full'] },
      )
      expect(rows).toEqual([{ quantity_owned: 320, on_arbors: 0, reserved: 0, in_storage: 320 }])
    } finally {
      await close()
    }
  })
})
