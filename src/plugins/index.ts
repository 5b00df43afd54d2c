import type { App } from 'vue'
import { createPinia } from 'pinia'
import vuetify from './vuetify'
import router from '../router'
import { whenSignedOut } from '../api/client'
import { signInFor } from '../router/guard'
import { forgetfulStores, forgetSignedInData } from '../stores/forget'

/** Registers vuetify, pinia and the router, and decides what a lapsed session does. */
export function registerPlugins(app: App) {
  const pinia = createPinia()
  pinia.use(forgetfulStores)
  app.use(vuetify).use(pinia).use(router)

  whenSignedOut(() => {
    forgetSignedInData(pinia)
    const here = router.currentRoute.value
    if (here.name !== 'session-sign-in') void router.push(signInFor(here.fullPath))
  })
}
