/// <reference lib="webworker" />
// The service worker (production builds only): the app shell, route chunks, fonts and sampled sounds
// from the precache; the API answers a drill needs network-first, from a cache when offline.
import { clientsClaim } from 'workbox-core'
import { CacheableResponsePlugin } from 'workbox-cacheable-response'
import { ExpirationPlugin } from 'workbox-expiration'
import {
  cleanupOutdatedCaches,
  createHandlerBoundToURL,
  precacheAndRoute,
} from 'workbox-precaching'
import { NavigationRoute, registerRoute } from 'workbox-routing'
import { NetworkFirst } from 'workbox-strategies'
import { API_CACHE, PRIME_URLS, changesSession, isOfflineApi, planItemUrls } from './offline-routes'

declare let self: ServiceWorkerGlobalScope

// A new version takes over at once (an open page keeps its loaded code until it reloads).
void self.skipWaiting()
clientsClaim()
cleanupOutdatedCaches()
precacheAndRoute(self.__WB_MANIFEST)
registerRoute(
  new NavigationRoute(createHandlerBoundToURL('/index.html'), { denylist: [/^\/api\//] }),
)

const forget = () => caches.delete(API_CACHE)

registerRoute(
  ({ request, url }) =>
    url.origin === self.location.origin && isOfflineApi(request.method, url.pathname),
  new NetworkFirst({
    cacheName: API_CACHE,
    networkTimeoutSeconds: 5,
    plugins: [
      new CacheableResponsePlugin({ statuses: [200] }),
      new ExpirationPlugin({ maxEntries: 80, maxAgeSeconds: 30 * 24 * 3600 }),
      // Signed out elsewhere or expired: nothing cached may outlive the session.
      {
        fetchDidSucceed: async ({ response }) => (
          response.status === 401 && (await forget()),
          response
        ),
      },
    ],
  }),
)

self.addEventListener('fetch', (event) => {
  const url = new URL(event.request.url)
  if (url.origin === self.location.origin && changesSession(event.request.method, url.pathname))
    event.waitUntil(forget())
})

/** Fetches the answers a drill needs that are not cached yet (called by the page once signed in). */
async function prime() {
  const cache = await caches.open(API_CACHE)
  const fetchMissing = async (path: string) => {
    if (await cache.match(path)) return cache.match(path)
    const response = await fetch(path, { credentials: 'same-origin' })
    if (response.status !== 200) return null
    await cache.put(path, response.clone())
    return response
  }
  const answers = await Promise.all(PRIME_URLS.map((path) => fetchMissing(path).catch(() => null)))
  const assigned = answers[PRIME_URLS.indexOf('/api/plans/assigned')]
  const items = assigned ? planItemUrls(await assigned.json().catch(() => null)) : []
  await Promise.all(items.map((path) => fetchMissing(path).catch(() => null)))
}

self.addEventListener('message', (event) => {
  if (event.data === 'prime') event.waitUntil(prime())
})
