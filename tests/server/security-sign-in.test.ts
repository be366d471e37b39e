// Finding 2 as the attack: forged X-Forwarded-For, guessing one account, parallel guesses, malformed
// bodies, the owner locked out by strangers, and the change-password bucket.
import request from 'supertest'
import { randomInt } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import {
  signedInAgent,
  startTestApi,
  TEST_PASSWORD,
  uniqueEmail,
  waitForMail,
  type TestApi,
} from '../helpers/api'

// A back-off base of a minute makes "within the back-off" certain however slow the machine is;
// 5 failures per address (default 10) keeps the bcrypt work of these tests small.
const LIMITS = {
  loginAttemptsPer15Min: 5,
  loginFreeFailuresPerAccount: 5,
  loginBackoffBaseMs: 60_000,
}
// Each checked password is a real bcrypt (cost 12) on one worker thread of a shared machine.
const SLOW = { timeout: 120_000 }
let direct: TestApi // no proxy trusted (the default)
let proxied: TestApi // TRUST_PROXY=loopback: X-Forwarded-For names the client
beforeAll(async () => {
  direct = await startTestApi(LIMITS)
  proxied = await startTestApi({ ...LIMITS, trustProxy: 'loopback' })
})
afterAll(async () => {
  await direct.close()
  await proxied.close()
})

const randomAddress = () => `203.0.113.${randomInt(1, 255)}`
let nextAddress = 1
/** A client address of its own for each test (TEST-NET-2, RFC 5737). */
const freshAddress = () => `198.51.100.${nextAddress++}`

const signIn = (api: TestApi, email: string, password: string, from?: string) => {
  const req = request(api.app).post('/api/auth/login')
  if (from) req.set('X-Forwarded-For', from)
  return req.send({ email, password })
}

describe('client address', SLOW, () => {
  it('when an attacker forges X-Forwarded-For on every try, then the address count still grows to 429', async () => {
    const statuses: number[] = []
    for (let i = 0; i < 25; i++) {
      // A new account and a new made-up address each time: only the real address can be counted.
      const res = await signIn(direct, uniqueEmail('spray'), 'wrong guess', randomAddress())
      statuses.push(res.status)
    }
    expect(statuses.slice(0, 5)).toEqual(Array(5).fill(401))
    expect(statuses.slice(5)).toEqual(Array(20).fill(429))
  })

  it('when the body is malformed, then the try is a 400 and does not count as a failure', async () => {
    const { email } = await signedInAgent(proxied.app)
    const from = freshAddress()
    for (let i = 0; i < 30; i++) {
      const res = await request(proxied.app)
        .post('/api/auth/login')
        .set('X-Forwarded-For', from)
        .send(i % 2 ? { email } : { email: 'not an address', password: 'x' })
      expect(res.status).toBe(400)
    }
    expect((await signIn(proxied, email, TEST_PASSWORD, from)).status).toBe(200)
  })
})

describe('one account under attack', SLOW, () => {
  it('when 25 wrong passwords come from 25 addresses, then 429 after the free tries, yet the owner signs in from their own browser', async () => {
    const owner = await signedInAgent(proxied.app)
    const home = freshAddress()
    // The owner signed in here before: this browser holds the account's device cookie.
    const browser = request.agent(proxied.app)
    const first = await browser
      .post('/api/auth/login')
      .set('X-Forwarded-For', home)
      .send({ email: owner.email, password: TEST_PASSWORD })
    expect(first.status).toBe(200)

    const statuses: number[] = []
    for (let i = 0; i < 25; i++)
      statuses.push((await signIn(proxied, owner.email, `guess ${i}`, freshAddress())).status)
    expect(statuses.slice(0, 5)).toEqual(Array(5).fill(401))
    expect(statuses.slice(5)).toEqual(Array(20).fill(429))

    // Even the right password gets nowhere from a stranger's browser: the lock tells nothing.
    const stranger = await signIn(proxied, owner.email, TEST_PASSWORD, freshAddress())
    expect(stranger.status).toBe(429)
    expect(Number(stranger.headers['retry-after'])).toBeGreaterThan(0)

    const again = await browser
      .post('/api/auth/login')
      .set('X-Forwarded-For', home)
      .send({ email: owner.email, password: TEST_PASSWORD })
    expect(again.status).toBe(200)
  })

  it('when 20 guesses arrive at once, then no more than the free tries are checked', async () => {
    const { email } = await signedInAgent(proxied.app)
    const statuses = await Promise.all(
      Array.from({ length: 20 }, (_, i) => signIn(proxied, email, `parallel ${i}`, freshAddress())),
    ).then((all) => all.map((r) => r.status))
    expect(statuses.filter((s) => s === 401)).toHaveLength(5)
    expect(statuses.filter((s) => s === 429)).toHaveLength(15)
  })

  it('when the owner resets the password by e-mail, then the lock-out is lifted for every browser', async () => {
    const { email } = await signedInAgent(proxied.app)
    for (let i = 0; i < 6; i++) await signIn(proxied, email, `guess ${i}`, freshAddress())
    expect((await signIn(proxied, email, TEST_PASSWORD, freshAddress())).status).toBe(429)

    await request(proxied.app).post('/api/auth/password-reset').send({ email })
    const mail = await waitForMail(proxied.ctx, email)
    const token = new URL(mail.text.match(/https?:\/\/\S+/)![0]).searchParams.get('token')!
    const confirm = await request(proxied.app)
      .post('/api/auth/password-reset/confirm')
      .send({ token, password: 'a new safe passphrase' })
    expect(confirm.status).toBe(204)
    expect((await signIn(proxied, email, 'a new safe passphrase', freshAddress())).status).toBe(200)
  })
})

describe('change password', SLOW, () => {
  it('when sign-in failures used up an address, then changing the password from it still works (own bucket)', async () => {
    const { agent } = await signedInAgent(proxied.app)
    const from = freshAddress()
    for (let i = 0; i < 5; i++) await signIn(proxied, uniqueEmail('other'), 'wrong', from)
    expect((await signIn(proxied, uniqueEmail('other'), 'wrong', from)).status).toBe(429)

    const res = await agent
      .post('/api/auth/password')
      .set('X-Forwarded-For', from)
      .send({ currentPassword: TEST_PASSWORD, newPassword: 'changed passphrase' })
    expect(res.status).toBe(204)
  })

  it('when the current password is guessed, then 429 after 5 tries while sign-in stays open', async () => {
    const { agent, email } = await signedInAgent(proxied.app)
    const statuses: number[] = []
    for (let i = 0; i < 7; i++) {
      const res = await agent
        .post('/api/auth/password')
        .send({ currentPassword: `guess ${i} wrong`, newPassword: 'whatever passphrase' })
      statuses.push(res.status)
    }
    expect(statuses).toEqual([400, 400, 400, 400, 400, 429, 429])
    expect((await signIn(proxied, email, TEST_PASSWORD, freshAddress())).status).toBe(200)
  })
})
