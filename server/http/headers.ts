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
  const everyAnswer = helmet({
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
  // A hashed script, stylesheet or font is never a document, so a policy for documents means nothing on it;
  // it keeps nosniff and same-origin, and the kilobyte of headers it saves is paid on every one of dozens of files.
  const scriptsStylesFonts = helmet({
    contentSecurityPolicy: false,
    crossOriginOpenerPolicy: false,
    originAgentCluster: false,
    referrerPolicy: false,
    strictTransportSecurity: overHttps ? { maxAge: 365 * 24 * 60 * 60 } : false,
    xDnsPrefetchControl: false,
    xDownloadOptions: false,
    xFrameOptions: false,
    xPermittedCrossDomainPolicies: false,
    xXssProtection: false,
  })
  return (req, res, next) => (HASHED_SUBRESOURCE.test(req.path) ? scriptsStylesFonts : everyAnswer)(req, res, next)
}

const HASHED_SUBRESOURCE = /^\/assets\/[^/]+\.(js|css|woff2?)$/

/** API answers hold people's names and e-mail addresses: no browser or proxy may keep a copy. */
export const noStore: RequestHandler = (_req, res, next) => {
  res.set('Cache-Control', 'no-store')
  next()
}
