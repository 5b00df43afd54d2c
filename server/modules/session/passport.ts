import { Passport } from 'passport'
import { Strategy as LocalStrategy } from 'passport-local'
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
  passport.deserializeUser<SessionKey>((key, done) => {
    memberFor(visitorContext(app), key).then((user) => done(null, user ?? false), done)
  })
  return passport
}
