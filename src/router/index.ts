// The router: the app's routes (routes.ts) in the browser's history, the role guard, page titles,
// and the one place that reacts to a 401.
import { createRouter, createWebHistory, type RouteLocationNormalized } from 'vue-router'
import { setUnauthorizedHandler } from '../api/http'
import { useAuthStore } from '../stores/auth'
import { useInstrumentStore } from '../stores/instruments'
import { routes } from './routes'

const router = createRouter({ history: createWebHistory(), routes })

router.beforeEach(async (to) => {
  const auth = useAuthStore()
  loadPagesEarly(to)
  await auth.loadSession().catch(() => undefined)
  if (!to.meta.roles) return true
  if (!auth.isSignedIn) return { name: 'sign-in', query: { next: to.fullPath } }
  if (!auth.hasRole(to.meta.roles)) return { name: auth.homeRoute }
  if (to.meta.usesInstrument) loadInstrumentEarly()
  return true
})

/** Starts downloading a lazy page's code while the session is asked for (the router would wait). */
function loadPagesEarly(to: RouteLocationNormalized) {
  for (const record of to.matched) {
    const page = record.components?.default
    // a lazy page is a bare function (routes.ts); a component carries props or its options
    const lazy = typeof page === 'function' && !('props' in page) && !('__vccOpts' in page)
    if (lazy) (page as () => Promise<unknown>)().catch(() => undefined)
  }
}

/** A drill page's first question waits for the instrument: asked for now, while the page loads. */
function loadInstrumentEarly() {
  const store = useInstrumentStore()
  // a failure stays in the store, where the page shows it
  store.load().catch(() => undefined)
}

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
