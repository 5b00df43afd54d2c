import { Passport } from 'passport'
import { Strategy as LocalStrategy } from 'passport-local'
import type { SessionUser } from '../../../shared/schemas/session.js'
import { MEMBER_READ_WITH_SESSION } from '../../http/session-store.js'
import { visitorContext, type AppContext } from '../../context.js'
import { authenticate, memberFor, type SessionKey } from './session.service.js'

/** One Passport per app (not the module-wide singleton), so several apps can share a process in tests. */
export function createPassport(app: AppContext) {
  const passport = new Passport()
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      authenticate(visitorContext(app), email, password).then((user) => done(null, user ?? false), done)
    }),
  )
  passport.serializeUser<SessionKey>((user, done) => done(null, { userId: user.id, venueId: user.venueId }))
  passport.deserializeUser<SessionKey & { [MEMBER_READ_WITH_SESSION]?: SessionUser | null }>((key, done) => {
    // The session store read the member with the session, in the same query: no second round trip.
    if (MEMBER_READ_WITH_SESSION in key) return done(null, key[MEMBER_READ_WITH_SESSION] ?? false)
    memberFor(visitorContext(app), key).then((user) => done(null, user ?? false), done)
  })
  return passport
}
