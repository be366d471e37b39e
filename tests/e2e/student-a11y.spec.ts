// axe-core (through @axe-core/playwright) over the main pages, signed out and as the demo student,
// in both themes: no serious or critical violations. Each finding is printed with its nodes.
import { AxeBuilder } from '@axe-core/playwright'
import type { Browser, Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { LAPTOP, launchBrowser, newPage, PHONE } from '../helpers/browser'
import { STUDENT } from '../helpers/drill-pages'
import { signInThroughUi } from '../helpers/browser'

let browser: Browser
beforeAll(async () => {
  browser = await launchBrowser()
})
afterAll(async () => {
  await browser?.close()
})

/** The serious and critical findings on the page as it is now, one line per node. */
async function seriousFindings(page: Page, where: string): Promise<string[]> {
  const { violations } = await new AxeBuilder({ page }).analyze()
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .flatMap((v) => v.nodes.map((n) => `${where}: ${v.id} (${v.impact}) at ${n.target.join(' ')}`))
}

const PUBLIC_PAGES = ['/', '/sign-in', '/register', '/forgot-password']
const STUDENT_PAGES = [
  '/practice',
  '/practice/recall',
  '/practice/hunt',
  '/practice/runs',
  '/practice/scatter',
  '/practice/cycle',
  '/progress',
  '/instruments',
  '/plans',
  '/account',
]

async function settle(page: Page) {
  await page.waitForLoadState('networkidle')
  await page
    .locator('.v-progress-linear--active')
    .first()
    .waitFor({ state: 'detached' })
    .catch(() => undefined)
}

describe('accessibility (axe-core): no serious or critical violations', () => {
  it('on the public pages, laptop and phone', async () => {
    const found: string[] = []
    for (const viewport of [LAPTOP, PHONE]) {
      const { page, context } = await newPage(browser, viewport)
      for (const path of PUBLIC_PAGES) {
        await page.goto(path)
        await settle(page)
        found.push(...(await seriousFindings(page, `${path} ${viewport.width}px`)))
      }
      await context.close()
    }
    expect(found).toEqual([])
  }, 180_000)

  it.each(['light', 'dark'])(
    'on the student’s pages and a running drill, %s',
    async (theme) => {
      const { page, context } = await newPage(browser, LAPTOP)
      await signInThroughUi(page, STUDENT)
      await page.waitForURL('**/practice')
      const found: string[] = []
      {
        if (theme === 'dark') await page.getByRole('button', { name: 'Use dark theme' }).click()
        for (const path of STUDENT_PAGES) {
          await page.goto(path)
          await settle(page)
          found.push(...(await seriousFindings(page, `${path} ${theme}`)))
        }
        await page.goto('/practice/recall')
        await page.locator('[data-testid="drill-setup"][data-ready="true"]').waitFor()
        await page.getByTestId('start-session').click()
        await page.getByTestId('question').waitFor()
        found.push(...(await seriousFindings(page, `recall session ${theme}`)))
      }
      await context.close()
      expect(found).toEqual([])
    },
    240_000,
  )
})
