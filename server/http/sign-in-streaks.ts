import { QueryTypes, type Sequelize } from 'sequelize'
import { pruneRateLimitHits } from './rate-limit-store.js'

/** Sign-in attempts a streak may make at once; each further attempt must wait. */
export const FREE_ATTEMPTS = 5
/** The wait after the last free attempt (unless configured), doubled after every further one ... */
export const FIRST_WAIT_SECONDS = 1
/** ... up to this (so a stranger can make at most about 100 guesses a day at one account). */
export const LONGEST_WAIT_SECONDS = 15 * 60
/** A streak with no attempt for this long is forgotten. */
export const FORGET_AFTER_SECONDS = 24 * 60 * 60

/**
 * Seconds the next attempt must wait, after `attempts` attempts of a streak without a success.
 *
 * @example
 * waitAfter(4) // 0
 * waitAfter(5) // 1
 * waitAfter(7) // 4
 */
export function waitAfter(attempts: number, firstWait = FIRST_WAIT_SECONDS): number {
  if (attempts < FREE_ATTEMPTS) return 0
  return Math.min(LONGEST_WAIT_SECONDS, firstWait * 2 ** Math.min(attempts - FREE_ATTEMPTS, 20))
}

// The same waits in SQL, for the attempt count `n`; the exponent is capped so power() cannot overflow.
// `firstWait` is a validated integer from the configuration, never request data.
const waitSql = (n: string, firstWait: number) =>
  `LEAST(${LONGEST_WAIT_SECONDS}, CASE WHEN ${n} < ${FREE_ATTEMPTS} THEN 0
     ELSE ${Math.trunc(firstWait)} * power(2, LEAST(${n} - ${FREE_ATTEMPTS}, 20)) END)`

const NEXT_ATTEMPTS = `CASE WHEN rate_limit_hits.reset_at + make_interval(secs => ${FORGET_AFTER_SECONDS}) <= now()
  THEN 1 ELSE rate_limit_hits.hits + 1 END`

export type Claim = { allowed: true } | { allowed: false; retryAfterSeconds: number }

/**
 * Attempt streaks kept in PostgreSQL (rows of `rate_limit_hits`: `hits` counts the attempts since the last
 * success, `reset_at` is the moment the next attempt may start), so every app process shares them.
 * An attempt is claimed, atomically, before the password is checked: of many parallel guesses only those
 * the streak allows get through, and a refused one costs no password check and does not lengthen the wait.
 */
export class SignInStreaks {
  constructor(
    private readonly sequelize: Sequelize,
    private readonly firstWait = FIRST_WAIT_SECONDS,
  ) {}

  private key(name: string) {
    return `sign-in-streak:${name}`
  }

  /** Counts an attempt of the streak if its wait is over; otherwise says how long is left. */
  async claim(name: string): Promise<Claim> {
    await pruneRateLimitHits(this.sequelize)
    const key = this.key(name)
    const claimed = await this.sequelize.query<{ hits: number }>(
      `INSERT INTO rate_limit_hits (key, hits, reset_at) VALUES (:key, 1, now() + make_interval(secs => ${waitSql('1', this.firstWait)}))
       ON CONFLICT (key) DO UPDATE SET
         hits = ${NEXT_ATTEMPTS},
         reset_at = now() + make_interval(secs => ${waitSql(NEXT_ATTEMPTS, this.firstWait)})
       WHERE rate_limit_hits.reset_at <= now()
       RETURNING hits`,
      { replacements: { key }, type: QueryTypes.SELECT },
    )
    if (claimed.length > 0) return { allowed: true }
    const waiting = await this.sequelize.query<{ seconds: string }>(
      `SELECT ceil(extract(epoch FROM reset_at - now())) AS seconds FROM rate_limit_hits WHERE key = :key`,
      { replacements: { key }, type: QueryTypes.SELECT },
    )
    return { allowed: false, retryAfterSeconds: Math.max(1, Number(waiting[0]?.seconds ?? 1)) }
  }

  /** A success ends the streak. */
  async forget(name: string): Promise<void> {
    await this.sequelize.query(`DELETE FROM rate_limit_hits WHERE key = :key`, {
      replacements: { key: this.key(name) },
    })
  }
}
