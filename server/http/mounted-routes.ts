import type { Router } from 'express'

/** One route the API answers, as `METHOD /api/v1/path/:param`. */
export type MountedRoute = `${string} ${string}`

interface RouteLayer {
  route?: { path: string; methods: Record<string, boolean> }
}

/**
 * Lists the routes of routers mounted under `base`, read from the routers themselves, so a test can prove
 * that every route the app serves has a row in the role table (a new route without one fails the suite).
 *
 * @example
 * mountedRoutes('/api/v1', [['/venue', venueRouter]]) // ['GET /api/v1/venue', 'PUT /api/v1/venue']
 */
export function mountedRoutes(base: string, mounts: ReadonlyArray<readonly [string, Router]>): MountedRoute[] {
  return mounts.flatMap(([mount, router]) =>
    (router.stack as RouteLayer[]).flatMap((layer) => {
      if (!layer.route) return []
      const path = `${base}${mount}${layer.route.path}`.replace(/\/$/, '')
      return Object.keys(layer.route.methods)
        .filter((method) => method !== '_all')
        .map((method): MountedRoute => `${method.toUpperCase()} ${path}`)
    }),
  )
}
