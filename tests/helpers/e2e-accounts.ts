// Fresh accounts for e2e specs that must not touch the seeded users: sign-ups through the API in a
// page's own browser context, and a studio with an open invitation link.
import type { Browser, Page } from 'playwright-core'
import { expect } from 'vitest'
import { LAPTOP, newPage } from './browser'

export const HEADERS = { 'X-Requested-With': 'ambitus' } // as the app's client sends (anti-CSRF)
const PASSWORD = 'a long enough password'
const stamp = `${Date.now()}-${Math.round(Math.random() * 1e6)}`

/** A new signed-in account in a page of its own. */
export async function signedUp(
  browser: Browser,
  role: 'student' | 'teacher',
  name: string,
  viewport = LAPTOP,
) {
  const { page } = await newPage(browser, viewport)
  await page.goto('/')
  const email = `${role}-${name.split(' ')[0]!.toLowerCase()}-${stamp}@example.test`
  const res = await page.request.post('/api/auth/register', {
    headers: HEADERS,
    data: { email, password: PASSWORD, name, role },
  })
  expect(res.status()).toBe(201)
  return { page, id: ((await res.json()) as { user: { id: string } }).user.id }
}

/** The teacher's new studio and an open link to it (its path and query, and its token). */
export async function studioLink(teacher: Page, name: string) {
  const studio = await teacher.request.post('/api/studio/studios', {
    headers: HEADERS,
    data: { name },
  })
  const { id } = ((await studio.json()) as { studio: { id: string } }).studio
  const link = await teacher.request.post(`/api/studio/studios/${id}/invite-links`, {
    headers: HEADERS,
    data: {},
  })
  const url = new URL(((await link.json()) as { url: string }).url)
  return { path: url.pathname + url.search, token: url.searchParams.get('token')! }
}

/** Joins a studio with a link's token through the API (the signed-in student of the page). */
export async function joinWithToken(student: Page, token: string, shareHistory?: string) {
  const res = await student.request.post('/api/invitations/accept', {
    headers: HEADERS,
    data: { token, ...(shareHistory ? { shareHistory } : {}) },
  })
  expect(res.status()).toBe(200)
}
