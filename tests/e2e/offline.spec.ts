// A new student practises Neck Recall with no network: the app, its fonts and sounds load from the
// service worker, the answers wait on the device with a note in the app bar, and when the network
// comes back every answer is stored exactly once and the statistics count them. Signing out leaves
// no cached answer of the API behind.
import type { Page } from 'playwright-core'
import { describe, expect, it } from 'vitest'
import { noteAt, pitchClassName } from '../../src/theory'
import { LAPTOP, newPage, PHONE, screenshot, signUpFresh } from '../helpers/browser'
import { useDrillE2e } from '../helpers/drill-e2e'
import { answerAll, choose } from '../helpers/drill-pages'

const e2e = useDrillE2e()
const QUESTIONS = 12
// The service worker fetches the whole app (about 150 files) once, beside the other spec files on
// two shared cores; waiting for that and for the sync gets room beyond the suite's default poll.
const BACKGROUND_WORK = { timeout: 120_000, interval: 250 }

/** True once the service worker controls the page and holds what a drill needs to start. */
const readyOffline = (page: Page) =>
  page.evaluate(async () => {
    if (!navigator.serviceWorker.controller) return false
    const cache = await caches.open('ambitus-api-v1')
    const needed = ['/api/auth/me', '/api/instruments', '/api/instruments/presets']
    return (await Promise.all(needed.map((url) => cache.match(url)))).every(Boolean)
  })

/** The API answers the service worker holds for offline use. */
const cachedApiAnswers = (page: Page) =>
  page.evaluate(async () => {
    const cache = await caches.open('ambitus-api-v1')
    return (await cache.keys()).map((request) => new URL(request.url).pathname)
  })

/** Answers left in the device's queue (IndexedDB), whoever they belong to. */
const queuedOnDevice = (page: Page) =>
  page.evaluate(
    () =>
      new Promise<number>((resolve, reject) => {
        const open = indexedDB.open('ambitus-attempts')
        open.onerror = () => reject(open.error)
        open.onsuccess = () => {
          const count = open.result.transaction('attempts').objectStore('attempts').count()
          count.onsuccess = () => resolve(count.result)
        }
      }),
  )

async function newStudent(page: Page) {
  const email = await signUpFresh(page, 'Ada Offline')
  const user = await e2e.db('users').where({ email }).first()
  return user.id as string
}

describe('offline practice', () => {
  it(
    'a whole Neck Recall session without network is stored once, with its statistics, when the network returns',
    { timeout: 300_000 },
    async () => {
      const { page, context, foreign } = await newPage(e2e.browser, LAPTOP, {
        serviceWorkers: 'allow',
      })
      page.setDefaultTimeout(BACKGROUND_WORK.timeout)
      const userId = await newStudent(page)
      await page.goto('/practice/recall')
      await page.locator('[data-testid="drill-setup"][data-ready="true"]').waitFor()
      await expect.poll(() => readyOffline(page), BACKGROUND_WORK).toBe(true)

      await context.setOffline(true)
      await page.reload()
      await page.locator('[data-testid="drill-setup"][data-ready="true"]').waitFor()
      const note = page.getByTestId('offline-status')
      await expect.poll(() => note.textContent()).toContain('Offline')
      const sample = await page.evaluate(async () => {
        const res = await fetch('/samples/bass/23.mp3')
        return { status: res.status, type: res.headers.get('content-type') }
      })
      expect(sample).toEqual({ status: 200, type: 'audio/mpeg' })
      expect(await page.evaluate(() => document.fonts.check('500 16px Roboto'))).toBe(true)

      const instrument = await e2e
        .db('instruments')
        .where({ user_id: userId, is_active: true })
        .first()
      await page.getByTestId('answer-picked').click()
      await choose(page, 'question-count', String(QUESTIONS))
      await page.getByTestId('start-session').click()
      const asked = await answerAll(page, async (q) => {
        const name = pitchClassName(
          noteAt(instrument.tuning, q.string!, q.fret!) % 12,
          instrument.accidentals,
        )
        await page.getByTestId('note-picker').locator(`[data-note="${name}"]`).click()
      })
      expect(asked).toHaveLength(QUESTIONS)
      expect(await page.getByTestId('summary-accuracy').textContent()).toBe('100 %')
      await expect
        .poll(() => note.textContent())
        .toContain(`Offline — ${QUESTIONS} answers waiting`)
      await screenshot(page, 'offline-recall-summary-laptop')
      await page.setViewportSize(PHONE)
      await screenshot(page, 'offline-recall-summary-phone')
      expect(await e2e.db('attempts').where({ user_id: userId }).count({ n: '*' })).toEqual([
        { n: '0' },
      ])
      expect(await queuedOnDevice(page)).toBe(QUESTIONS)

      await context.setOffline(false)
      const stored = () =>
        e2e.db('attempts').where({ user_id: userId }).select('id', 'string', 'fret', 'correct')
      await expect.poll(async () => (await stored()).length, BACKGROUND_WORK).toBe(QUESTIONS)
      await expect.poll(() => note.isVisible(), BACKGROUND_WORK).toBe(false)
      await expect.poll(() => queuedOnDevice(page), BACKGROUND_WORK).toBe(0)
      const rows = await stored()
      expect(new Set(rows.map((r) => r.id)).size).toBe(QUESTIONS)
      expect(rows.every((r) => r.correct)).toBe(true)
      expect(rows.map((r) => `${r.string}:${r.fret}`).sort()).toEqual(
        asked.map((q) => `${q.string}:${q.fret}`).sort(),
      )
      const counted = (drill: string) =>
        e2e
          .db('progress_items')
          .where({ user_id: userId, drill })
          .sum({ answers: 'attempts', right: 'correct' })
          .first()
      const all = { answers: String(QUESTIONS), right: String(QUESTIONS) }
      await expect.poll(() => counted('recall'), BACKGROUND_WORK).toEqual(all)
      await expect.poll(() => counted('*'), BACKGROUND_WORK).toEqual(all)

      await page.reload() // nothing is sent twice
      await page.locator('[data-testid="drill-setup"][data-ready="true"]').waitFor()
      expect((await stored()).length).toBe(QUESTIONS)

      expect(await cachedApiAnswers(page)).toContain('/api/instruments')
      await page.getByTestId('user-menu').click() // whoever comes next finds nothing of Ada's
      await page.getByTestId('sign-out').click()
      await page.waitForURL('**/sign-in')
      await expect.poll(() => cachedApiAnswers(page)).toEqual([])
      expect(foreign).toEqual([])
      await context.close()
    },
  )
})
