import type { NavigationGuardWithThis, RouteLocationNormalized, RouteLocationRaw } from 'vue-router'
import { useSessionStore } from '../stores/session'
import { homeFor } from './routes'

/** Only a path inside this app may be a place to come back to after signing in. */
export function safeRedirect(value: unknown): string | undefined {
  return typeof value === 'string' && value.startsWith('/') && !value.startsWith('//') ? value : undefined
}

/**
 * Starts fetching the page's lazy view while the session answer is on its way: the router would only ask for it
 * after this guard, one round trip (and one slow script evaluation) later. The router's own later call finds the
 * module already loaded or loading (the browser keeps one module per URL).
 */
function warmUpViews(to: RouteLocationNormalized) {
  for (const record of to.matched) {
    const view = record.components?.default
    // The router's own test for a lazy view: a function that is not a functional component.
    const lazy = typeof view === 'function' && !['displayName', 'props', '__vccOpts'].some((key) => key in view)
    if (lazy) void (view as () => Promise<unknown>)().catch(() => undefined)
  }
}

export const signInFor = (path: string): RouteLocationRaw => ({ name: 'session-sign-in', query: { redirect: path } })

/** Unknown people go to sign in; a page a role cannot use sends the person to the linesets. */
export const guardRoute: NavigationGuardWithThis<undefined> = async (to) => {
  const session = useSessionStore()
  warmUpViews(to)
  try {
    await session.load()
  } catch {
    // Without a session answer the server is unreachable; the sign-in page says so when it is tried.
  }
  if (to.name === 'session-sign-in' && session.signedIn) return safeRedirect(to.query.redirect) ?? homeFor(session.role)
  if (to.meta.public) return true
  if (!session.signedIn) return signInFor(to.fullPath)
  const roles = to.meta.roles
  if (roles && (!session.role || !roles.includes(session.role))) return { name: 'linesets-list' }
  if (to.name === 'home') return homeFor(session.role)
  return true
}
