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
    ...hsts(overHttps),
  })
  // A script, stylesheet or font is never a document, so a policy for documents means nothing on it; it keeps
  // nosniff and same-origin, and the kilobyte of headers it saves is paid on every one of dozens of files.
  const scriptsStylesFonts = helmet({ ...NOT_FOR_DOCUMENTS, contentSecurityPolicy: false, ...hsts(overHttps) })
  // An API answer is data: the policy for data (nothing may load or frame it), not the one for the app's pages.
  // The same headers the page's policy carries, less a few hundred bytes on every answer a screen waits for.
  const apiAnswers = helmet({
    ...NOT_FOR_DOCUMENTS,
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        'default-src': ["'none'"],
        'frame-ancestors': ["'none'"],
        'upgrade-insecure-requests': overHttps ? [] : null,
      },
    },
    xFrameOptions: { action: 'deny' },
    ...hsts(overHttps),
  })
  return (req, res, next) => {
    const headers = req.path.startsWith('/api/')
      ? apiAnswers
      : SUBRESOURCE.test(req.path)
        ? scriptsStylesFonts
        : everyAnswer
    headers(req, res, next)
  }
}

// Headers that only mean something on a document a person browses (the app's pages).
const NOT_FOR_DOCUMENTS = {
  crossOriginOpenerPolicy: false,
  originAgentCluster: false,
  referrerPolicy: false,
  xDnsPrefetchControl: false,
  xDownloadOptions: false,
  xFrameOptions: false,
  xPermittedCrossDomainPolicies: false,
  xXssProtection: false,
} as const

const hsts = (overHttps: boolean) => ({
  strictTransportSecurity: overHttps ? { maxAge: 365 * 24 * 60 * 60 } : (false as const),
})

const SUBRESOURCE = /^\/[^?]*\.(js|css|woff2?)$/

/** API answers hold people's names and e-mail addresses: no browser or proxy may keep a copy. */
export const noStore: RequestHandler = (_req, res, next) => {
  res.set('Cache-Control', 'no-store')
  next()
}
