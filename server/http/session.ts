import connectPgSimple from 'connect-pg-simple'
import session from 'express-session'
import type pg from 'pg'
import type { Config } from '../config.js'

const PgStore = connectPgSimple(session)
const TWELVE_HOURS = 12 * 60 * 60 * 1000

/** Sessions live in PostgreSQL (table `sessions`, made by a migration), so they survive restarts and are shared. */
export function sessionMiddleware(config: Config, pool: pg.Pool) {
  const store = new PgStore({
    pool,
    tableName: 'sessions',
    createTableIfMissing: false,
    // Tests start and stop many servers; a pruning timer would outlive them.
    pruneSessionInterval: config.env === 'test' ? false : 15 * 60,
    errorLog: () => {}, // failures reach the error handler as a 503; no need to log twice
  })
  const middleware = session({
    name: 'loftledger.sid',
    secret: config.sessionSecret,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: { httpOnly: true, sameSite: 'lax', secure: config.secureCookies, maxAge: TWELVE_HOURS },
  })
  return { middleware, close: () => store.close() }
}
