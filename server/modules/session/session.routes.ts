import { Router } from 'express'
import { signInSchema } from '../../../shared/schemas/session.js'
import type { Config } from '../../config.js'
import type { Database } from '../../db/models.js'
import type { CsrfProtection } from '../../http/csrf.js'
import { validate } from '../../http/validate.js'
import type { createPassport } from './passport.js'
import { signInSteps } from './sign-in.js'

interface SessionRouteNeeds {
  db: Database
  config: Config
  passport: ReturnType<typeof createPassport>
  csrf: CsrfProtection
}

/** `/session`: who is signed in, sign in, sign out. Nothing is stored for a session until someone signs in. */
export function sessionRoutes({ db, config, passport, csrf }: SessionRouteNeeds) {
  const router = Router()

  router.get('/', async (req, res) => {
    // Signed in, the session was just read from the database. Signed out, nothing needed it: ask it anyway,
    // so an outage answers 503 here as everywhere, not a token for a sign-in that cannot work.
    if (!req.user) await db.sequelize.query('SELECT 1')
    res.json({ user: req.user ?? null, csrfToken: csrf.tokenFor(req, res) })
  })

  router.post('/', validate({ body: signInSchema }), ...signInSteps(db, config, passport, csrf))

  // Destroying (rather than passport's logout, which saves the session first) ends a signed-in session and
  // stores nothing for a signed-out one.
  router.delete('/', (req, res, next) => {
    req.session.destroy((error) => {
      if (error) return next(error)
      csrf.forget(res)
      res.clearCookie('loftledger.sid').status(204).end()
    })
  })
  return router
}
