// Shared set-up of the drill walk-throughs (one spec file per drill, so they run side by side):
// a Chromium, the e2e database, and reading back what the drills stored.
import knex, { type Knex } from 'knex'
import type { Browser, Page } from 'playwright-core'
import { afterAll, beforeAll, expect, inject } from 'vitest'
import { positionsOf } from '../../src/theory'
import { launchBrowser } from './browser'
import { clickCell, STUDENT, type ActiveInstrument, type AskedQuestion } from './drill-pages'

export interface DrillE2e {
  browser: Browser
  db: Knex
}

/** Registers beforeAll/afterAll for a spec file; the returned object is filled before the tests run. */
export function useDrillE2e(): DrillE2e {
  const env = {} as DrillE2e
  beforeAll(async () => {
    env.browser = await launchBrowser()
    env.db = knex({ client: 'pg', connection: inject('e2eDatabaseUrl') })
  })
  afterAll(async () => {
    await env.browser?.close()
    await env.db?.destroy()
  })
  return env
}

/** The student's attempts of a drill stored since `since` (polled: the client sends them in batches). */
export async function storedAttempts(db: Knex, drill: string, since: Date, atLeast: number) {
  const read = () =>
    db('attempts')
      .join('users', 'users.id', 'attempts.user_id')
      .where({ 'users.email': STUDENT, 'attempts.drill': drill })
      .andWhere('attempts.received_at', '>=', since)
      .select('attempts.*')
  await expect
    .poll(async () => (await read()).length, { timeout: 15_000 })
    .toBeGreaterThanOrEqual(atLeast)
  return read()
}

export const dbNow = async (db: Knex) => new Date((await db.raw('select now() as now')).rows[0].now)

/** Clicks the first place of the asked pitch (any place of the exact pitch is right). */
export const findPitch = (page: Page, instrument: ActiveInstrument) => async (q: AskedQuestion) => {
  const place = positionsOf(instrument.tuning, instrument.frets, q.pitch)[0]
  if (!place) throw new Error(`pitch ${q.pitch} is not on the neck`)
  await clickCell(page, place)
}
