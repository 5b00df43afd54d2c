import type { Options, Store, IncrementResponse } from 'express-rate-limit'
import { QueryTypes, type Sequelize } from 'sequelize'

/**
 * express-rate-limit counters kept in PostgreSQL, so every app process behind one database
 * shares them. One row per key; a window that has ended restarts at the next hit.
 */
export class PostgresRateLimitStore implements Store {
  private windowMs = 60_000
  readonly localKeys = false

  constructor(
    private readonly sequelize: Sequelize,
    readonly prefix: string,
  ) {}

  init(options: Options) {
    this.windowMs = options.windowMs
  }

  private key(key: string) {
    return `${this.prefix}:${key}`
  }

  async increment(key: string): Promise<IncrementResponse> {
    const rows = await this.sequelize.query<{ hits: number; reset_at: Date }>(
      `INSERT INTO rate_limit_hits (key, hits, reset_at)
       VALUES (:key, 1, now() + make_interval(secs => :seconds))
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN rate_limit_hits.reset_at <= now() THEN 1 ELSE rate_limit_hits.hits + 1 END,
         reset_at = CASE WHEN rate_limit_hits.reset_at <= now() THEN EXCLUDED.reset_at ELSE rate_limit_hits.reset_at END
       RETURNING hits, reset_at`,
      { replacements: { key: this.key(key), seconds: this.windowMs / 1000 }, type: QueryTypes.SELECT },
    )
    const row = rows[0]!
    return { totalHits: Number(row.hits), resetTime: new Date(row.reset_at) }
  }

  async decrement(key: string) {
    await this.sequelize.query(`UPDATE rate_limit_hits SET hits = GREATEST(hits - 1, 0) WHERE key = :key`, {
      replacements: { key: this.key(key) },
    })
  }

  async resetKey(key: string) {
    await this.sequelize.query(`DELETE FROM rate_limit_hits WHERE key = :key`, { replacements: { key: this.key(key) } })
  }
}

const PRUNE_EVERY_MS = 60 * 60 * 1000
const lastPruned = new WeakMap<Sequelize, number>()

/**
 * Deletes counters that ended more than a day ago (attempts at made-up e-mail addresses would otherwise
 * pile up), at most once an hour per database connection.
 */
export async function pruneRateLimitHits(sequelize: Sequelize) {
  const now = Date.now()
  if (now - (lastPruned.get(sequelize) ?? 0) < PRUNE_EVERY_MS) return
  lastPruned.set(sequelize, now)
  await sequelize.query(`DELETE FROM rate_limit_hits WHERE reset_at < now() - interval '1 day'`)
}
