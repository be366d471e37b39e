// Lesson billing in the browser (issue 18): the demo teacher adds a package and invoices a student;
// the student pays on the payment fake's hosted page; its signed webhook marks the invoice paid,
// the ledger counts the lessons and the receipt reaches the mail sink.
import type { Browser, Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest'
import { createDb, type Db } from '../../server/lib/db'
import {
  LAPTOP,
  launchBrowser,
  newPage,
  PHONE,
  screenshot,
  signInThroughUi,
} from '../helpers/browser'

// Signe: no other spec changes her account (account.spec resets Lucia's password)
const STUDENT = { name: 'Signe Marlow', email: 'signe@cedarhollow.test' }

let browser: Browser
let db: Db
let teacher: Page
beforeAll(async () => {
  browser = await launchBrowser()
  db = createDb(inject('e2eDatabaseUrl'))
  teacher = (await newPage(browser, LAPTOP)).page
  await signInThroughUi(teacher, 'teacher@cedarhollow.test')
  await teacher.waitForURL('**/studio')
})
afterAll(async () => {
  await browser?.close()
  await db?.destroy()
})

/**
 * Chooses an option of a select and waits until the field shows it and its menu has closed; on a
 * loaded machine a click can land while the menu is still opening, so it is tried again.
 */
async function pick(page: Page, testId: string, option: string) {
  const field = page.getByTestId(testId)
  const choice = page.getByRole('option', { name: option })
  await expect
    .poll(
      async () => {
        if (!(await choice.isVisible())) await field.click()
        await choice.click({ timeout: 5_000 }).catch(() => undefined)
        return field.textContent()
      },
      { timeout: 60_000 },
    )
    .toContain(option)
  if (await choice.isVisible()) await page.keyboard.press('Escape')
  await choice.waitFor({ state: 'hidden' })
}

const invoiceRow = (page: Page) =>
  page.getByTestId('invoice-row').filter({ hasText: 'Eight lessons' })

describe('the teacher', () => {
  it('sees the demo invoices, adds a package and invoices a student', async () => {
    await teacher.goto('/billing')
    const table = teacher.getByTestId('invoice-table')
    await expect.poll(() => table.textContent()).toContain('Tobiah Venn')
    expect(await table.textContent()).toMatch(/paid.*open|open.*paid/s)
    const packages = teacher.getByTestId('billing-packages')
    await packages.getByRole('textbox', { name: 'Name' }).fill('Eight lessons')
    await packages.getByRole('spinbutton', { name: 'Lessons' }).fill('8')
    await packages.getByRole('spinbutton', { name: 'Valid weeks' }).fill('10')
    await packages.getByTestId('package-price').locator('input').fill('300.00')
    await packages.getByTestId('package-add').click()
    await expect.poll(() => packages.textContent()).toContain('Eight lessons: €300.00')
    expect(await packages.textContent()).toContain('€37.50 each')

    await pick(teacher, 'draft-student', STUDENT.name)
    await pick(teacher, 'draft-package', 'Eight lessons')
    await teacher.getByTestId('draft-create').click()
    await expect.poll(() => invoiceRow(teacher).count()).toBe(1)
    await invoiceRow(teacher).getByTestId('invoice-issue').click()
    await expect
      .poll(() => invoiceRow(teacher).getByTestId('invoice-status').textContent())
      .toBe('open')
    await screenshot(teacher, 'billing-teacher-laptop')
  })
})

describe('the student', () => {
  let student: Page
  it('pays through the fake checkout and comes back to a paid invoice and 8 lessons left', async () => {
    student = (await newPage(browser, PHONE)).page
    await signInThroughUi(student, STUDENT.email)
    await student.waitForURL((url) => !url.pathname.startsWith('/sign-in'))
    await student.goto('/billing')
    await expect.poll(() => invoiceRow(student).count()).toBe(1)
    expect(await student.getByTestId('ledger-balance').textContent()).toBe('€300.00')
    await screenshot(student, 'billing-student-open-phone')
    await invoiceRow(student).getByTestId('invoice-pay').click()
    await student.waitForURL((url) => url.pathname.startsWith('/checkout/'))
    expect(await student.getByTestId('total').textContent()).toBe('€300.00')
    await screenshot(student, 'billing-fake-checkout-phone')
    await student.getByRole('button', { name: /^Pay/ }).click()
    await student.waitForURL('**/billing?paid=*')
    await expect.poll(() => student.getByTestId('paid-notice').textContent()).toContain('is paid')
    await expect
      .poll(() => invoiceRow(student).getByTestId('invoice-status').textContent())
      .toBe('paid')
    expect(await student.getByTestId('ledger-lessons-left').textContent()).toBe('8')
    expect(await student.getByTestId('ledger-balance').textContent()).toBe('€0.00')
    await screenshot(student, 'billing-student-paid-phone')
  })

  it('gets the receipt by mail, and the teacher sees the invoice paid', async () => {
    await expect
      .poll(
        async () =>
          (
            await db('captured_mail')
              .whereRaw('? = any(recipients)', [STUDENT.email])
              .where('subject', 'like', 'Receipt:%')
              .first('text_body')
          )?.text_body ?? '',
      )
      .toContain('Your package of 8 lessons is ready to use.')
    await teacher.reload()
    await expect
      .poll(() => invoiceRow(teacher).getByTestId('invoice-status').textContent())
      .toBe('paid')
  })
})
