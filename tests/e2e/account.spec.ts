// A newcomer registers, forgets the password and resets it from the mailed link; the admin reads
// that mail in the mail log (its link hidden). Signing out everywhere; an admin's confirmed role
// change. Also the landing page on a phone.
import knex, { type Knex } from 'knex'
import type { Browser } from 'playwright-core'
import { afterAll, beforeAll, expect, inject, it } from 'vitest'
import {
  LAPTOP,
  launchBrowser,
  newPage,
  PHONE,
  screenshot,
  signInThroughUi,
} from '../helpers/browser'

let browser: Browser
let db: Knex
beforeAll(async () => {
  browser = await launchBrowser()
  db = knex({ client: 'pg', connection: inject('e2eDatabaseUrl') })
})
afterAll(async () => {
  await browser?.close()
  await db?.destroy()
})

/** The newest mail with this subject to an address (other mail, e.g. plan reminders, may arrive too). */
async function latestMailText(address: string, subject: string): Promise<string> {
  for (let i = 0; i < 50; i++) {
    const row = await db('captured_mail')
      .whereRaw('? = any(recipients)', [address])
      .andWhere({ subject })
      .orderBy('id', 'desc')
      .first()
    if (row) return row.text_body as string
    await new Promise((r) => setTimeout(r, 150))
  }
  throw new Error(`no mail for ${address}`)
}

it('a visitor sees what Ambitus is for on a phone, then registers as a student', async () => {
  const { page, context, foreign } = await newPage(browser, PHONE)
  await page.goto('/')
  expect(await page.getByRole('heading', { level: 1 }).textContent()).toContain('fretboard')
  await screenshot(page, 'landing-phone')
  await page.getByRole('link', { name: 'Create an account' }).first().click()
  await page.getByLabel('Your name').fill('Wren Calloway')
  await page.getByLabel('E-mail').fill('wren@cedarhollow.test')
  await page.getByLabel('Password').fill('long enough passphrase')
  await page.getByRole('button', { name: 'Create account' }).click()
  await page.waitForURL('**/practice')
  expect(foreign).toEqual([])
  await context.close()
})

it('a student signed in on a laptop and a phone signs out everywhere from the account page', async () => {
  const laptop = await newPage(browser, LAPTOP)
  const phone = await newPage(browser, PHONE)
  for (const { page } of [laptop, phone]) {
    await signInThroughUi(page, 'wren@cedarhollow.test', 'long enough passphrase')
    await page.waitForURL('**/practice')
  }
  await laptop.page.goto('/account')
  await screenshot(laptop.page, 'account-laptop')
  await laptop.page.getByTestId('sign-out-everywhere').click()
  await laptop.page.waitForURL('**/sign-in')
  // The phone kept its cookie, but its session is gone on the server.
  expect((await phone.page.request.get('/api/auth/me')).status()).toBe(401)
  await laptop.context.close()
  await phone.context.close()
})

it('a student who forgot the password resets it with the mailed link and signs in with the new one', async () => {
  const { page, context } = await newPage(browser, LAPTOP)
  await page.goto('/forgot-password')
  await page.getByLabel('E-mail').fill('lucia@cedarhollow.test')
  await page.getByRole('button', { name: 'Send reset link' }).click()
  await expect
    .poll(() => page.getByTestId('reset-sent').isVisible(), { timeout: 15_000 })
    .toBe(true)

  const mail = await latestMailText('lucia@cedarhollow.test', 'Reset your Ambitus password')
  const link = mail.match(/https?:\/\/\S+\/reset-password\S+/)![0]
  await page.goto(link)
  await page.getByLabel('New password', { exact: true }).fill('a fresh passphrase')
  await page.getByLabel('Repeat the new password').fill('a fresh passphrase')
  await page.getByRole('button', { name: 'Save new password' }).click()
  await expect
    .poll(() => page.getByTestId('reset-done').isVisible(), { timeout: 15_000 })
    .toBe(true)
  await screenshot(page, 'reset-done-laptop')

  await signInThroughUi(page, 'lucia@cedarhollow.test', 'a fresh passphrase')
  await page.waitForURL('**/practice')
  await context.close()
})

it('the admin signs in, lands on Users and reads the reset mail in the mail log', async () => {
  const { page, context } = await newPage(browser, LAPTOP)
  await signInThroughUi(page, 'admin@cedarhollow.test')
  await page.waitForURL('**/admin/users')
  await expect.poll(() => page.locator('tbody tr').count()).toBeGreaterThanOrEqual(7)
  await screenshot(page, 'admin-users-laptop')
  await page.getByRole('link', { name: 'Mail log' }).click()
  await page.waitForURL('**/admin/mail')
  const row = page
    .getByTestId('mail-log')
    .locator('tbody tr', { hasText: 'lucia@cedarhollow.test' })
    .first()
  await row.click()
  await expect
    .poll(() => page.getByRole('dialog').textContent())
    .toContain('[link to /reset-password (hidden)]')
  expect(await page.getByRole('dialog').textContent()).not.toContain('token=')
  await page.waitForTimeout(400) // let the dialog finish fading in before the screenshot
  await screenshot(page, 'admin-mail-laptop')
  await context.close()
})

it('the admin changes a role only after confirming what follows', async () => {
  const { page, context } = await newPage(browser, LAPTOP)
  await signInThroughUi(page, 'admin@cedarhollow.test')
  await page.waitForURL('**/admin/users')
  await page.getByRole('textbox', { name: 'Search name or e-mail' }).fill('Calloway')
  await expect.poll(() => page.locator('tbody tr').count()).toBe(1)
  const role = page.getByLabel('Role of Wren Calloway')
  const roleField = page.locator('tbody tr', { hasText: 'Wren Calloway' }).locator('.v-field')

  await roleField.click()
  await page.getByRole('option', { name: 'teacher' }).click()
  const dialog = page.getByTestId('user-change-dialog')
  await expect.poll(() => dialog.textContent()).toContain('Make Wren Calloway a teacher?')
  expect(await dialog.textContent()).toContain('signed out on every device')
  await page.waitForTimeout(400) // let the dialog finish fading in before the screenshot
  await screenshot(page, 'admin-role-confirm-laptop')
  await dialog.getByRole('button', { name: 'Cancel' }).click()
  await expect.poll(() => role.inputValue()).toBe('student')
  const unchanged = await db('users').where({ email: 'wren@cedarhollow.test' }).first('role')
  expect(unchanged.role).toBe('student')

  await roleField.click()
  await page.getByRole('option', { name: 'teacher' }).click()
  await dialog.getByRole('button', { name: 'Change role' }).click()
  await expect.poll(() => dialog.count()).toBe(0)
  await expect.poll(() => role.inputValue()).toBe('teacher')
  const changed = await db('users').where({ email: 'wren@cedarhollow.test' }).first('role')
  expect(changed.role).toBe('teacher')
  await context.close()
})
