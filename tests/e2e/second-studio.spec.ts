// Joining a second studio (issue 16 item 7): a student who practised in a first studio opens another
// teacher's link, chooses what earlier practice that teacher may see, and joins; the new teacher's
// student page shows none of the earlier answers ("from now on") or all of them ("everything"),
// while the first teacher still sees everything. Fresh accounts only (Noor's answers are counted by
// the drill specs).
import { randomUUID } from 'node:crypto'
import type { Browser, Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { APP_HEADERS, launchBrowser, PHONE, screenshot } from '../helpers/browser'
import { joinWithToken, signedUp, studioLink } from '../helpers/e2e-accounts'
import { attemptBody } from '../helpers/practice'

let browser: Browser

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
    headers: APP_HEADERS,
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
    first = await signedUp(browser, 'teacher', 'Ilse Firstbrook')
    student = await signedUp(browser, 'student', 'Tamsin Twofold')
    await joinWithToken(student.page, (await studioLink(first.page, 'Firstbrook Bass')).token)
    await practisedTwoDaysAgo(student.page)
  })

  it('"from now on": the new teacher sees none of the earlier answers, the first teacher all', async () => {
    const second = await signedUp(browser, 'teacher', 'Oskar Secondvale')
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
    const third = await signedUp(browser, 'teacher', 'Greta Thirdmoor', PHONE)
    const { path } = await studioLink(third.page, 'Thirdmoor Guitar')
    await joinWithChoice(student.page, path, 'Everything', 'second-studio-everything-laptop')
    const theirs = await glance(third.page, student.id)
    expect(await theirs.textContent()).toContain('3 answers')
    expect(await theirs.getByTestId('glance-shared').count()).toBe(0)
    await screenshot(third.page, 'second-studio-everything-teacher-phone')
  })
})
