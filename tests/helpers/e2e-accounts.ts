// Fresh accounts for e2e specs that must not touch the seeded users: a signed-up account in a page of
// its own (with its id), a studio with an open invitation link, joining with the link's token.
import type { Browser, Page } from 'playwright-core'
import { expect } from 'vitest'
import { APP_HEADERS, LAPTOP, newPage, signUpFresh } from './browser'

/** A new signed-in account in a page of its own, with its user id. */
export async function signedUp(
  browser: Browser,
  role: 'student' | 'teacher',
  name: string,
  viewport = LAPTOP,
) {
  const { page } = await newPage(browser, viewport)
  await signUpFresh(page, name, role)
  const me = await page.request.get('/api/auth/me')
  return { page, id: ((await me.json()) as { user: { id: string } }).user.id }
}

/** The teacher's new studio and an open link to it (its path and query, and its token). */
export async function studioLink(teacher: Page, name: string) {
  const studio = await teacher.request.post('/api/studio/studios', {
    headers: APP_HEADERS,
    data: { name },
  })
  const { id } = ((await studio.json()) as { studio: { id: string } }).studio
  const link = await teacher.request.post(`/api/studio/studios/${id}/invite-links`, {
    headers: APP_HEADERS,
    data: {},
  })
  const url = new URL(((await link.json()) as { url: string }).url)
  return { path: url.pathname + url.search, token: url.searchParams.get('token')! }
}

/** Joins a studio with a link's token through the API (the signed-in student of the page). */
export async function joinWithToken(student: Page, token: string, shareHistory?: string) {
  const res = await student.request.post('/api/invitations/accept', {
    headers: APP_HEADERS,
    data: { token, ...(shareHistory ? { shareHistory } : {}) },
  })
  expect(res.status()).toBe(200)
}
