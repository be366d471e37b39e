// Drills played on the instrument, in Chromium with a microphone fed from a WAV rendered from the
// app's own samples (Chromium loops the file): a new student's 4-string bass (E1 A1 D2 G2) plays
// the Range Run of frets 2–5 in C major up and back down — every note graded right; the same run
// with one wrong note — exactly that note graded wrong; and Pitch Hunt answered by playing the
// asked pitch. Runs and answers come from the theory core and the drill's own generator.
import knex, { type Knex } from 'knex'
import type { Browser, Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest'
import { HuntSettingsSchema } from '../../src/contract/drills/hunt'
import { huntQuestions } from '../../src/drills/hunt/hunt-generator'
import { pitchName, rangeRun, toUnicode } from '../../src/theory'
import { LAPTOP, launchBrowser, newPage, PHONE, screenshot } from '../helpers/browser'
import { writeTakeWav } from '../helpers/take-wav'

const BASS = { tuning: [28, 33, 38, 43], frets: 20 } // a new account's bass: E1 A1 D2 G2 (common practice)
const RUN = rangeRun({ tuning: BASS.tuning, lowFret: 2, highFret: 5, tonic: 'C', scale: 'major' })
const PASS = [...RUN, ...RUN.slice(0, -1).reverse()] // up and back down
const NOTE_MS = 450
const WRONG_AT = 3
let db: Knex

beforeAll(() => {
  db = knex({ client: 'pg', connection: inject('e2eDatabaseUrl') })
})
afterAll(() => db?.destroy())

/** The run as a take: a short lead-in, the notes, then the file's silent tail before it loops. */
const runTake = (pitches: number[]) =>
  pitches.map((pitch, k) => ({ pitch, startMs: 500 + k * NOTE_MS, durationMs: NOTE_MS - 20 }))

async function newStudent(browser: Browser, viewport: typeof LAPTOP, path: string) {
  const opened = await newPage(browser, viewport)
  const email = `play-${Date.now()}-${Math.round(Math.random() * 1e6)}@example.test`
  await opened.page.goto('/')
  const res = await opened.page.request.post('/api/auth/register', {
    headers: { 'X-Requested-With': 'ambitus' }, // as the app's client sends (anti-CSRF)
    data: { email, password: 'a long enough password', name: 'Play Student', role: 'student' },
  })
  expect(res.status()).toBe(201)
  await opened.page.goto(path)
  await opened.page.locator('[data-testid="drill-setup"][data-ready="true"]').waitFor()
  return { ...opened, email }
}

const heardNames = async (page: Page) =>
  ((await page.getByTestId('play-heard').textContent()) ?? '').match(/[A-G][♯♭]?\d/g) ?? []

/** Waits until the looped take has just ended (its last two notes heard), so the next loop is whole. */
async function waitForTakeEnd(page: Page, pitches: number[]) {
  const ending = pitches.slice(-2).map((pitch) => toUnicode(pitchName(pitch)))
  await expect
    .poll(async () => (await heardNames(page)).slice(-2).join(' '), { timeout: 60_000 })
    .toBe(ending.join(' '))
}

/**
 * The last take's verdicts, extras left out, once every played note has one. A starved audio thread
 * on a loaded machine may hear one note twice (an "extra" beside it): extras are allowed, a few.
 */
async function gradedTake(page: Page, length: number) {
  const notes = page.getByTestId('take-notes').locator('li')
  const kinds = () => notes.evaluateAll((items) => items.map((li) => li.dataset.kind ?? ''))
  const graded = async () => (await kinds()).filter((kind) => kind !== 'extra')
  await expect.poll(async () => (await graded()).length, { timeout: 30_000 }).toBe(length)
  expect((await kinds()).length - length).toBeLessThanOrEqual(Math.floor(length / 4))
  return graded()
}

async function playedAttempts(email: string, drill: string, atLeast: number) {
  const read = () =>
    db('attempts')
      .join('users', 'users.id', 'attempts.user_id')
      .where({ 'users.email': email, 'attempts.drill': drill })
      .orderBy('attempts.created_at')
      .select(
        'attempts.correct',
        'attempts.expected_pitch',
        'attempts.detail',
        'attempts.created_at',
      )
  await expect
    .poll(async () => (await read()).length, { timeout: 20_000 })
    .toBeGreaterThanOrEqual(atLeast)
  return read()
}

async function playRun(browser: Browser, viewport: typeof LAPTOP, name: string) {
  const { page, context, email } = await newStudent(browser, viewport, '/practice/runs')
  await page.getByTestId('input-play').click()
  await page.getByTestId('play-listening').waitFor()
  await screenshot(page, `drills-play-runs-setup-${name}`)
  return { page, context, email }
}

describe('Range Runs played on the instrument', () => {
  let browser: Browser
  afterAll(() => browser?.close())

  it('the run played as shown: every note graded right, and stored as played', async () => {
    browser = await launchBrowser({
      microphoneFile: await writeTakeWav('play-run', runTake(PASS), {
        voice: 'bass',
        tailMs: 10_000, // a start clicked late on a loaded machine still lands in the silence
      }),
    })
    const { page, context, email } = await playRun(browser, LAPTOP, 'laptop')
    await waitForTakeEnd(page, PASS)
    await page.getByTestId('start-session').click()
    expect(await gradedTake(page, PASS.length)).toEqual(PASS.map(() => 'right'))
    await screenshot(page, 'drills-play-runs-take-laptop')
    const all = await playedAttempts(email, 'runs', PASS.length)
    const firstAt = new Date(all[0]!.created_at).getTime()
    const stored = all.filter((row) => new Date(row.created_at).getTime() - firstAt < 1000)
    // one take's answers are stored together (the same instant): compare them as a set of notes
    const byPitch = (a: number, b: number) => a - b
    expect(stored.map((row) => row.expected_pitch).sort(byPitch)).toEqual([...PASS].sort(byPitch))
    expect(stored.every((row) => row.correct && row.detail.played)).toBe(true)
    await context.close()
  })

  it('on a phone (390 px): the Play panel and the take fit the screen', async () => {
    const { page, context } = await playRun(browser, PHONE, 'phone')
    await waitForTakeEnd(page, PASS)
    await page.getByTestId('start-session').click()
    expect(await gradedTake(page, PASS.length)).toEqual(PASS.map(() => 'right'))
    const width = await page.evaluate(() => document.documentElement.scrollWidth)
    expect(width).toBeLessThanOrEqual(PHONE.width)
    await screenshot(page, 'drills-play-runs-take-phone')
    await context.close()
  })

  it('the run with one wrong note: exactly that note is graded wrong', async () => {
    const wrong = PASS.map((pitch, k) => (k === WRONG_AT ? pitch + 1 : pitch)) // a semitone sharp
    const wrongBrowser = await launchBrowser({
      microphoneFile: await writeTakeWav('play-run-wrong', runTake(wrong), {
        voice: 'bass',
        tailMs: 10_000, // a start clicked late on a loaded machine still lands in the silence
      }),
    })
    try {
      const { page, email } = await playRun(wrongBrowser, LAPTOP, 'laptop-wrong')
      await waitForTakeEnd(page, wrong)
      await page.getByTestId('start-session').click()
      expect(await gradedTake(page, PASS.length)).toEqual(
        PASS.map((_, k) => (k === WRONG_AT ? 'wrong' : 'right')),
      )
      await screenshot(page, 'drills-play-runs-wrong-laptop')
      // the first take's answers (stored within a second; the looped file may start a next take)
      const stored = await playedAttempts(email, 'runs', PASS.length)
      const firstAt = new Date(stored[0]!.created_at).getTime()
      const firstTake = stored.filter((row) => new Date(row.created_at).getTime() - firstAt < 1000)
      expect(firstTake).toHaveLength(PASS.length)
      const wrongRows = firstTake.filter((row) => !row.correct)
      expect(wrongRows.map((row) => row.expected_pitch)).toEqual([PASS[WRONG_AT]])
    } finally {
      await wrongBrowser.close()
    }
  })
})

describe('Pitch Hunt played on the instrument', () => {
  it('the asked pitch, played back at its octave, is graded right', async () => {
    // Math.random is pinned in the page, so the session's seed, and its first question, are known
    const settings = HuntSettingsSchema.parse({
      showName: true,
      lowFret: 5,
      highFret: 5,
      focus: false,
      questionCount: 1,
    })
    const seed = Math.floor(0.5 * 2 ** 31)
    const asked = huntQuestions({ ...BASS, settings, seed, focus: [] })[0]!.expectedPitch
    const notes = [0, 1, 2].map((k) => ({
      pitch: asked,
      startMs: 300 + k * 1500,
      durationMs: 1200,
    }))
    const browser = await launchBrowser({
      microphoneFile: await writeTakeWav('play-hunt', notes, { voice: 'bass', tailMs: 300 }),
    })
    try {
      const { page, context, email } = await newStudent(browser, LAPTOP, '/practice/runs')
      await context.addInitScript((stored) => {
        Math.random = () => 0.5
        localStorage.setItem('ambitus.drill.hunt', stored)
      }, JSON.stringify(settings))
      await page.goto('/practice/hunt')
      await page.locator('[data-testid="drill-setup"][data-ready="true"]').waitFor()
      await page.getByTestId('start-session').click()
      expect(Number(await page.getByTestId('question').getAttribute('data-pitch'))).toBe(asked)
      await page.getByTestId('input-play').click()
      // one question: the played note ends the session, right
      await expect
        .poll(() => page.getByTestId('summary-accuracy').textContent(), { timeout: 30_000 })
        .toBe('100 %')
      await screenshot(page, 'drills-play-hunt-laptop')
      const [first] = await playedAttempts(email, 'hunt', 1)
      expect(first).toMatchObject({ correct: true, expected_pitch: asked })
      expect(first!.detail.played).toBe(true)
    } finally {
      await browser.close()
    }
  })
})
