// Instrument-aware plans (issue 16 item 5): a teacher's Neck Recall item on "the two highest strings"
// previews as D–G for a student with a 5-string bass and as B–high E for one with a guitar, and the
// 5-string's drill opens on D and G; after one student meets the target, the plans page says who
// finished and how far the other is. Fresh accounts only (drill specs count seeded answers).
import { randomUUID } from 'node:crypto'
import type { Browser, Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { APP_HEADERS, launchBrowser, PHONE, screenshot } from '../helpers/browser'
import { joinWithToken, signedUp, studioLink } from '../helpers/e2e-accounts'
import { attemptBody } from '../helpers/practice'

// Open strings lowest first (common practice): B0 E1 A1 D2 G2 and E2 A2 D3 G3 B3 E4
const NECKS = {
  five: { name: 'Five-string', presetId: 'bass-5', tuning: [23, 28, 33, 38, 43], frets: 24 },
  guitar: { name: 'Guitar', presetId: 'guitar-6', tuning: [40, 45, 50, 55, 59, 64], frets: 22 },
}

let browser: Browser

/** Adds an instrument and makes it the active one. */
async function playing(student: Page, neck: (typeof NECKS)['five']) {
  const res = await student.request.post('/api/instruments', {
    headers: APP_HEADERS,
    data: { ...neck, scaleLengthMm: 864 },
  })
  expect(res.status()).toBe(201)
  const { id } = ((await res.json()) as { instrument: { id: string } }).instrument
  await student.request.post(`/api/instruments/${id}/activate`, { headers: APP_HEADERS })
  return id
}

describe('a plan on two instruments', () => {
  let teacher: Page
  const students: { name: string; page: Page; id: string; instrumentId: string }[] = []
  let itemId = ''

  beforeAll(async () => {
    browser = await launchBrowser()
    teacher = (await signedUp(browser, 'teacher', 'Ines Spanwright')).page
    const { token } = await studioLink(teacher, 'Spanwright Low End')
    for (const [name, neck] of [
      ['Tobin Fivestring', NECKS.five],
      ['Willa Sixstring', NECKS.guitar],
    ] as const) {
      const { page, id } = await signedUp(browser, 'student', name)
      await joinWithToken(page, token)
      students.push({ name, page, id, instrumentId: await playing(page, neck) })
    }
    const plan = await teacher.request.post('/api/plans', {
      headers: APP_HEADERS,
      data: {
        title: 'The two highest strings',
        items: [
          {
            preset: {
              drill: 'recall',
              settings: {
                region: { lowString: 0, highString: 1, lowFret: 0, highFret: 3 },
                strings: { from: 'highest', to: '2nd-highest' },
              },
            },
            target: { kind: 'accuracy', minAccuracy: 0.75, maxMedianMs: 3000, minAttempts: 4 },
          },
        ],
        studentIds: students.map((s) => s.id),
      },
    })
    expect(plan.status()).toBe(201)
    itemId = ((await plan.json()) as { plan: { items: { id: string }[] } }).plan.items[0]!.id
  })
  afterAll(() => browser?.close())

  it('the editor previews the item on each student instrument', async () => {
    await teacher.goto('/studio/plans')
    await teacher.getByRole('button', { name: 'Edit and assign' }).click()
    const [tobin, willa] = students
    const line = (id: string) => teacher.getByTestId(`preview-${id}`)
    await line(tobin!.id).waitFor()
    expect(await line(tobin!.id).textContent()).toContain(
      'Tobin Fivestring (5-string bass (B E A D G)): strings D–G, frets 0–3',
    )
    expect(await line(willa!.id).textContent()).toContain('strings B–high E, frets 0–3')
    await screenshot(teacher, 'plans-instrument-preview-laptop')
    await teacher.getByRole('button', { name: 'Cancel' }).click()
  })

  it('the drill opened from the plan asks for the 5-string’s D and G strings', async () => {
    const tobin = students[0]!
    await tobin.page.goto(`/practice/recall?planItem=${itemId}`)
    const setup = tobin.page.locator('[data-testid="drill-setup"][data-ready="true"]')
    await setup.waitFor()
    const field = (n: number) => setup.locator('.string-field').nth(n)
    await expect.poll(() => field(0).textContent()).toContain('D string')
    expect(await field(1).textContent()).toContain('G string') // stored fallback: strings 0–1, B–E
  })

  it('after one student meets the target, the plans page says who finished', async () => {
    const tobin = students[0]!
    const at = new Date().toISOString()
    const session = randomUUID()
    const neck = { instrumentId: tobin.instrumentId, tuning: NECKS.five.tuning }
    const attempts = [0, 1, 2, 3].map((fret) =>
      attemptBody(neck, session, {
        string: 4,
        fret,
        correct: true,
        ms: 900,
        at,
        planItemId: itemId,
      }),
    )
    const res = await tobin.page.request.post('/api/attempts', {
      headers: APP_HEADERS,
      data: { attempts, timeZone: 'UTC' },
    })
    expect(res.status()).toBe(201)
    const phone = (await signedInPhone(teacher)).page
    await phone.goto('/studio/plans')
    const done = phone.getByTestId(`assignee-${tobin.id}`)
    await done.waitFor()
    expect(await done.textContent()).toContain('Tobin Fivestring: finished')
    expect(await phone.getByTestId(`assignee-${students[1]!.id}`).textContent()).toContain(
      '0 of 1 targets · 0 %',
    )
    await screenshot(phone, 'plans-assignee-progress-phone')
  })
})

/** The teacher's session in a phone-sized page of the same browser context. */
async function signedInPhone(page: Page) {
  const phone = await page.context().newPage()
  await phone.setViewportSize(PHONE)
  return { page: phone }
}
