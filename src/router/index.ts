import { createRouter, createWebHistory } from 'vue-router'
import { guardRoute } from './guard'
import { routes } from './routes'

const router = createRouter({ history: createWebHistory(import.meta.env.BASE_URL), routes })

router.beforeEach(guardRoute)
router.afterEach((to) => {
  document.title = to.meta.title ? `${to.meta.title} · Loftledger` : 'Loftledger'
})

export default router
