import type { Request } from 'express'

/**
 * One cookie's raw value from the request. The app's own cookies hold base64url only, so no decoding is
 * needed; a cookie sent twice (a path or domain variant) counts as absent rather than guessing which wins.
 */
export function readCookie(req: Request, name: string): string | undefined {
  let found: string | undefined
  for (const part of (req.headers.cookie ?? '').split(';')) {
    const equals = part.indexOf('=')
    if (equals < 0 || part.slice(0, equals).trim() !== name) continue
    if (found !== undefined) return undefined
    found = part.slice(equals + 1).trim()
  }
  return found
}
