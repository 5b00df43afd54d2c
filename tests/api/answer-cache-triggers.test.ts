import { QueryTypes, type Sequelize } from 'sequelize'
import { describe, expect, it } from 'vitest'
import type { ServiceContext } from '../../server/context.js'
import { getBoard } from '../../server/modules/board/board.service.js'
import { listLinesets } from '../../server/modules/linesets/lineset.service.js'
import { venueSuite } from '../support/venue-suite.js'

const suite = venueSuite()

/** Every statement `work` sends, its text as written. */
async function statementsOf(ctx: ServiceContext, work: (ctx: ServiceContext) => Promise<unknown>) {
  const seen: string[] = []
  const sequelize = new Proxy(ctx.db.sequelize, {
    get(target, name, receiver) {
      if (name !== 'query') return Reflect.get(target, name, receiver)
      return (sql: string, options: unknown) => {
        seen.push(sql)
        return target.query(sql, options as never)
      }
    },
  }) as Sequelize
  await work({ ...ctx, db: { ...ctx.db, sequelize } })
  return seen
}

const TABLE_AFTER_FROM_OR_JOIN = /\b(?:FROM|JOIN)\s+([a-z_][a-z0-9_]*)/gi

describe('what keeps stored answers current', () => {
  it('when the list and the board are computed, then every table their statements read carries the trigger that moves the venue epoch', async () => {
    const { app, venue } = suite
    const ctx: ServiceContext = { ...app.handle.context, actor: venue.members['stage-manager'] }
    const production = await app.handle.db.sequelize.query<{ id: string }>(
      `INSERT INTO productions (venue_id, name, first_performance, last_performance)
         VALUES ($1, 'Paper Moons', '2026-09-01', '2026-09-30') RETURNING id`,
      { bind: [venue.venueId], type: QueryTypes.SELECT },
    )
    const statements = [
      ...(await statementsOf(ctx, listLinesets)),
      ...(await statementsOf(ctx, (member) => getBoard(member, {}))),
      ...(await statementsOf(ctx, (member) => getBoard(member, { productionId: production[0]!.id }))),
    ]
    const named = new Set(statements.flatMap((sql) => [...sql.matchAll(TABLE_AFTER_FROM_OR_JOIN)].map((m) => m[1]!)))
    const tables = await app.handle.db.sequelize.query<{ table: string; followed: boolean }>(
      `SELECT c.relname AS table,
              EXISTS (SELECT 1 FROM pg_trigger t JOIN pg_proc p ON p.oid = t.tgfoid
                       WHERE t.tgrelid = c.oid AND t.tgdeferrable AND t.tginitdeferred
                         AND p.proname LIKE 'answers_follow%') AS followed
         FROM pg_class c
        WHERE c.relnamespace = 'public'::regnamespace AND c.relkind = 'r' AND c.relname = ANY($1::text[])`,
      { bind: [[...named]], type: QueryTypes.SELECT },
    )
    // The statements name these at least (a sanity check on the reading of their text).
    expect(tables.map((found) => found.table)).toEqual(
      expect.arrayContaining(['linesets', 'hangs', 'users', 'venues', 'pre_run_checks', 'productions']),
    )
    expect(tables.filter((found) => !found.followed).map((found) => found.table)).toEqual([])
  })

  it('when a venue is deleted with its last rows in one transaction, then it commits and leaves no epoch or stored answer', async () => {
    const db = suite.app.handle.db.sequelize
    const query = (sql: string, bind: unknown[] = []) =>
      db.query<{ id: string }>(sql, { bind, type: QueryTypes.SELECT })
    const [venue] = await query(
      `INSERT INTO venues (name, unit_system, balance_tolerance, rope_lock_holding)
         VALUES ('Short Lease Hall', 'metric', 4.5, 22.7) RETURNING id`,
    )
    await query(
      `INSERT INTO brick_types (venue_id, name, material, unit_weight, thickness, quantity_owned, in_storage)
         VALUES ($1, 'Half', 'Steel', 4.5, 0.025, 10, 10) RETURNING id`,
      [venue!.id],
    )
    const stored = await query(
      `INSERT INTO answer_cache (venue_id, key, epoch, body, brotli, gzip)
         SELECT venue_id, 'build:linesets', epoch, '\\x5b5d', '\\x00', '\\x00' FROM answer_epochs WHERE venue_id = $1
         RETURNING venue_id AS id`,
      [venue!.id],
    )
    expect(stored).toHaveLength(1)
    // The brick type's trigger runs at commit, after its venue is gone: it must find nothing to touch.
    await db.transaction(async (transaction) => {
      await db.query('DELETE FROM brick_types WHERE venue_id = $1', { bind: [venue!.id], transaction })
      await db.query('DELETE FROM venues WHERE id = $1', { bind: [venue!.id], transaction })
    })
    const left = await db.query<{ epochs: number; stored: number }>(
      `SELECT (SELECT count(*) FROM answer_epochs WHERE venue_id = $1)::int AS epochs,
              (SELECT count(*) FROM answer_cache WHERE venue_id = $1)::int AS stored`,
      { bind: [venue!.id], type: QueryTypes.SELECT },
    )
    expect(left).toEqual([{ epochs: 0, stored: 0 }])
  })
})
