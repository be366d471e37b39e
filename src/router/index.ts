// The router: the app's routes (routes.ts) in the browser's history, the role guard, page titles,
// and the one place that reacts to a 401.
import { createRouter, createWebHistory } from 'vue-router'
import { setUnauthorizedHandler } from '../api/http'
import { useAuthStore } from '../stores/auth'
import { routes } from './routes'

const router = createRouter({ history: createWebHistory(), routes })

router.beforeEach(async (to) => {
  const auth = useAuthStore()
  await auth.loadSession().catch(() => undefined)
  if (!to.meta.roles) return true
  if (!auth.isSignedIn) return { name: 'sign-in', query: { next: to.fullPath } }
  if (!auth.hasRole(to.meta.roles)) return { name: auth.homeRoute }
  return true
})

router.afterEach((to) => {
  document.title = to.meta.title ? `${to.meta.title} · Ambitus` : 'Ambitus'
})

// One place handles a 401: forget the user, go to sign-in, then come back.
setUnauthorizedHandler(() => {
  const auth = useAuthStore()
  auth.expire()
  const current = router.currentRoute.value
  if (current.meta.roles) void router.push({ name: 'sign-in', query: { next: current.fullPath } })
})

export default router
