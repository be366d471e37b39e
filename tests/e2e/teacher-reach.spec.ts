// Reaching students in the browser (issue 16): the teacher writes to a student and sees the seeded
// studio message's read state; the student opens it (unread count in the navigation, New chip) and
// the teacher then sees it read, and the message is mailed; a student keeps a time zone in Account;
// the teacher invites several addresses with a note, then makes an open link for a chat, with which
// a newcomer gives their own address and joins.
import knex, { type Knex } from 'knex'
import type { Browser, Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest'
import {
  LAPTOP,
  launchBrowser,
  newPage,
  PHONE,
  screenshot,
  signInThroughUi,
  signUpFresh,
} from '../helpers/browser'

let browser: Browser
let db: Knex
let teacher: Page
const stamp = Date.now()
const SUBJECT = `Shifts on the D string ${stamp}`
const ADDRESSES = [`ash-${stamp}@example.test`, `bay-${stamp}@example.test`]

beforeAll(async () => {
  browser = await launchBrowser()
  db = knex({ client: 'pg', connection: inject('e2eDatabaseUrl') })
  teacher = (await newPage(browser, LAPTOP)).page
  await signInThroughUi(teacher, 'teacher@cedarhollow.test')
  await teacher.waitForURL('**/studio')
})
afterAll(async () => {
  await browser?.close()
  await db?.destroy()
})

const sentCard = (page: Page, subject: string) =>
  page.getByTestId('sent-message').filter({ hasText: subject })

describe('messages', () => {
  it('the teacher sees who read the studio message and writes to Noor', async () => {
    await teacher.getByRole('link', { name: 'Messages' }).click()
    await teacher.waitForURL('**/messages')
    const studioMessage = sentCard(teacher, 'Studio evening on the 19th')
    await expect
      .poll(() => studioMessage.getByTestId('read-summary').textContent())
      .toMatch(/Read by 1 of \d/)
    expect(await studioMessage.textContent()).toContain('Whole studio')
    const composer = teacher.getByTestId('message-composer')
    await composer.getByLabel('To').click()
    await teacher.getByRole('option', { name: 'Noor Halvorsen' }).click()
    await teacher.keyboard.press('Escape') // closes the list of students
    await composer.getByLabel('Subject').fill(SUBJECT)
    await composer.getByLabel('Message').fill('Play the E minor run slowly, then shift up.')
    await composer.getByRole('button', { name: 'Send' }).click()
    await expect.poll(() => composer.textContent()).toContain('Message sent.')
    const mine = sentCard(teacher, SUBJECT)
    expect(await mine.getByTestId('recipient-Noor Halvorsen').textContent()).toContain(
      'not read yet',
    )
    await screenshot(teacher, 'messages-teacher-laptop')
  })

  it('the message reaches Noor by e-mail', async () => {
    let text = ''
    await expect
      .poll(async () => {
        const row = await db('captured_mail')
          .whereRaw('? = any(recipients)', ['student@cedarhollow.test'])
          .andWhere({ subject: `Marta Ilves: ${SUBJECT}` })
          .first()
        text = row?.text_body ?? ''
        return text
      })
      .toContain('> Play the E minor run slowly, then shift up.')
    expect(text).toMatch(/\/messages$/m)
  })

  it('Noor sees the unread count, opens the message, and the teacher then sees it read', async () => {
    const { page } = await newPage(browser, LAPTOP)
    await signInThroughUi(page, 'student@cedarhollow.test')
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'))
    await expect.poll(() => page.getByTestId('unread-messages').textContent()).toMatch(/[1-9]/)
    await page.goto('/messages')
    const item = page.getByTestId('received-message').filter({ hasText: SUBJECT })
    expect(await item.textContent()).toContain('New')
    await page.setViewportSize(PHONE)
    await screenshot(page, 'messages-student-phone')
    await item.locator('.v-expansion-panel-title').click()
    await expect.poll(() => item.textContent()).toContain('Play the E minor run slowly')
    await expect.poll(() => item.textContent()).not.toContain('New')
    await teacher.reload()
    await expect
      .poll(() => sentCard(teacher, SUBJECT).getByTestId('recipient-Noor Halvorsen').textContent())
      .toMatch(/· read \w+/) // "read 3 Dec…" or "read Dec 3…", as the browser's locale writes it
    await page.context().close()
  })
})

describe('the account time zone', () => {
  it('the teacher sees the studio zone kept; a student chooses Tokyo and it stays after a reload', async () => {
    await teacher.goto('/account')
    const card = teacher.getByTestId('time-zone-card')
    await expect
      .poll(() => card.locator('input[name="time-zone"]').inputValue())
      .toBe('Europe/Tallinn')
    expect(await card.getByLabel('Always use this zone:').isChecked()).toBe(true)
    // a new student: the account spec resets Lucia's password (ending her sessions) meanwhile
    const { page } = await newPage(browser, PHONE)
    const student = await signUpFresh(page, 'Kai Tanaka')
    await page.goto('/account')
    const mine = page.getByTestId('time-zone-card')
    await mine.getByLabel('Always use this zone:').check()
    await mine.getByLabel('Time zone').fill('Asia/Tok')
    await page.getByRole('option', { name: 'Asia/Tokyo' }).click()
    await mine.getByRole('button', { name: 'Save time zone' }).click()
    await expect.poll(() => mine.textContent()).toContain('Time zone saved: Asia/Tokyo.')
    await screenshot(page, 'account-time-zone-phone')
    await page.reload()
    await expect.poll(() => mine.locator('input[name="time-zone"]').inputValue()).toBe('Asia/Tokyo')
    const row = await db('user_time_zones as z')
      .join('users as u', 'u.id', 'z.user_id')
      .where('u.email', student)
      .first('z.time_zone', 'z.chosen_at')
    expect(row.time_zone).toBe('Asia/Tokyo')
    expect(row.chosen_at).not.toBeNull()
    await page.context().close()
  })
})

describe('inviting several and by link', () => {
  it('the teacher invites two addresses at once with a note, which the e-mails carry', async () => {
    await teacher.goto('/studio')
    await teacher.getByTestId('invite-open').click()
    await teacher.getByLabel("Students' e-mails").fill(ADDRESSES.join(', '))
    await teacher.getByLabel('Personal note (optional)').fill('See you on Tuesday at 17:00!')
    await teacher.getByRole('button', { name: 'Send invitation' }).click()
    await expect
      .poll(() => teacher.getByTestId('invite-sent').textContent())
      .toContain('Invitations sent to 2 addresses.')
    for (const address of ADDRESSES) {
      await expect
        .poll(async () => {
          const row = await db('captured_mail').whereRaw('? = any(recipients)', [address]).first()
          return row?.text_body ?? ''
        })
        .toContain('> See you on Tuesday at 17:00!')
    }
  })

  let link = ''
  it('the teacher makes a link for three uses and sees it listed', async () => {
    const panel = teacher.getByTestId('invite-link-panel')
    await panel.getByLabel('Uses').fill('3')
    await panel.getByRole('button', { name: 'Create link' }).click()
    const field = panel.getByTestId('invite-link-url').locator('input')
    await expect.poll(() => field.inputValue()).toContain('/invitations/accept?token=')
    link = await field.inputValue()
    expect(await panel.getByTestId('invite-link-item').first().textContent()).toContain(
      '0 of 3 uses',
    )
    await screenshot(teacher, 'invite-dialog-link-laptop')
  })

  it('a newcomer opens the link, gives their own address and joins', async () => {
    const { page } = await newPage(browser, PHONE)
    await page.goto(new URL(link).pathname + new URL(link).search)
    await expect
      .poll(() => page.getByTestId('invitation-accept').textContent())
      .toContain('An invitation link')
    await page.getByLabel('Your name').fill('Cedar Newcomer')
    await page.getByLabel('E-mail').fill(`newcomer-${stamp}@example.test`)
    await page.getByLabel('Choose a password').fill('a long password here')
    await screenshot(page, 'invite-link-accept-phone')
    await page.getByRole('button', { name: 'Create my account and join' }).click()
    await page.waitForURL('**/plans?joined=*')
    await expect
      .poll(() => page.getByTestId('joined').textContent())
      .toContain('Welcome to Cedar Hollow Music Collective')
    const row = await db('studio_invite_links').orderBy('created_at', 'desc').first('uses')
    expect(row.uses).toBe(1)
    await page.context().close()
  })
})
