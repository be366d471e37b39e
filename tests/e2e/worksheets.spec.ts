// A teacher prints a blank-neck worksheet with its answer key and exports a Window Cycle as
// MusicXML, on a laptop and a phone; the files are read back and checked against the theory core.
import { readFileSync } from 'node:fs'
import path from 'node:path'
import type { Browser, Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { defaultWindow } from '../../src/drills/cycle/cycle-generator'
import { cycleTonics, keyCycleInWindow, pitchClassName, toUnicode } from '../../src/theory'
import {
  launchBrowser,
  LAPTOP,
  newPage,
  PHONE,
  screenshot,
  SCREENSHOT_DIR,
  signInThroughUi,
} from '../helpers/browser'
import { activeInstrument, choose } from '../helpers/drill-pages'
import { readParts } from '../helpers/musicxml-reader'
import { readPdf, tokenRows } from '../helpers/pdf-reader'

const TEACHER = 'teacher@cedarhollow.test'
let browser: Browser
beforeAll(async () => {
  browser = await launchBrowser()
})
afterAll(() => browser?.close())

async function teacherOnWorksheets(viewport: { width: number; height: number }) {
  const opened = await newPage(browser, viewport)
  await signInThroughUi(opened.page, TEACHER)
  await opened.page.waitForURL((url) => url.pathname !== '/sign-in')
  await opened.page.goto('/worksheets')
  await opened.page.getByRole('heading', { name: 'Print & export' }).waitFor()
  return opened
}

/** Picks an option further down a long Vuetify select, scrolling its menu until it is shown. */
async function chooseFar(page: Page, testId: string, option: string) {
  await page.getByTestId(testId).click()
  const wanted = page.getByRole('option', { name: option, exact: true })
  await page.locator('.v-overlay--active .v-list').hover()
  for (let i = 0; i < 20 && !(await wanted.isVisible()); i += 1) await page.mouse.wheel(0, 120)
  await wanted.click()
}

async function downloaded(page: Page, testId: string) {
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByTestId(testId).click(),
  ])
  const path = await download.path()
  return { name: download.suggestedFilename(), bytes: readFileSync(path) }
}

describe('Print & export', () => {
  it('on a laptop: the blank-neck PDF with answers, then a Window Cycle as notation and MusicXML', async () => {
    const { page, context, foreign } = await teacherOnWorksheets(LAPTOP)
    const instrument = await activeInstrument(page)
    await screenshot(page, 'worksheets-neck-laptop')

    const pdf = await downloaded(page, 'download-pdf')
    expect(pdf.name).toBe('neck-worksheet.pdf')
    const pages = await readPdf(pdf.bytes)
    expect(pages).toHaveLength(2)
    expect(pages[1]!.text).toContain('Answer key')
    // The answer key's lowest string: open string + fret (arithmetic), frets 0–12, the instrument's spelling.
    const names = instrument.tuning.map((open) => pitchClassName(open, instrument.accidentals))
    const lowest = tokenRows(pages[1]!.items)
      .filter((row) => row[0] === names[0] && row.length > 5)
      .at(-1)
    const expected = Array.from({ length: 13 }, (_, fret) =>
      toUnicode(pitchClassName(instrument.tuning[0]! + fret, instrument.accidentals)),
    )
    expect(lowest!.slice(1)).toEqual(expected)

    await choose(page, 'sheet-kind', 'Window Cycle')
    const notation = page.getByTestId('notation')
    await expect.poll(() => notation.locator('svg').count()).toBe(1)
    await expect
      .poll(() => page.getByTestId('octave-note').textContent())
      .toMatch(/written an octave above/)
    await screenshot(page, 'worksheets-cycle-laptop')

    const xml = await downloaded(page, 'download-musicxml')
    expect(xml.name).toMatch(/^window-cycle-major-window-.*\.musicxml$/)
    const [standard, tab] = readParts(xml.bytes.toString('utf8'))
    const window = defaultWindow(instrument)
    const keys = keyCycleInWindow({
      ...window,
      tonics: cycleTonics('fourths', { scale: 'major' }),
      scale: 'major',
    })
    expect(standard!.notes.map((note) => note.pitch)).toEqual(keys.flatMap((key) => key.pitches))
    tab!.notes.forEach((note, i) => {
      // MusicXML string 1 = the highest string; the fret sounds the note (open string + fret).
      const string = instrument.tuning.length - note.string!
      expect(instrument.tuning[string]! + note.fret!).toBe(standard!.notes[i]!.pitch)
    })

    await page.getByTestId('view-sounding').click()
    await expect.poll(() => notation.getAttribute('data-view')).toBe('sounding')
    expect(foreign).toEqual([])
    await context.close()
  })

  it('on a phone: the notation wraps to the screen and a bad window is explained', async () => {
    const { page, context } = await teacherOnWorksheets(PHONE)
    await choose(page, 'sheet-kind', 'Window Cycle')
    const svg = page.getByTestId('notation').locator('svg')
    await expect.poll(() => svg.count()).toBe(1)
    const box = (await svg.boundingBox())!
    expect(box.width).toBeLessThanOrEqual(PHONE.width)
    // One key (two measures) or so per system on a phone: several systems, so the staff is tall.
    expect(box.height).toBeGreaterThan(600)
    await screenshot(page, 'worksheets-cycle-phone')
    // The first screenful as the teacher sees it (the full page above is very tall).
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'worksheets-cycle-phone-top.png') })
    // A window of two notes (A2–B2, a whole step) cannot hold the keys: the theory core says why.
    await chooseFar(page, 'window-low', 'A2')
    await expect
      .poll(() => page.getByTestId('preview-problem').textContent())
      .toMatch(/The window A2–B2 is missing .*; widen it/)
    await page.getByTestId('download-pdf').click()
    await expect.poll(() => page.getByTestId('sheet-error').textContent()).toMatch(/is missing/)
    await screenshot(page, 'worksheets-cycle-problem-phone')

    await choose(page, 'sheet-kind', 'Range Runs')
    await expect.poll(() => svg.count()).toBe(1)
    await page.getByTestId('preview').scrollIntoViewIfNeeded()
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'worksheets-runs-phone-preview.png') })
    await context.close()
  })
})
