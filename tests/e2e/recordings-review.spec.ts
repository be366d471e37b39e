// Recordings worth reviewing in Chromium (issue 16 item 6), as a new teacher and a new student of
// hers: a titled take shared with the teacher, its waveform, seeking by click, comments pinned to
// moments, a take recorded in the browser that knows its length and seeks, the teacher's reference
// takes for the student and on a plan item.
import { AxeBuilder } from '@axe-core/playwright'
import type { Browser, Locator, Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest'
import { createDb, type Db } from '../../server/lib/db'
import { LAPTOP, launchBrowser, newPage, PHONE, screenshot } from '../helpers/browser'
import { planBody, wavFile } from '../helpers/studio'

const CSRF = { 'X-Requested-With': 'ambitus' } // as the app's client sends (anti-CSRF)
const TWO_SECONDS = () => wavFile(16000, 8000) // 16,000 samples at 8 kHz

let browser: Browser
let db: Db
let teacher: Page
let student: Page
let studentId: string
let planItemId: string

/** A fresh account of the role, signed in on a new page. */
async function register(role: 'teacher' | 'student', name: string, viewport = LAPTOP) {
  const { page } = await newPage(browser, viewport)
  const email = `review-${role}-${Date.now()}-${Math.round(Math.random() * 1e6)}@example.test`
  await page.goto('/')
  const res = await page.request.post('/api/auth/register', {
    headers: CSRF,
    data: { email, password: 'a long enough password', name, role },
  })
  expect(res.status()).toBe(201)
  return { page, id: (await res.json()).user.id as string }
}

beforeAll(async () => {
  browser = await launchBrowser()
  db = createDb(inject('e2eDatabaseUrl'))
  teacher = (await register('teacher', 'Iris Vale')).page
  const made = await register('student', 'Tomas Reed')
  student = made.page
  studentId = made.id
  const studio = await teacher.request.post('/api/studio/studios', {
    headers: CSRF,
    data: { name: 'Vale bass room' },
  })
  // Joining by invitation has its own specs; here the student is put in the studio directly.
  await db('studio_members').insert({
    studio_id: (await studio.json()).studio.id,
    student_id: studentId,
  })
  const plan = await teacher.request.post('/api/plans', {
    headers: CSRF,
    data: planBody({ title: 'Walking lines', studentIds: [studentId] }),
  })
  planItemId = (await plan.json()).plan.items[0].id
})
afterAll(async () => {
  await browser?.close()
  await db?.destroy()
})

/** The take's card on the page, found by its title. */
const takeCard = (page: Page, title: string) =>
  page.locator('.take-card', { has: page.getByTestId('take-title').filter({ hasText: title }) })

/** The same card by its id, which stays while its title is being edited. */
async function pinnedCard(page: Page, title: string) {
  await expect.poll(() => takeCard(page, title).count()).toBe(1)
  return page.getByTestId((await takeCard(page, title).getAttribute('data-testid'))!)
}

/** Opens the take's waveform and waits until it is drawn and playable. */
async function openTake(card: Locator) {
  await card.getByRole('button', { name: 'Listen & comment' }).click()
  await expect.poll(() => card.getByTestId('take-play').isEnabled(), { timeout: 20_000 }).toBe(true)
}

/** Clicks the waveform at a share of its width (0–1), as a person seeking would. */
async function clickWaveform(card: Locator, share: number) {
  const box = (await card.locator('.wave').boundingBox())!
  await card.page().mouse.click(box.x + box.width * share, box.y + box.height / 2)
}

/** axe-core's serious and critical findings on the page as it is now. */
async function seriousFindings(page: Page) {
  const { violations } = await new AxeBuilder({ page }).analyze()
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .flatMap((v) => v.nodes.map((n) => `${v.id} at ${n.target.join(' ')}`))
}

const audioOf = (card: Locator) =>
  card.getByTestId('take-audio').evaluate((a: HTMLAudioElement) => ({
    duration: a.duration,
    currentTime: a.currentTime,
  }))

describe('a student’s take, reviewed by the teacher', () => {
  it('the student uploads a titled take shared with the teacher, seeks by clicking and pins a comment', async () => {
    await student.goto('/recordings')
    const card = student.getByTestId('new-recording')
    await expect
      .poll(() => card.getByTestId('new-recording-whom').textContent())
      .toContain('Iris Vale')
    await card.getByLabel('Title of the take').fill('Walking line in F')
    await card.getByTestId('recording-file-new').setInputFiles({
      name: 'walking-line.wav',
      mimeType: 'audio/wav',
      buffer: TWO_SECONDS(),
    })
    const take = takeCard(student, 'Walking line in F')
    await expect.poll(() => take.count()).toBe(1)
    // Titled: the title leads, date and length stay small beneath it.
    expect(await take.getByTestId('recording-meta').textContent()).toMatch(/0:02 · \d+ kB/)
    expect(await take.textContent()).toContain('Shared with Iris Vale')
    await openTake(take)
    await clickWaveform(take, 0.75)
    await expect.poll(async () => (await audioOf(take)).currentTime).toBeGreaterThan(1.3)
    expect((await audioOf(take)).currentTime).toBeLessThan(1.7)
    const pinLabel = await take.getByRole('button', { name: /^Pin at / }).textContent()
    await take.getByTestId('pin-body').locator('textarea').fill('Open E keeps ringing here')
    await take.getByRole('button', { name: /^Pin at / }).click()
    await expect.poll(() => take.getByTestId('pin-marker').count()).toBe(1)
    expect(await take.getByTestId('pinned-comments').textContent()).toContain(
      `${pinLabel!.replace('Pin at', '').trim()}Open E keeps ringing here`,
    )
    await screenshot(student, 'recordings-student-take-laptop')
  })

  it('the student records a take in the browser: it knows its length and seeks', async () => {
    const card = student.getByTestId('new-recording')
    await card.getByLabel('Title of the take').fill('Recorded here')
    await card.getByRole('button', { name: 'Record a take' }).click()
    await expect.poll(() => card.getByRole('button', { name: /^Stop / }).count()).toBe(1)
    await student.waitForTimeout(2200) // a take of about two seconds from the fake microphone
    await card.getByRole('button', { name: /^Stop / }).click()
    const take = takeCard(student, 'Recorded here')
    await expect.poll(() => take.count(), { timeout: 20_000 }).toBe(1)
    expect(await take.getByTestId('recording-meta').textContent()).toMatch(/0:0[23] · /)
    await openTake(take)
    const { duration } = await audioOf(take)
    expect(Number.isFinite(duration)).toBe(true) // WebM from MediaRecorder has none unless written
    expect(duration).toBeGreaterThan(1.5)
    await clickWaveform(take, 0.5)
    await expect
      .poll(async () => Math.abs((await audioOf(take)).currentTime - duration / 2))
      .toBeLessThan(0.3)
  })

  it('the teacher finds the take, jumps to the student’s comment, answers at another moment and renames it', async () => {
    await teacher.goto('/recordings')
    const take = await pinnedCard(teacher, 'Walking line in F')
    expect(await take.textContent()).toContain('From Tomas Reed')
    expect(await take.getByTestId('recording-meta').textContent()).toContain('1 pinned')
    await openTake(take)
    await take.getByTestId('pinned-comments').getByText('Open E keeps ringing here').click()
    await expect.poll(async () => (await audioOf(take)).currentTime).toBeGreaterThan(1.3)
    await clickWaveform(take, 0.25)
    await expect.poll(async () => (await audioOf(take)).currentTime).toBeLessThan(0.7)
    await take.getByTestId('pin-body').locator('textarea').fill('Mute it with the plucking hand')
    await take.getByRole('button', { name: /^Pin at 0:00/ }).click()
    await expect.poll(() => take.getByTestId('pin-marker').count()).toBe(2)
    const moments = await take.getByTestId('pinned-comments').locator('.moment').allTextContents()
    expect(moments).toEqual([...moments].sort()) // in the order of their moments
    await take.getByRole('button', { name: 'Rename Walking line in F' }).click()
    await take.getByTestId('take-title-field').locator('input').fill('Walking line in F, bar 3')
    await take.getByRole('button', { name: 'Save the title' }).click()
    await expect.poll(() => takeCard(teacher, 'Walking line in F, bar 3').count()).toBe(1)
    expect(await seriousFindings(teacher)).toEqual([])
    await screenshot(teacher, 'recordings-teacher-review-laptop')
  })
})

describe('the teacher’s reference takes', () => {
  it('the teacher adds a reference for the student and one on the plan item', async () => {
    const card = teacher.getByTestId('new-recording')
    await expect
      .poll(() => card.getByTestId('new-recording-whom').textContent())
      .toContain('Tomas Reed')
    await card.getByLabel('Title of the reference take').fill('How it should swing')
    await card.getByTestId('recording-file-new').setInputFiles({
      name: 'swing.wav',
      mimeType: 'audio/wav',
      buffer: TWO_SECONDS(),
    })
    await expect
      .poll(() => takeCard(teacher, 'How it should swing').textContent())
      .toContain('Your reference')
    await teacher.goto(`/studio/students/${studentId}`)
    // The student's page lists what they shared and the references made for them.
    const shared = teacher.getByTestId('student-recordings')
    await expect.poll(() => shared.textContent()).toContain('Walking line in F, bar 3')
    expect(await shared.textContent()).toContain('How it should swing')
    const item = teacher.getByTestId(`recordings-${planItemId}`)
    await item.getByLabel('Title of the reference take').fill('Slow run, 60 BPM')
    await item.getByTestId(`recording-file-${planItemId}`).setInputFiles({
      name: 'slow-run.wav',
      mimeType: 'audio/wav',
      buffer: TWO_SECONDS(),
    })
    await expect.poll(() => takeCard(teacher, 'Slow run, 60 BPM').count()).toBe(1)
    await screenshot(teacher, 'recordings-teacher-plan-reference-laptop')
  })

  it('the student hears both, labelled as the teacher’s, and reads the teacher’s comment (phone)', async () => {
    await student.setViewportSize(PHONE)
    await student.goto('/plans')
    const onItem = takeCard(student, 'Slow run, 60 BPM')
    await expect.poll(() => onItem.textContent()).toContain('Reference from Iris Vale')
    expect(await onItem.getByRole('button', { name: /^Delete / }).count()).toBe(0)
    await openTake(onItem)
    expect(await seriousFindings(student)).toEqual([])
    await screenshot(student, 'recordings-student-plan-reference-phone')
    await student.goto('/recordings')
    const reference = takeCard(student, 'How it should swing')
    await expect.poll(() => reference.textContent()).toContain('Reference from Iris Vale')
    const take = takeCard(student, 'Walking line in F, bar 3')
    await openTake(take)
    await expect
      .poll(() => take.getByTestId('pinned-comments').textContent())
      .toContain('Mute it with the plucking hand')
    const width = await student.evaluate(() => document.documentElement.scrollWidth)
    expect(width).toBeLessThanOrEqual(PHONE.width)
    expect(await seriousFindings(student)).toEqual([])
    await screenshot(student, 'recordings-student-phone')
  })
})
