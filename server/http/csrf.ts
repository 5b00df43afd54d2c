import { timingSafeEqual } from 'node:crypto'
import type { Request, RequestHandler, Response } from 'express'
import type { Config } from '../config.js'
import { readCookie } from './cookies.js'
import { AppError } from './errors.js'
import { SignedTokens } from './signed-tokens.js'

const UNSAFE_METHODS = new Set(['POST', 'PUT', 'PATCH', 'DELETE'])
const TWELVE_HOURS = 12 * 60 * 60 * 1000

/**
 * CSRF protection without a stored session (a signed double-submit token): the token is a random value and
 * its HMAC under the session secret, sent in a cookie and, on every write, in `X-CSRF-Token`. Another site
 * can neither read the token nor set the header; one who plants a cookie (from a sibling host, say) cannot
 * make a token the HMAC accepts. Once someone is signed in the HMAC also covers the session id, so a token
 * from one session is refused in every other. Nothing is written to the session store for it.
 */
export function csrfProtection(config: Config) {
  const tokens = new SignedTokens(config.sessionSecret, 'csrf')
  // Over HTTPS the __Host- prefix keeps sibling hosts from setting the cookie at all.
  const cookieName = config.secureCookies ? '__Host-loftledger.csrf' : 'loftledger.csrf'
  const cookieOptions = { httpOnly: true, sameSite: 'strict', secure: config.secureCookies, path: '/' } as const
  const contextOf = (req: Request) => (req.user ? `session ${req.sessionID}` : 'signed out')

  /** The caller's valid token, or a new one (set in the cookie): the same token serves every tab. */
  function tokenFor(req: Request, res: Response): string {
    const current = readCookie(req, cookieName)
    if (current && tokens.verify(current, contextOf(req))) return current
    const token = tokens.issue(contextOf(req))
    res.cookie(cookieName, token, { ...cookieOptions, maxAge: TWELVE_HOURS })
    return token
  }

  /** Every state-changing request, sign-in included, must carry the cookie's token in X-CSRF-Token. */
  const requireToken: RequestHandler = (req, _res, next) => {
    if (!UNSAFE_METHODS.has(req.method)) return next()
    const header = req.get('x-csrf-token')
    const cookie = readCookie(req, cookieName)
    if (header && cookie && same(header, cookie) && tokens.verify(header, contextOf(req))) return next()
    next(
      new AppError(403, 'csrf_failed', 'The request lacks a valid X-CSRF-Token header; reload the page and try again'),
    )
  }

  const forget = (res: Response) => res.clearCookie(cookieName, cookieOptions)

  return { tokenFor, requireToken, forget }
}

export type CsrfProtection = ReturnType<typeof csrfProtection>

function same(a: string, b: string) {
  const left = Buffer.from(a)
  const right = Buffer.from(b)
  return left.length === right.length && timingSafeEqual(left, right)
}
