import connectPgSimple from 'connect-pg-simple'
import session from 'express-session'
import type pg from 'pg'
import type { SessionUser } from '../../shared/schemas/session.js'

const PgStore = connectPgSimple(session)

/**
 * Where a loaded session's key (`sess.passport.user`) carries the member read with it. A symbol, so the member
 * is never written back into the stored session nor counted as a change to it: only what the database said on
 * this request is ever used.
 */
export const MEMBER_READ_WITH_SESSION = Symbol('member read with the session')

interface StoredKey {
  userId?: string
  venueId?: string
  [MEMBER_READ_WITH_SESSION]?: SessionUser | null
}

interface SessionRow {
  sess: { passport?: { user?: StoredKey } } & session.SessionData
  id: string | null
  email: string
  name: string
  role: SessionUser['role']
  venue_id: string
}

// One round trip: the unexpired session and the member its key names, so a role changed or a membership ended
// by an administrator counts from the very next request. The key's ids were written by sign-in only.
const SESSION_WITH_MEMBER = `
  SELECT s.sess, u.id, u.email, u.name, m.role, m.venue_id
  FROM sessions s
  LEFT JOIN memberships m
    ON m.user_id = (s.sess #>> '{passport,user,userId}')::uuid
   AND m.venue_id = (s.sess #>> '{passport,user,venueId}')::uuid
  LEFT JOIN users u ON u.id = m.user_id
  WHERE s.sid = $1 AND s.expire >= to_timestamp($2)`

/**
 * connect-pg-simple's store on the `sessions` table, reading the member in the same query as the session, and
 * writing an expiry only when the session itself is saved (see `session.ts` for when a session rolls).
 */
export class SessionStore extends PgStore {
  constructor(
    private readonly pool: pg.Pool,
    options: Omit<connectPgSimple.PGStoreOptions, 'pool'>,
  ) {
    super({ ...options, pool, disableTouch: true })
    // No touch at all: express-session then ends an unchanged session's answer with one write, where a store
    // with `touch` (even a disabled one) makes it hold back the last byte and send it after the touch.
    Object.defineProperty(this, 'touch', { value: undefined })
  }

  override get(sid: string, callback: (error: unknown, session?: session.SessionData | null) => void) {
    // The disabled touch of the store's own class does one thing still worth doing: start its pruning timer.
    PgStore.prototype.touch.call(this, sid, {} as session.SessionData, () => {})
    // Named: each pooled connection parses and plans the query once, then only binds and runs it.
    const query = { name: 'session-with-member', text: SESSION_WITH_MEMBER, values: [sid, Date.now() / 1000] }
    this.pool.query<SessionRow>(query).then(({ rows: [row] }) => {
      if (!row) return callback(null, null)
      const key = row.sess.passport?.user
      if (key)
        key[MEMBER_READ_WITH_SESSION] = row.id
          ? { id: row.id, email: row.email, name: row.name, role: row.role, venueId: row.venue_id }
          : null
      callback(null, row.sess)
    }, callback)
  }
}
