import session from 'express-session'
import type { RequestHandler } from 'express'
import type pg from 'pg'
import type { Config } from '../config.js'
import { SessionStore } from './session-store.js'

/** A session ends after this long without a request. */
export const SESSION_LIFETIME_MS = 12 * 60 * 60 * 1000
/**
 * A signed-in session's expiry moves forward once this much of its lifetime has passed since it last moved,
 * not on every request: an idle session still ends between 11 and 12 hours after its last request, and a
 * read costs no write.
 */
export const SESSION_ROLL_AFTER_MS = 60 * 60 * 1000

declare module 'express-session' {
  interface SessionData {
    /** When the expiry last moved (ms since the epoch); changing it is what saves the session. */
    rolledAt?: number
  }
}

const signedIn = (data: object | undefined) => Boolean((data as { passport?: { user?: unknown } })?.passport?.user)

/**
 * Saves a signed-in session whose expiry is due to move: the save writes the new expiry with the session and
 * sends the cookie again with it. `cookie.expires` is as loaded here (express-session moves it only later).
 */
const rollWhenDue: RequestHandler = (req, _res, next) => {
  const expires = req.session?.cookie.expires
  if (signedIn(req.session) && expires && expires.getTime() - Date.now() < SESSION_LIFETIME_MS - SESSION_ROLL_AFTER_MS)
    req.session.rolledAt = Date.now()
  next()
}

/**
 * Sessions live in PostgreSQL (table `sessions`, made by a migration), so they survive restarts and are shared
 * by every app process; nothing about them is kept in a process's memory.
 */
export function sessionMiddleware(config: Config, pool: pg.Pool) {
  const store = new SessionStore(pool, {
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
    rolling: false,
    cookie: { httpOnly: true, sameSite: 'lax', secure: config.secureCookies, maxAge: SESSION_LIFETIME_MS },
  })
  return { middleware: [middleware, rollWhenDue], close: () => store.close() }
}
