import { Router, type RequestHandler } from 'express'
import type { createPassport } from './passport.js'
import { signInSchema } from '../../../shared/schemas/session.js'
import { AppError } from '../../http/errors.js'
import { csrfTokenFor } from '../../http/csrf.js'
import { validate } from '../../http/validate.js'

/** `/session`: who is signed in, sign in, sign out. */
export function sessionRoutes(passport: ReturnType<typeof createPassport>, signInLimiter: RequestHandler) {
  const router = Router()

  router.get('/', (req, res) => {
    res.json({ user: req.user ?? null, csrfToken: csrfTokenFor(req) })
  })

  router.post('/', signInLimiter, validate({ body: signInSchema }), (req, res, next) => {
    passport.authenticate('local', (error: unknown, user: Express.User | false) => {
      if (error) return next(error)
      if (!user)
        return next(new AppError(401, 'bad_credentials', 'That e-mail address and password do not match an account'))
      // passport regenerates the session here: a new id at sign-in, and so a new CSRF token.
      req.logIn(user, (loginError) => {
        if (loginError) return next(loginError)
        res.json({ user, csrfToken: csrfTokenFor(req) })
      })
    })(req, res, next)
  })

  router.delete('/', (req, res, next) => {
    req.logout((logoutError) => {
      if (logoutError) return next(logoutError)
      req.session.destroy((destroyError) => {
        if (destroyError) return next(destroyError)
        res.clearCookie('loftledger.sid').status(204).end()
      })
    })
  })
  return router
}
