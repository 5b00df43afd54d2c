import type { RequestHandler } from 'express'
import type { Config } from '../../config.js'
import type { Database } from '../../db/models.js'
import type { CsrfProtection } from '../../http/csrf.js'
import { AppError } from '../../http/errors.js'
import { signInLimiter } from '../../http/sign-in-limiter.js'
import { SignInStreaks } from '../../http/sign-in-streaks.js'
import { SignedTokens } from '../../http/signed-tokens.js'
import { trustedDevices } from '../../http/trusted-devices.js'
import type { createPassport } from './passport.js'

const inWords = (seconds: number) =>
  seconds < 90 ? `${seconds} second${seconds === 1 ? '' : 's'}` : `${Math.ceil(seconds / 60)} minutes`

/**
 * The steps of `POST /session` after validation: a browser that signed in to the account before is
 * recognised; the address limit applies to every other browser; the attempt claims its turn in its streak
 * (the browser's own, or the account's); only then is the password checked. See DEVELOPERS.md, "Sign-in limits".
 */
export function signInSteps(
  db: Database,
  config: Config,
  passport: ReturnType<typeof createPassport>,
  csrf: CsrfProtection,
): RequestHandler[] {
  const devices = trustedDevices(config)
  const streaks = new SignInStreaks(db.sequelize, config.signInFirstWaitSeconds)
  // Rows are keyed by a digest of the e-mail address: the table never holds what people typed.
  const accountNames = new SignedTokens(config.sessionSecret, 'sign-in streak')

  const recognizeDevice: RequestHandler = (req, res, next) => {
    const email: string = req.body.email
    const device = devices.tokenFor(req, email)
    res.locals.trustedDevice = device
    res.locals.streak = device ? `device ${SignedTokens.idOf(device)}` : `account ${accountNames.digest(email)}`
    next()
  }

  const awaitTurn: RequestHandler = async (_req, res, next) => {
    const claim = await streaks.claim(res.locals.streak)
    if (claim.allowed) return next()
    res.set('Retry-After', String(claim.retryAfterSeconds))
    next(
      new AppError(
        429,
        'too_many_attempts',
        `Too many failed sign-ins for this e-mail address; try again in ${inWords(claim.retryAfterSeconds)}`,
      ),
    )
  }

  const checkPassword: RequestHandler = (req, res, next) => {
    passport.authenticate('local', (error: unknown, user: Express.User | false) => {
      if (error) return next(error)
      if (!user)
        return next(new AppError(401, 'bad_credentials', 'That e-mail address and password do not match an account'))
      streaks.forget(res.locals.streak).then(() => {
        // passport regenerates the session here: a new id at sign-in, and so a new CSRF token.
        req.logIn(user, (loginError) => {
          if (loginError) return next(loginError)
          devices.remember(req, res, req.body.email)
          res.json({ user, csrfToken: csrf.tokenFor(req, res) })
        })
      }, next)
    })(req, res, next)
  }

  return [recognizeDevice, signInLimiter(db.sequelize, config.signInAttemptsPerMinute), awaitTurn, checkPassword]
}
