import { createRouter, createWebHistory } from 'vue-router'
import { dropEarlySignIn } from '../composables/earlySignIn'
import { guardRoute } from './guard'
import { routes } from './routes'

const router = createRouter({ history: createWebHistory(import.meta.env.BASE_URL), routes })

router.beforeEach(guardRoute)
router.afterEach((to) => {
  document.title = to.meta.title ? `${to.meta.title} · Loftledger` : 'Loftledger'
  // The sign-in page takes the plain form over itself; any other page only clears it away.
  if (to.name !== 'session-sign-in') dropEarlySignIn()
})

export default router
