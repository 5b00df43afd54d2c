import { defineComponent, h } from 'vue'
import { createMemoryHistory, createRouter, type RouteRecordRaw } from 'vue-router'
import { routes } from '../../src/router/routes'

const Page = defineComponent(() => () => h('div', { 'data-testid': 'routed-page' }))

/** The app's own routes (names, paths, roles) with each lazy page swapped for a stub, so navigation settles at once. */
export function testRouter() {
  const stubbed = routes.map((route) =>
    'component' in route && route.component ? { ...route, component: Page } : route,
  ) as RouteRecordRaw[]
  return createRouter({ history: createMemoryHistory(), routes: stubbed })
}
