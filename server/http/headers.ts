import type { RequestHandler } from 'express'
import helmet from 'helmet'
import type { Config } from '../config.js'

/**
 * helmet's headers for every answer. HSTS and upgrade-insecure-requests only when the config says the app
 * is served over HTTPS (secure cookies): sent over plain HTTP they would tell browsers to reach a
 * loopback or LAN install by an HTTPS that is not there.
 */
export function securityHeaders(config: Config): RequestHandler {
  const overHttps = config.secureCookies
  return helmet({
    contentSecurityPolicy: {
      directives: {
        'default-src': ["'self'"],
        'style-src': ["'self'", "'unsafe-inline'"], // Vuetify sets theme colours in a style element
        'img-src': ["'self'", 'data:', 'blob:'],
        'font-src': ["'self'"],
        'upgrade-insecure-requests': overHttps ? [] : null,
      },
    },
    strictTransportSecurity: overHttps ? { maxAge: 365 * 24 * 60 * 60 } : false,
  })
}

/** API answers hold people's names and e-mail addresses: no browser or proxy may keep a copy. */
export const noStore: RequestHandler = (_req, res, next) => {
  res.set('Cache-Control', 'no-store')
  next()
}
