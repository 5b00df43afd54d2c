import type { Request, Response } from 'express'
import type { Config } from '../config.js'
import { readCookie } from './cookies.js'
import { SignedTokens } from './signed-tokens.js'

const ACCOUNTS_PER_BROWSER = 5 // a shared booth computer signs in several crew members
const HALF_A_YEAR = 182 * 24 * 60 * 60 * 1000

/**
 * Browsers that have signed in to an account before. After a correct password the browser gets a token,
 * signed for that e-mail address, in a long-lived cookie; its attempts at that account then run in a streak
 * of their own instead of the account's. So a stranger's failed guesses can slow down unknown browsers
 * only, never the person's own one.
 */
export function trustedDevices(config: Config) {
  const tokens = new SignedTokens(config.sessionSecret, 'trusted device')
  const cookieName = config.secureCookies ? '__Host-loftledger.devices' : 'loftledger.devices'
  const held = (req: Request) =>
    (readCookie(req, cookieName) ?? '').split('.').filter((token) => /^[\w-]{86}$/.test(token))

  return {
    /** The token this browser holds for the e-mail address, if it signed in to that account before. */
    tokenFor(req: Request, email: string): string | undefined {
      return held(req).find((token) => tokens.verify(token, email))
    },

    /** After a correct password: remembers the browser for the account (the newest first). */
    remember(req: Request, res: Response, email: string): void {
      const current = this.tokenFor(req, email) ?? tokens.issue(email)
      const others = held(req).filter((token) => token !== current)
      res.cookie(cookieName, [current, ...others].slice(0, ACCOUNTS_PER_BROWSER).join('.'), {
        httpOnly: true,
        sameSite: 'strict',
        secure: config.secureCookies,
        path: '/',
        maxAge: HALF_A_YEAR,
      })
    },
  }
}

export type TrustedDevices = ReturnType<typeof trustedDevices>
