// Joining a second studio (issue 16 item 7): a student who practised in a first studio opens another
// teacher's link, chooses what earlier practice that teacher may see, and joins; the new teacher's
// student page shows none of the earlier answers ("from now on") or all of them ("everything"),
// while the first teacher still sees everything. Fresh accounts only (Noor's answers are counted by
// the drill specs).
import { randomUUID } from 'node:crypto'
import type { Browser, Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { LAPTOP, launchBrowser, newPage, PHONE, screenshot } from '../helpers/browser'
import { attemptBody } from '../helpers/practice'

const HEADERS = { 'X-Requested-With': 'ambitus' } // as the app's client sends (anti-CSRF)
const PASSWORD = 'a long enough password'
const stamp = `${Date.now()}-${Math.round(Math.random() * 1e6)}`
let browser: Browser

async function signedUp(role: 'student' | 'teacher', name: string, viewport = LAPTOP) {
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
async function studioLink(teacher: Page, name: string) {
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

/** Three answers two days ago on the student's own bass, as the drills would have sent them. */
async function practisedTwoDaysAgo(student: Page) {
  const list = await student.request.get('/api/instruments')
  const [bass] = ((await list.json()) as { instruments: { id: string; tuning: number[] }[] })
    .instruments
  const at = new Date(Date.now() - 2 * 24 * 3600 * 1000).toISOString()
  const session = randomUUID()
  const attempts = [0, 1, 2].map((fret) =>
    attemptBody({ instrumentId: bass!.id, tuning: bass!.tuning }, session, {
      ...{ string: 0, fret, correct: fret !== 1, ms: 900, at },
    }),
  )
  const res = await student.request.post('/api/attempts', {
    headers: HEADERS,
    data: { attempts, timeZone: 'UTC' },
  })
  expect(res.status()).toBe(201)
}

/** Opens a link signed in, picks what to share, joins, and lands on My plans. */
async function joinWithChoice(student: Page, link: string, choice: string, shot: string) {
  await student.goto(link)
  const choices = student.getByTestId('share-history')
  await choices.waitFor()
  expect(await choices.getByRole('radio', { name: /From now on/ }).isChecked()).toBe(true)
  await choices.getByText(choice, { exact: true }).click()
  expect(await choices.getByRole('radio', { name: new RegExp(choice) }).isChecked()).toBe(true)
  await screenshot(student, shot)
  await student.getByRole('button', { name: /^Join / }).click()
  await student.waitForURL(/\/plans\?joined=/)
}

const glance = async (teacher: Page, studentId: string) => {
  await teacher.goto(`/studio/students/${studentId}`)
  const card = teacher.getByTestId('student-glance')
  await card.waitFor()
  return card
}

beforeAll(async () => {
  browser = await launchBrowser()
})
afterAll(() => browser?.close())

describe('a student joins a second studio', () => {
  let first: { page: Page; id: string }
  let student: { page: Page; id: string }

  beforeAll(async () => {
    first = await signedUp('teacher', 'Ilse Firstbrook')
    student = await signedUp('student', 'Tamsin Twofold')
    const joined = await student.page.request.post('/api/invitations/accept', {
      headers: HEADERS,
      data: { token: (await studioLink(first.page, 'Firstbrook Bass')).token },
    })
    expect(joined.status()).toBe(200)
    await practisedTwoDaysAgo(student.page)
  })

  it('"from now on": the new teacher sees none of the earlier answers, the first teacher all', async () => {
    const second = await signedUp('teacher', 'Oskar Secondvale')
    const { path } = await studioLink(second.page, 'Secondvale Strings')
    await joinWithChoice(student.page, path, 'From now on', 'second-studio-choice-laptop')
    const line = student.page.getByText('Oskar Secondvale sees your practice from')
    await line.waitFor()
    expect(await student.page.getByText('Ilse Firstbrook sees all your practice.').count()).toBe(1)
    await screenshot(student.page, 'second-studio-my-studios-laptop')

    const theirs = await glance(second.page, student.id)
    expect(await theirs.textContent()).toContain('0 answers')
    expect(await theirs.getByTestId('glance-shared').textContent()).toContain(
      'shares practice with you from',
    )
    await screenshot(second.page, 'second-studio-new-teacher-laptop')
    const csv = await second.page.request.get(`/api/studio/students/${student.id}/results.csv`)
    expect((await csv.text()).trim().split('\r\n')).toHaveLength(1) // the header only

    const mine = await glance(first.page, student.id)
    expect(await mine.textContent()).toContain('3 answers')
    expect(await mine.getByTestId('glance-shared').count()).toBe(0)
  })

  it('"everything": the new teacher sees the earlier answers too', async () => {
    const third = await signedUp('teacher', 'Greta Thirdmoor', PHONE)
    const { path } = await studioLink(third.page, 'Thirdmoor Guitar')
    await joinWithChoice(student.page, path, 'Everything', 'second-studio-everything-laptop')
    const theirs = await glance(third.page, student.id)
    expect(await theirs.textContent()).toContain('3 answers')
    expect(await theirs.getByTestId('glance-shared').count()).toBe(0)
    await screenshot(third.page, 'second-studio-everything-teacher-phone')
  })
})
