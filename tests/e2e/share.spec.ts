// A student reads Octave Scatter in notation while playing it, exports it and shares a link; a
// visitor without an account opens the same exercise (board, notation, play-along, MusicXML); the
// student revokes the link and it stops opening. Laptop and phone.
import { readFileSync } from 'node:fs'
import type { Page } from 'playwright-core'
import { describe, expect, it } from 'vitest'
import { LAPTOP, newPage, PHONE, screenshot } from '../helpers/browser'
import { findPitch, useDrillE2e } from '../helpers/drill-e2e'
import { activeInstrument, answerAll, choose, studentOn } from '../helpers/drill-pages'
import { readParts } from '../helpers/musicxml-reader'

const e2e = useDrillE2e()

async function downloaded(page: Page, testId: string) {
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByTestId(testId).first().click(),
  ])
  return { name: download.suggestedFilename(), bytes: readFileSync(await download.path()) }
}

const currentNote = (page: Page) =>
  page.evaluate(() => {
    const marked = document.querySelector('[data-testid="notation"] .notation-current')
    const match = marked?.getAttribute('class')?.match(/note-(\d+)/)
    return match ? Number(match[1]) : null
  })

// Tobiah (5-string) practises here: the drill specs count Noor's stored answers while they run.
const SHARING_STUDENT = 'tobiah@cedarhollow.test'

describe('Notation in a drill and shared exercises', () => {
  it('on a laptop: the staff follows the scatter, the summary exports and shares it, a visitor opens it, a revoke closes it', async () => {
    const { page, context } = await studentOn(
      e2e.browser,
      LAPTOP,
      '/practice/scatter',
      SHARING_STUDENT,
    )
    const instrument = await activeInstrument(page)
    await choose(page, 'question-count', '8')
    await page.getByTestId('paper-panel-title').click()
    const notation = page.getByTestId('notation')
    await expect.poll(() => notation.locator('svg').count(), { timeout: 30_000 }).toBe(1)
    await expect
      .poll(() => page.getByTestId('octave-note').textContent())
      .toMatch(/written an octave above/)
    await screenshot(page, 'share-scatter-setup-laptop')

    await page.getByTestId('start-session').click()
    const followed: (number | null)[] = []
    const asked = await answerAll(page, async (q) => {
      await expect.poll(() => currentNote(page)).toBe(q.index)
      followed.push(await currentNote(page))
      if (q.index === 2) {
        // Scatter asks where each note is: the TAB waits for the summary, the staff alone is drawn.
        expect(await notation.locator('.note-2').count()).toBe(1)
        await page.getByTestId('tab-after-session').waitFor()
        await screenshot(page, 'share-scatter-session-laptop')
      }
      await findPitch(page, instrument)(q)
    })
    expect(followed).toEqual(asked.map((q) => q.index))

    // The summary: the session as MusicXML, every pitch as asked; string + fret sound it.
    await expect
      .poll(() => page.getByTestId('paper-title').textContent())
      .toMatch(/octave scatter, seed/)
    await expect.poll(() => notation.locator('.note-0').count()).toBe(2) // staff and TAB
    const xml = await downloaded(page, 'export-musicxml')
    expect(xml.name).toMatch(/octave-scatter-seed-\d+\.musicxml$/)
    const [standard, tab] = readParts(xml.bytes.toString('utf8'))
    expect(standard!.notes.map((note) => note.pitch)).toEqual(asked.map((q) => q.pitch))
    tab!.notes.forEach((note, i) => {
      const string = instrument.tuning.length - note.string! // MusicXML string 1 = the highest
      expect(instrument.tuning[string]! + note.fret!).toBe(asked[i]!.pitch)
    })
    const pdf = await downloaded(page, 'export-pdf')
    expect(pdf.bytes.subarray(0, 5).toString()).toBe('%PDF-')

    await page.getByTestId('share-exercise').click()
    const url = await page.getByTestId('share-url').locator('input').inputValue()
    expect(url).toMatch(/\/shared\/[A-Za-z0-9_-]{22}$/)
    await screenshot(page, 'share-dialog-laptop')
    await page.keyboard.press('Escape')

    // A visitor without an account.
    const visitor = await newPage(e2e.browser, LAPTOP)
    await visitor.page.goto(url)
    await visitor.page.getByTestId('shared-title').waitFor()
    const shared = visitor.page.getByTestId('notation')
    await expect.poll(() => shared.locator('svg').count(), { timeout: 30_000 }).toBe(1)
    const visitorXml = await downloaded(visitor.page, 'export-musicxml')
    const [visitorStandard] = readParts(visitorXml.bytes.toString('utf8'))
    expect(visitorStandard!.notes.map((note) => note.pitch)).toEqual(asked.map((q) => q.pitch))
    await visitor.page.getByTestId('next-note').click()
    await visitor.page.getByTestId('next-note').click()
    await expect.poll(() => currentNote(visitor.page)).toBe(1)
    await expect
      .poll(() => visitor.page.getByTestId('along-note').textContent())
      .toMatch(/Note 2 of 8/)
    expect(await visitor.page.locator('[data-testid="shared-board"] .fb-target').count()).toBe(1)
    await visitor.page.getByTestId('play-along').click()
    await expect.poll(() => currentNote(visitor.page), { timeout: 30_000 }).toBeGreaterThan(1)
    await visitor.page.getByTestId('play-along').click() // stop
    await screenshot(visitor.page, 'share-visitor-laptop')

    // The student revokes it on Print & export; the visitor's reload says it was withdrawn.
    await page.goto('/worksheets')
    const token = url.split('/').at(-1)!
    await page.getByTestId(`share-link-${token}`).getByTestId('revoke-share').click()
    await expect
      .poll(() => page.getByTestId(`share-link-${token}`).textContent())
      .toMatch(/revoked/)
    await screenshot(page, 'share-links-laptop')
    await visitor.page.reload()
    await expect
      .poll(() => visitor.page.getByTestId('shared-missing').textContent())
      .toMatch(/withdrawn/)
    await visitor.context.close()
    await context.close()
  })

  it('on a phone: a Range Run in notation during the session, and a shared link read on a phone', async () => {
    const { page, context } = await studentOn(e2e.browser, PHONE, '/practice/runs', SHARING_STUDENT)
    await page.getByTestId('paper-panel-title').click()
    const notation = page.getByTestId('notation')
    await expect.poll(() => notation.locator('svg').count(), { timeout: 30_000 }).toBe(1)
    const box = (await notation.locator('svg').boundingBox())!
    expect(box.width).toBeLessThanOrEqual(PHONE.width)
    await page.getByTestId('start-session').click()
    await expect.poll(() => currentNote(page)).toBe(0)
    await screenshot(page, 'share-runs-session-phone')
    await page.getByTestId('share-exercise').click()
    const url = await page.getByTestId('share-url').locator('input').inputValue()
    await context.close()

    const visitor = await newPage(e2e.browser, PHONE)
    await visitor.page.goto(url)
    await visitor.page.getByTestId('shared-title').waitFor()
    await expect
      .poll(() => visitor.page.getByTestId('notation').locator('svg').count(), { timeout: 30_000 })
      .toBe(1)
    await expect
      .poll(() => visitor.page.getByTestId('shared-title').textContent())
      .toMatch(/range run/)
    await screenshot(visitor.page, 'share-visitor-phone')
    await visitor.context.close()
  })
})
