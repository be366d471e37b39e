// Crash test: answers stream to the API as a real process, which is killed (SIGKILL) mid-stream and
// restarted; the client resends what was not acknowledged. Exactly the sent answers are stored, none
// twice, and the statistics and review cards equal a recomputation from the raw answers.
import { randomBytes, randomUUID } from 'node:crypto'
import type { Knex } from 'knex'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { migrateToLatest } from '../../db/live-sql'
import { createDatabase, dropDatabase } from '../../scripts/db.mjs'
import { databaseUrl, TEST_API_DATABASE } from '../../scripts/lib/paths.mjs'
import { issueSessionToken } from '../../server/auth/sessions'
import { SESSION_COOKIE } from '../../server/auth/session-token'
import { loadConfig } from '../../server/config'
import { createDb } from '../../server/lib/db'
import { CSRF_HEADER, CSRF_VALUE } from '../../server/lib/csrf'
import { apiProcess, type ApiProcess } from '../helpers/api-process'
import { attemptBody, type Answer } from '../helpers/practice'
import { recomputed, rolledUp } from '../helpers/statistics-check'
import { SCRIPT_TIMEOUT } from '../helpers/scripts'

const DATABASE = `${TEST_API_DATABASE}_crash`
const URL = databaseUrl(DATABASE)
const JWT_SECRET = randomBytes(32).toString('hex')
const BASS = [28, 33, 38, 43] // E1 A1 D2 G2
const STREAMS = 4
const BATCH = 20
/** Acknowledged batches after which the process is killed (the other streams still in flight). */
const KILL_AFTER = 12

type Body = ReturnType<typeof attemptBody>
interface Batch {
  attempts: Body[]
  acked: boolean
}

let db: Knex
let api: ApiProcess
let player: { id: string; instrumentId: string; cookie: string }
const sent: Batch[] = []

beforeAll(async () => {
  await dropDatabase(DATABASE)
  await createDatabase(DATABASE)
  db = createDb(URL)
  await migrateToLatest(db)
  const [user] = await db('users')
    .insert({
      email: 'crash@example.test',
      name: 'Crash Test',
      role: 'student',
      password_hash: 'x',
    })
    .returning('id')
  const [bass] = await db('instruments')
    .insert({
      user_id: user.id,
      name: 'Bass',
      tuning: BASS,
      frets: 20,
      scale_length_mm: 864,
      is_active: true,
    })
    .returning('id')
  const config = loadConfig(process.env, { databaseUrl: URL, jwtSecret: JWT_SECRET })
  const token = await issueSessionToken({ db, config }, user.id)
  player = { id: user.id, instrumentId: bass.id, cookie: `${SESSION_COOKIE}=${token}` }
  api = await apiProcess(URL, JWT_SECRET)
}, SCRIPT_TIMEOUT)

afterAll(async () => {
  await api?.stop()
  await db?.destroy()
  await dropDatabase(DATABASE)
}, SCRIPT_TIMEOUT)

/** A session's batch: places over strings 0–3, frets 0–9, every fifth answer a miss. */
function newBatch(n: number): Batch {
  const sessionId = randomUUID()
  const attempts = Array.from({ length: BATCH }, (_, i) => {
    const answer: Answer = {
      string: i % 4,
      fret: (n + i) % 10,
      correct: (n + i) % 5 !== 0,
      ms: 700 + ((n * 53 + i * 31) % 1500),
      at: new Date(Date.now() - 600_000 + n * 1000 + i).toISOString(),
    }
    return attemptBody({ instrumentId: player.instrumentId, tuning: BASS }, sessionId, answer)
  })
  return { attempts, acked: false }
}

/** Posts a batch; true when the API acknowledged every answer in it (stored now or before). */
async function post(batch: Batch) {
  const res = await fetch(`${api.url}/api/attempts`, {
    method: 'POST',
    headers: {
      'content-type': 'application/json',
      cookie: player.cookie,
      [CSRF_HEADER]: CSRF_VALUE,
    },
    body: JSON.stringify({ attempts: batch.attempts, timeZone: 'Europe/Oslo' }),
  }).catch(() => null)
  if (!res || (res.status !== 200 && res.status !== 201)) return false
  const body = (await res.json()) as { stored: number; duplicates: number }
  batch.acked = body.stored + body.duplicates === BATCH
  return batch.acked
}

/** STREAMS clients sending batch after batch; the process is killed after KILL_AFTER acks. */
async function streamUntilKilled() {
  let acks = 0
  const stream = async () => {
    for (;;) {
      const batch = newBatch(sent.length)
      sent.push(batch)
      if (!(await post(batch))) return // cut off by the kill
      if (++acks === KILL_AFTER) void api.kill()
    }
  }
  await Promise.all(Array.from({ length: STREAMS }, stream))
}

/** After a restart the client resends every batch not acknowledged, until each is. */
async function resendUnacknowledged() {
  for (const batch of sent.filter((b) => !b.acked)) expect(await post(batch)).toBe(true)
}

async function queued() {
  const [row] = await db('rollup_queue').count({ n: '*' })
  return Number(row!.n)
}

describe('a crash in the middle of a stream of answers', () => {
  it(
    'when the API is killed twice mid-stream and restarted, then every sent answer is stored once and counted once',
    async () => {
      await api.start()
      await streamUntilKilled()
      await api.start()
      await resendUnacknowledged()
      await streamUntilKilled()
      await api.start()
      await resendUnacknowledged()
      // the restarted process's background drain empties the queue by itself
      await expect.poll(queued, { timeout: 60_000, interval: 100 }).toBe(0)

      const ids = sent.flatMap((b) => b.attempts.map((a) => a.id))
      expect(sent.filter((b) => !b.acked)).toEqual([])
      expect(sent.length).toBeGreaterThan(2 * KILL_AFTER)
      const stored = await db('attempts').where({ user_id: player.id }).pluck('id')
      expect(stored.length).toBe(ids.length)
      expect(new Set(stored)).toEqual(new Set(ids))

      const figures = await rolledUp(db, player.id)
      expect(figures).toEqual(await recomputed(db, player.id))
      expect(figures.cards.reduce((n, c) => n + c.reps, 0)).toBe(ids.length)
    },
    SCRIPT_TIMEOUT,
  )
})
