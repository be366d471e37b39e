// What the service worker keeps for practice without a network: which API answers it caches, which
// it fetches ahead, and which requests mean the person at this browser may change (caches go).

/** Runtime cache of API answers; bump the suffix when their shape changes. */
export const API_CACHE = 'ambitus-api-v1'

/** GETs a drill needs to open and run: the session, instruments, plan items, weak spots. */
const OFFLINE_API = [
  /^\/api\/auth\/me$/,
  /^\/api\/instruments$/,
  /^\/api\/instruments\/presets$/,
  /^\/api\/plans\/assigned$/,
  /^\/api\/plans\/items\/[0-9a-f-]{36}$/,
  /^\/api\/focus$/,
  /^\/api\/progress\/fingerings$/,
]

/** Fetched ahead once signed in, so the first visit already works offline. */
export const PRIME_URLS = [
  '/api/auth/me',
  '/api/instruments',
  '/api/instruments/presets',
  '/api/plans/assigned',
]

/** Sign-in, sign-out, registration, password changes, joining a studio. */
const SESSION_CHANGES = /^\/api\/(auth\/|invitations\/accept$)/

/** True for an API GET the service worker answers network-first, from its cache when offline. */
export const isOfflineApi = (method: string, pathname: string) =>
  method === 'GET' && OFFLINE_API.some((pattern) => pattern.test(pathname))

/** True for a request after which cached answers may belong to someone else. */
export const changesSession = (method: string, pathname: string) =>
  method === 'POST' && SESSION_CHANGES.test(pathname)

/** The plan items of GET /api/plans/assigned, as URLs (nothing for an answer of another shape). */
export function planItemUrls(answer: unknown): string[] {
  const assignments = (answer as { assignments?: unknown })?.assignments
  if (!Array.isArray(assignments)) return []
  return assignments.flatMap((assignment: { items?: { id?: unknown }[] }) =>
    (assignment.items ?? [])
      .map((item) => item.id)
      .filter((id): id is string => typeof id === 'string')
      .map((id) => `/api/plans/items/${id}`),
  )
}
