// Finding 1 as the attack: a burst of sign-ups must neither stall the API (bcrypt runs in worker
// threads) nor create more accounts than the limiter allows.
import request from 'supertest'
import { randomBytes, randomUUID } from 'node:crypto'
import { afterAll, beforeAll, expect, it } from 'vitest'
import { passwordTasksInFlight, verifyPassword } from '../../server/auth/password'
import { startTestApi, type TestApi } from '../helpers/api'

const SIGNUP_LIMIT = 4
let api: TestApi
beforeAll(async () => {
  api = await startTestApi({ signupsPerHour: SIGNUP_LIMIT })
})
afterAll(() => api.close())

/** Resolves once the predicate holds (checked between short sleeps; only order is asserted). */
async function until(predicate: () => boolean) {
  while (!predicate()) await new Promise((r) => setTimeout(r, 5))
}

// Each sign-up that passes is a real bcrypt (cost 12) on one worker thread of a shared machine.
const SLOW = { timeout: 120_000 }

it(
  'when 24 sign-ups arrive at once, then /api/health answers while they are still hashing and the limiter refuses the excess',
  SLOW,
  async () => {
    const tag = randomUUID().slice(0, 8)
    let answered = 0
    const signUps = Array.from({ length: 24 }, (_, i) =>
      request(api.app)
        .post('/api/auth/register')
        .send({
          email: `burst-${tag}-${i}@example.test`,
          password: 'a long burst password',
          name: `Burst ${i}`,
          role: 'student',
        })
        .then((res) => {
          answered += 1
          return res.status
        }),
    )

    // Reaching this line at all needs a free event loop; then ask for health while hashes run.
    await until(() => passwordTasksInFlight() > 0)
    const health = await request(api.app).get('/api/health')
    const hashingWhenHealthAnswered = passwordTasksInFlight()
    const signUpsPendingWhenHealthAnswered = 24 - answered

    expect(health.status).toBe(200)
    expect(hashingWhenHealthAnswered).toBeGreaterThan(0)
    expect(signUpsPendingWhenHealthAnswered).toBeGreaterThan(0)

    const statuses = await Promise.all(signUps)
    expect(statuses.filter((s) => s === 201)).toHaveLength(SIGNUP_LIMIT)
    expect(statuses.filter((s) => s === 429)).toHaveLength(24 - SIGNUP_LIMIT)
    const created = await api.ctx.db('users').whereLike('email', `burst-${tag}-%`).select('id')
    expect(created).toHaveLength(SIGNUP_LIMIT)
  },
)

it('when a password is hashed in the pool, then it is bcrypt at the configured cost and verifies', async () => {
  const own = await startTestApi()
  const res = await request(own.app)
    .post('/api/auth/register')
    .send({
      email: `cost-${randomUUID().slice(0, 8)}@example.test`,
      password: 'a checked passphrase',
      name: 'Cost Check',
      role: 'teacher',
    })
  expect(res.status).toBe(201)
  const row = await api.ctx.db('users').where({ id: res.body.user.id }).first('password_hash')
  // bcrypt modular crypt format: $2b$<cost>$<22-char salt><31-char hash> (OpenBSD bcrypt)
  expect(row.password_hash).toMatch(/^\$2b\$12\$[./A-Za-z0-9]{53}$/)
  expect(await verifyPassword('a checked passphrase', row.password_hash)).toBe(true)
  expect(await verifyPassword('another passphrase', row.password_hash)).toBe(false)
  await own.close()
})

it('when one address registers the same e-mail again and again, then the per-e-mail limit answers 429', async () => {
  const email = `again-${randomUUID().slice(0, 8)}@example.test`
  const body = { email, password: 'a long enough one', name: 'Again', role: 'student' }
  const own = await startTestApi({ signupsPerHour: 100 })
  try {
    const statuses: number[] = []
    for (let i = 0; i < 4; i++)
      statuses.push((await request(own.app).post('/api/auth/register').send(body)).status)
    expect(statuses).toEqual([201, 409, 409, 429])
  } finally {
    await own.close()
  }
})

it('when the e-mail is thousands of random characters long, then the sign-up is a 400, not a 500 (its rate-limit key stays indexable)', async () => {
  const own = await startTestApi({ signupsPerHour: 100 })
  try {
    const res = await request(own.app)
      .post('/api/auth/register')
      .send({
        email: randomBytes(3_000).toString('base64'),
        password: 'a long password',
        name: 'Long',
        role: 'student',
      })
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toHaveProperty('email')
  } finally {
    await own.close()
  }
})
