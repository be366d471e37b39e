// A student with a drop-D bass (as the seed gives Rafe) sets up instruments: preview, left-handed and
// back, a new 5-string, activate it. A fresh account, not a seeded one: other specs read the seeded
// students' instruments (the roster shows Rafe's drop D) while this one changes them.
import { copyFileSync, readFileSync } from 'node:fs'
import path from 'node:path'
import type { Browser, Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import {
  APP_HEADERS,
  LAPTOP,
  launchBrowser,
  newPage,
  PHONE,
  screenshot,
  SCREENSHOT_DIR,
  signUpFresh,
} from '../helpers/browser'

let browser: Browser
beforeAll(async () => {
  browser = await launchBrowser()
})
afterAll(() => browser?.close())

interface ApiInstrument {
  id: string
  name: string
  tuning: number[]
  isActive: boolean
}

async function instrumentsOf(page: Page): Promise<ApiInstrument[]> {
  return (await (await page.request.get('/api/instruments')).json()).instruments
}

/** A new student whose one instrument is a 4-string drop-D bass, frets 0–21 (like Rafe's in the seed). */
async function openInstruments(page: Page) {
  await signUpFresh(page, 'Ida Strand')
  const created = await page.request.post('/api/instruments', {
    headers: APP_HEADERS,
    data: {
      name: 'Drop-D bass',
      presetId: 'bass-4-drop-d',
      tuning: [26, 33, 38, 43], // D1 A1 D2 G2 (scientific pitch notation)
      frets: 21,
      scaleLengthMm: 864,
      accidentals: 'sharp',
    },
  })
  expect(created.status()).toBe(201)
  await page.goto('/instruments')
  await page.getByTestId('instrument-editor').waitFor()
}

const preview = (page: Page) => page.getByTestId('instrument-editor').getByTestId('fretboard')

async function nutIsOnTheRight(page: Page) {
  return preview(page).evaluate((board) => {
    const svg = board.querySelector('svg')!
    const width = Number(svg.getAttribute('viewBox')!.split(' ')[2])
    return Number(board.querySelector('[data-fret-wire="0"]')!.getAttribute('x1')) > width / 2
  })
}

describe('instruments', () => {
  it('the student sees the preview, goes left-handed and back, adds a 5-string and uses it', async () => {
    const { page, context, foreign } = await newPage(browser, LAPTOP)
    await openInstruments(page)
    const [original] = await instrumentsOf(page)
    // the drop-D bass: 4 strings × frets 0–21
    await expect.poll(() => preview(page).locator('[data-string][data-fret]').count()).toBe(4 * 22)
    expect(
      await preview(page).getByRole('button', { name: 'A string, fret 5', exact: false }).count(),
    ).toBe(1)

    // Test sound: Tone.js loads the rendered samples (every bass note answers 200) and plays them
    const samples: number[] = []
    page.on('response', (res) => {
      if (res.url().includes('/samples/bass/')) samples.push(res.status())
    })
    await page.getByRole('button', { name: 'Test sound' }).click()
    await expect
      .poll(() => page.getByTestId('sound-voice').getAttribute('data-voice'))
      .toBe('samples')
    expect(samples.length).toBeGreaterThanOrEqual(12)
    expect(samples.every((status) => status === 200)).toBe(true)

    await page.getByTestId('hand-left').click()
    await expect.poll(() => nutIsOnTheRight(page)).toBe(true)
    await screenshot(page, 'instruments-left-handed-laptop')
    await page.getByTestId('hand-right').click()
    await expect.poll(() => nutIsOnTheRight(page)).toBe(false)
    expect(await page.getByTestId('save-instrument').isDisabled()).toBe(true)

    await page.getByTestId('add-instrument').click()
    await page.getByTestId('preset').click()
    await page.getByRole('option', { name: '5-string bass (B E A D G)' }).click()
    await expect.poll(() => preview(page).locator('[data-string][data-fret]').count()).toBe(5 * 25)
    await page.getByTestId('save-instrument').click()
    await expect.poll(async () => (await instrumentsOf(page)).length).toBe(2)
    const created = (await instrumentsOf(page)).find((i) => i.id !== original!.id)!
    // B0 E1 A1 D2 G2 = MIDI 23 28 33 38 43 (scientific pitch notation)
    expect(created.tuning).toEqual([23, 28, 33, 38, 43])
    await screenshot(page, 'instruments-24-frets-laptop')
    await preview(page).screenshot({ path: path.join(SCREENSHOT_DIR, 'board-24-frets-laptop.png') })

    // Export image → PNG: a real PNG (signature 89 50 4E 47 0D 0A 1A 0A, PNG spec) twice the board's size
    const download = page.waitForEvent('download')
    await page.getByRole('button', { name: 'Export image' }).click()
    await page.getByText('PNG picture').click()
    const file = (await (await download).path())!
    const png = readFileSync(file)
    expect([...png.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])
    const boardWidth = await preview(page).evaluate((b) =>
      Number(b.querySelector('svg')!.getAttribute('viewBox')!.split(' ')[2]),
    )
    expect(png.readUInt32BE(16)).toBe(Math.round(boardWidth * 2))
    copyFileSync(file, path.join(SCREENSHOT_DIR, 'exported-board.png'))
    // Export image → SVG: Roboto travels inside it (base64 of the WOFF2 signature "wOF2", W3C WOFF2)
    const svgDownload = page.waitForEvent('download')
    await page.getByRole('button', { name: 'Export image' }).click()
    await page.getByText('SVG drawing').click()
    const svgText = readFileSync((await (await svgDownload).path())!, 'utf8')
    expect(svgText).toMatch(
      /@font-face\{font-family:'Roboto';[^}]*font-weight:700;src:url\(data:font\/woff2;base64,d09GMg/,
    )

    await page.getByRole('button', { name: `Use ${created.name} for practice` }).click()
    await expect
      .poll(async () => (await instrumentsOf(page)).find((i) => i.isActive)?.id)
      .toBe(created.id)
    await expect
      .poll(() => page.getByTestId(`instrument-${created.id}`).getByTestId('active-chip').count())
      .toBe(1)
    await screenshot(page, 'instruments-activated-laptop')

    // Back to the drop-D bass, and the 5-string deleted.
    await page.getByRole('button', { name: `Use ${original!.name} for practice` }).click()
    await expect
      .poll(async () => (await instrumentsOf(page)).find((i) => i.isActive)?.id)
      .toBe(original!.id)
    await page.getByRole('button', { name: 'Delete' }).click()
    await page.getByTestId('confirm-delete').click()
    await expect
      .poll(async () => (await instrumentsOf(page)).map((i) => i.id))
      .toEqual([original!.id])
    expect(foreign).toEqual([])
    await context.close()
  })

  it('on a phone the page and a 4-string board fit, the board scrolling inside its own box', async () => {
    const { page, context } = await newPage(browser, PHONE)
    await openInstruments(page)
    await preview(page).waitFor()
    const pageWidth = await page.evaluate(() => document.documentElement.scrollWidth)
    expect(pageWidth).toBeLessThanOrEqual(PHONE.width)
    await screenshot(page, 'instruments-phone')
    await preview(page).screenshot({ path: path.join(SCREENSHOT_DIR, 'board-4-string-phone.png') })
    await page.getByRole('button', { name: 'Use dark theme' }).click()
    await screenshot(page, 'instruments-phone-dark')
    await context.close()
  })
})
