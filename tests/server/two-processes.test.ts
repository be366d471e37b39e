// Two app processes side by side on one database and one bucket, as `WEB_CONCURRENCY=2` runs them:
// a take uploaded through one plays from the other, a rate limit counts requests to both, and the
// schedulers of both run the mail job while each reminder and digest is sent once.
import { randomBytes, randomUUID } from 'node:crypto'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { migrateToLatest } from '../../db/live-sql'
import { createDatabase, dropDatabase } from '../../scripts/db.mjs'
import { databaseUrl, TEST_API_DATABASE } from '../../scripts/lib/paths.mjs'
import { issueSessionToken } from '../../server/auth/sessions'
import { sessionCookieName } from '../../server/auth/session-token'
import { MAIL_JOB, scheduledTick } from '../../server/digests/scheduler'
import { CSRF_HEADER, CSRF_VALUE } from '../../server/lib/csrf'
import { createDb } from '../../server/lib/db'
import { apiProcess, type ApiProcess } from '../helpers/api-process'
import { startTestApi, type TestApi } from '../helpers/api'
import { SCRIPT_TIMEOUT } from '../helpers/scripts'
import { createPlan, studentIn, teacherWithStudio, wavFile } from '../helpers/studio'

const DATABASE = `${TEST_API_DATABASE}_two`
const URL = databaseUrl(DATABASE)
const JWT_SECRET = randomBytes(32).toString('hex')
const SIGNUPS_PER_HOUR = 3

let api: TestApi // in-process, for fixtures and the mail sink both processes send to
let one: ApiProcess
let two: ApiProcess
let student: { id: string; cookie: string }
let teacher: { id: string; cookie: string }
let assignmentId: string
let itemId: string

async function cookieOf(userId: string) {
  return `${sessionCookieName(api.ctx.config)}=${await issueSessionToken(api.ctx, userId)}`
}

beforeAll(async () => {
  await dropDatabase(DATABASE)
  await createDatabase(DATABASE)
  const db = createDb(URL)
  await migrateToLatest(db)
  await db.destroy()
  api = await startTestApi({ databaseUrl: URL, jwtSecret: JWT_SECRET, rateLimitScope: '' })
  const t = await teacherWithStudio(api.app, 'Marta Ilves')
  const s = await studentIn(api.app, api.ctx, t.studioId, 'Noor Halvorsen')
  const dueAt = new Date(Date.now() + 6 * 3600 * 1000).toISOString() // due soon: a reminder is due
  const plan = await createPlan(t, { studentIds: [s.user.id], dueAt })
  ;[assignmentId, itemId] = [plan.assignees[0]!.assignmentId, plan.items[0]!.id]
  student = { id: s.user.id, cookie: await cookieOf(s.user.id) }
  teacher = { id: t.user.id, cookie: await cookieOf(t.user.id) }
  const env = {
    SMTP_PORT: String(api.sink.port),
    SIGNUP_RATE_LIMIT: String(SIGNUPS_PER_HOUR),
    SCHEDULER_FIRST_RUN_MS: '0',
    SCHEDULER_INTERVAL_MS: '200',
    BCRYPT_COST: '12',
  }
  ;[one, two] = await Promise.all([
    apiProcess(URL, JWT_SECRET, env),
    apiProcess(URL, JWT_SECRET, env),
  ])
  await Promise.all([one.start(), two.start()])
}, SCRIPT_TIMEOUT)

afterAll(async () => {
  await Promise.all([one?.stop(), two?.stop()])
  await api?.close()
})

const recordingsPath = () => `/api/assignments/${assignmentId}/recordings`

describe('two app processes', () => {
  it('when a take is uploaded through one process, then the other plays it, whole and by byte range', async () => {
    const wav = wavFile(4000)
    const up = await request(one.url)
      .post(recordingsPath())
      .set('Cookie', student.cookie)
      .set(CSRF_HEADER, CSRF_VALUE)
      .field('planItemId', itemId)
      .attach('file', wav, 'take.wav')
    expect(up.status).toBe(201)
    const audio = `${recordingsPath()}/${up.body.recording.id}/audio`

    const whole = await request(two.url).get(audio).set('Cookie', teacher.cookie).buffer(true)
    expect(whole.status).toBe(200)
    expect(Buffer.compare(whole.body as Buffer, wav)).toBe(0)
    const part = await request(two.url)
      .get(audio)
      .set('Cookie', student.cookie)
      .set('Range', 'bytes=100-1099')
      .buffer(true)
    expect(part.status).toBe(206)
    expect(part.headers['content-range']).toBe(`bytes 100-1099/${wav.length}`)
    expect(Buffer.compare(part.body as Buffer, wav.subarray(100, 1100))).toBe(0)
  })

  it('when sign-ups alternate between the processes, then the limit counts them together', async () => {
    const statuses: number[] = []
    for (let i = 0; i <= SIGNUPS_PER_HOUR; i++) {
      const res = await request(i % 2 ? two.url : one.url)
        .post('/api/auth/register')
        .set(CSRF_HEADER, CSRF_VALUE)
        .send({
          email: `burst-${randomUUID()}@cedarhollow.test`,
          password: 'a long enough passphrase',
          name: 'Burst Player',
          role: 'student',
        })
      statuses.push(res.status)
    }
    // Counted per process, the last request (the second to process two) would pass.
    expect(statuses).toEqual([...Array<number>(SIGNUPS_PER_HOUR).fill(201), 429])
  })

  it('when both schedulers tick many times, then each ran the mail job and every mail went once', async () => {
    const runs = () =>
      api.ctx.db('scheduled_runs').where({ job: MAIL_JOB }).select('runner', 'runs')
    for (;;) {
      const rows = await runs()
      if (rows.length >= 2 && rows.every((r: { runs: number }) => r.runs >= 3)) break
      await new Promise((r) => setTimeout(r, 100))
    }
    const mails = await api.ctx.db('captured_mail').select('recipients', 'subject')
    const reminders = mails.filter((m: { subject: string }) => m.subject.startsWith('Due soon'))
    const digests = mails.filter((m: { subject: string }) => m.subject.startsWith('Your studio'))
    expect(reminders).toHaveLength(1)
    expect(digests).toHaveLength(1)
    const logged = await api.ctx.db('notification_log').select('kind')
    expect(logged.map((l: { kind: string }) => l.kind).sort()).toEqual([
      'due-soon',
      'weekly-digest',
    ])
  })

  it('when another process holds the mail job, then a tick skips it instead of waiting', async () => {
    await api.ctx.db.transaction(async (trx) => {
      await trx.raw('select pg_advisory_xact_lock(?::int, hashtext(?))', [0x416d4a62, MAIL_JOB])
      expect(await scheduledTick(api.ctx)).toBeNull()
    })
    // Once released the job runs again (other test files' apps share this database and may hold the
    // lock for a moment themselves, so the tick is tried until one runs it).
    await expect
      .poll(() => scheduledTick(api.ctx), { timeout: 20_000, interval: 200 })
      .toEqual({ reminders: 0, digests: 0, invoiceReminders: 0 })
  })
})
