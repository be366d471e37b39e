// The teacher's studio end to end: invite a new student (link read from the mail sink), the student
// accepts, the teacher assigns a plan, the student practises it, the teacher sees the target met and
// comments, the student reads the comment. Screenshots on laptop and phone, light and dark.
import { randomUUID } from 'node:crypto'
import type { Browser, Locator, Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest'
import { createDb, type Db } from '../../server/lib/db'
import { wavFile } from '../helpers/studio'
import {
  LAPTOP,
  launchBrowser,
  newPage,
  PHONE,
  screenshot as fullPageShot,
  signInThroughUi,
} from '../helpers/browser'

let browser: Browser
let db: Db
beforeAll(async () => {
  browser = await launchBrowser()
  db = createDb(inject('e2eDatabaseUrl'))
})
afterAll(async () => {
  await browser?.close()
  await db?.destroy()
})

/** A full-page screenshot from the top, so the fixed app bar is drawn where it belongs. */
async function screenshot(page: Page, name: string) {
  await page.evaluate(() => window.scrollTo(0, 0))
  await fullPageShot(page, name)
}

/** Where each listed take's audio is served (a take's card carries its id). */
const takeSources = (takes: Locator) =>
  takes.evaluateAll((cards) =>
    cards.map((card) => `/api/recordings/${card.getAttribute('data-testid')!.slice(5)}/audio`),
  )

const NEW_STUDENT = {
  name: 'Wren Castillo',
  email: `wren-${randomUUID().slice(0, 8)}@example.test`,
  password: 'low-b-string-42',
}
const PLAN_TITLE = 'First week: low strings'

/** The invitation link in the newest mail the sink captured for an address. */
async function invitationLink(email: string): Promise<string> {
  for (let i = 0; i < 50; i++) {
    const row = await db('captured_mail')
      .whereRaw('? = any(recipients)', [email])
      .orderBy('id', 'desc')
      .first('text_body')
    const link =
      row && /(http\S+\/invitations\/accept\?token=\S+)/.exec(row.text_body as string)?.[1]
    if (link) return link
    await new Promise((r) => setTimeout(r, 100))
  }
  throw new Error(`no invitation mail for ${email}`)
}

/** Answers as a drill view would send them to POST /api/attempts (three right, one wrong, fast). */
async function practise(page: Page, planItemId: string) {
  const sessionId = randomUUID()
  // A new account starts with a 4-string bass in standard tuning (E1 A1 D2 G2).
  const mine = await (await page.request.get('/api/instruments')).json()
  const bass = mine.instruments[0] as { id: string; tuning: number[] }
  expect(bass.tuning).toEqual([28, 33, 38, 43])
  const attempts = [true, true, false, true].map((correct, i) => ({
    id: randomUUID(),
    instrumentId: bass.id,
    tuning: bass.tuning,
    drill: 'recall',
    sessionId,
    string: 1,
    fret: 3 + i,
    expectedPitch: 36 + i,
    answer: correct ? 'ok' : 'no',
    correct,
    responseMs: 900 + 100 * i,
    createdAt: new Date(Date.now() - (4 - i) * 5000).toISOString(),
    detail: {},
    planItemId,
  }))
  const res = await page.request.post('/api/attempts', {
    data: { attempts },
    headers: { 'X-Requested-With': 'ambitus' }, // as the app's client sends (anti-CSRF)
  })
  expect(res.status()).toBeLessThan(300)
}

describe('teacher studio', () => {
  let teacher: Page
  let student: Page
  let planItemId = ''

  it('the teacher invites a new student by e-mail', async () => {
    ;({ page: teacher } = await newPage(browser, LAPTOP))
    await signInThroughUi(teacher, 'teacher@cedarhollow.test')
    await teacher.waitForURL('**/studio')
    await expect.poll(() => teacher.getByTestId('roster').textContent()).toContain('Noor Halvorsen')
    await teacher.getByTestId('invite-open').click()
    await teacher.getByLabel("Students' e-mails").fill(NEW_STUDENT.email)
    await teacher.getByRole('button', { name: 'Send invitation' }).click()
    await expect
      .poll(() => teacher.getByTestId('invite-sent').textContent())
      .toContain(NEW_STUDENT.email)
    await teacher.getByRole('button', { name: 'Close' }).click()
    await expect
      .poll(() => teacher.getByTestId('invitations').textContent())
      .toContain(NEW_STUDENT.email)
    await screenshot(teacher, 'studio-teacher-home-laptop')
  })

  it('the student opens the link from the mail, creates an account and joins', async () => {
    const link = await invitationLink(NEW_STUDENT.email)
    ;({ page: student } = await newPage(browser, PHONE))
    await student.goto(link)
    await expect
      .poll(() => student.getByTestId('invitation-accept').textContent())
      .toContain('Marta Ilves invites you to Cedar Hollow Music Collective')
    await student.getByLabel('Your name').fill(NEW_STUDENT.name)
    await student.getByLabel('Choose a password').fill(NEW_STUDENT.password)
    await screenshot(student, 'studio-invitation-accept-phone')
    await student.getByRole('button', { name: 'Create my account and join' }).click()
    await student.waitForURL('**/plans?joined=*')
    await expect
      .poll(() => student.getByTestId('joined').textContent())
      .toContain('Welcome to Cedar Hollow Music Collective')
    const reused = await (await newPage(browser, PHONE)).page
    await reused.goto(link)
    await expect
      .poll(() => reused.getByTestId('invitation-problem').textContent())
      .toContain('already accepted')
    await reused.context().close()
  })

  it('the teacher builds a plan and assigns it to the new student', async () => {
    await teacher.goto('/studio/plans')
    await teacher.getByTestId('plan-new').click()
    const editor = teacher.getByTestId('plan-editor')
    await editor.getByLabel('Title', { exact: true }).fill(PLAN_TITLE)
    await editor
      .getByLabel('Due date', { exact: true })
      .fill(new Date(Date.now() + 6 * 24 * 3600 * 1000).toISOString().slice(0, 10))
    await editor
      .getByLabel('Notes for the student')
      .fill('Ten minutes a day. Say each note out loud.')
    await editor.getByLabel('Assign to').click()
    await teacher.getByRole('option', { name: NEW_STUDENT.name }).click()
    await editor.getByLabel('Accuracy ≥ %').fill('75')
    await editor.getByLabel('Over the last').fill('4')
    await screenshot(teacher, 'studio-plan-editor-laptop')
    await editor.getByTestId('plan-save').click()
    await expect.poll(() => teacher.getByTestId('plans-home').textContent()).toContain(PLAN_TITLE)
    await screenshot(teacher, 'studio-plans-laptop')
  })

  it('the student sees the plan, starts it in one click and practises it', async () => {
    await student.goto('/plans')
    const start = student.getByRole('link', { name: `Start Neck Recall from ${PLAN_TITLE}` })
    await expect.poll(() => start.count()).toBe(1)
    const href = (await start.getAttribute('href')) ?? ''
    expect(href).toMatch(/^\/practice\/recall\?planItem=[0-9a-f-]{36}$/)
    planItemId = href.split('=')[1]!
    await screenshot(student, 'studio-my-plans-before-phone')
    await start.click()
    await student.waitForURL(`**/practice/recall?planItem=${planItemId}`)
    // The drill views send every answer with the plan item's id; here the answers go straight to
    // the same endpoint, so the test stays about the studio.
    await practise(student, planItemId)
    await student.goto('/plans')
    await expect
      .poll(() => student.getByTestId(`plan-item-row-${planItemId}`).textContent())
      .toContain('Target met')
    await student
      .getByTestId(`recording-file-${planItemId}`)
      .setInputFiles({ name: 'take-1.wav', mimeType: 'audio/wav', buffer: wavFile(4000) })
    const recordings = student.getByTestId(`recordings-${planItemId}`)
    const takes = recordings.locator('.take-card')
    await expect.poll(() => takes.count()).toBe(1)
    // A take recorded in the browser (MediaRecorder on Chromium's synthetic microphone): stored as
    // WebM, whose files begin with the EBML magic 1A 45 DF A3 (Matroska/WebM specification).
    await recordings.getByRole('button', { name: /^Record / }).click()
    await expect.poll(() => recordings.getByRole('button', { name: /^Stop / }).count()).toBe(1)
    await student.waitForTimeout(1500)
    await recordings.getByRole('button', { name: /^Stop / }).click()
    await expect.poll(() => takes.count()).toBe(2)
    const sources = await takeSources(takes)
    const heads = await Promise.all(
      sources.map(async (src) => [
        ...(await (await student.request.get(src)).body()).subarray(0, 4),
      ]),
    )
    expect(heads).toContainEqual([0x1a, 0x45, 0xdf, 0xa3])
    // Its length is shown, and written into the file: the Matroska Duration element (ID 44 89)
    // that MediaRecorder leaves out, so players can seek.
    const webm = await (
      await student.request.get(sources[heads.findIndex((h) => h[0] === 0x1a)]!)
    ).body()
    expect(webm.subarray(0, 200).includes(Buffer.from([0x44, 0x89]))).toBe(true)
    expect(await recordings.getByTestId('recording-meta').allTextContents()).toContainEqual(
      expect.stringMatching(/^0:0\d · /),
    )
  })

  it('the teacher sees the target met on the student page and leaves a comment', async () => {
    await teacher.goto('/studio')
    await teacher.getByTestId('roster').getByRole('link', { name: NEW_STUDENT.name }).click()
    await teacher.waitForURL('**/studio/students/*')
    const row = teacher.getByTestId(`plan-item-row-${planItemId}`)
    await expect.poll(() => row.textContent()).toContain('Target met')
    expect(await row.textContent()).toContain('4 of 4 answers · 75 % right')
    const takes = row.locator('.take-card')
    expect(await takes.count()).toBe(2) // the uploaded take and the one recorded in the browser
    // The teacher's browser can fetch a take: the player's request gets the audio back.
    const [src = ''] = await takeSources(takes)
    expect((await teacher.request.get(src, { headers: { range: 'bytes=0-3' } })).status()).toBe(206)
    await teacher.getByText('Comments (0)').click()
    await teacher
      .getByLabel('Write a comment')
      .fill('Lovely start, Wren. Next week: the same, under two seconds.')
    await teacher.getByRole('button', { name: 'Send' }).click()
    await expect.poll(() => teacher.getByTestId('comment').count()).toBe(1)
    await screenshot(teacher, 'studio-student-page-laptop')
  })

  it('the student reads the comment (phone, dark theme)', async () => {
    await student.goto('/plans')
    await student.getByRole('button', { name: 'Use dark theme' }).click()
    await student.getByText('Comments (1)').click()
    await expect
      .poll(() => student.getByTestId('comment').first().textContent())
      .toContain('Lovely start, Wren.')
    await screenshot(student, 'studio-my-plans-comment-phone-dark')
  })

  it('the teacher reviews a demo student with weeks of history: plans, progress and weak spots', async () => {
    await teacher.goto('/studio')
    await teacher.getByTestId('roster').getByRole('link', { name: 'Noor Halvorsen' }).click()
    await teacher.waitForURL('**/studio/students/*')
    await expect
      .poll(() => teacher.getByTestId('student-glance').textContent())
      .toContain('Weak spots')
    expect(await teacher.getByTestId('studio-student').textContent()).toContain(
      'Fourths in a one-octave window',
    )
    await expect.poll(() => teacher.getByTestId('student-progress').isVisible()).toBe(true)
    await teacher.waitForTimeout(1500) // let the lazily loaded charts draw before the screenshot
    await screenshot(teacher, 'studio-demo-student-laptop')
  })

  it('the studio pages fit a phone and a dark laptop', async () => {
    await teacher.setViewportSize(PHONE)
    await teacher.goto('/studio')
    await expect.poll(() => teacher.getByTestId('roster').textContent()).toContain(NEW_STUDENT.name)
    await screenshot(teacher, 'studio-teacher-home-phone')
    const width = await teacher.evaluate(() => document.documentElement.scrollWidth)
    expect(width).toBeLessThanOrEqual(PHONE.width)
    await teacher.goto('/studio/plans')
    await expect.poll(() => teacher.getByTestId('plans-home').textContent()).toContain(PLAN_TITLE)
    await screenshot(teacher, 'studio-plans-phone')
    await teacher.setViewportSize(LAPTOP)
    await teacher.getByRole('button', { name: 'Use dark theme' }).click()
    await teacher.goto('/studio')
    await expect.poll(() => teacher.getByTestId('roster').textContent()).toContain(NEW_STUDENT.name)
    await screenshot(teacher, 'studio-teacher-home-laptop-dark')
    await teacher.context().close()
    await student.context().close()
  })
})
