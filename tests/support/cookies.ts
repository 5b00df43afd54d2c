/** The cookies an answer sets, by name (value only). */
export function cookiesSet(res: { headers: Record<string, unknown> }): Record<string, string> {
  const cookies: Record<string, string> = {}
  for (const line of (res.headers['set-cookie'] as string[] | undefined) ?? []) {
    const [pair = ''] = line.split(';')
    const equals = pair.indexOf('=')
    cookies[pair.slice(0, equals)] = pair.slice(equals + 1)
  }
  return cookies
}

/** A Cookie header from name -> value. */
export const cookieHeader = (cookies: Record<string, string>) =>
  Object.entries(cookies)
    .map(([name, value]) => `${name}=${value}`)
    .join('; ')
