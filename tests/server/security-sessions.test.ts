// Finding 3 as the attack: a cookie kept after sign-out (or a password reset, a role change, an
// account disabled, "sign out everywhere") is replayed and must get 401 at once.
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { SESSION_COOKIE } from '../../server/auth/session-token'
import {
  signedInAdmin,
  signedInAgent,
  startTestApi,
  TEST_PASSWORD,
  waitForMail,
  type TestApi,
} from '../helpers/api'

let api: TestApi
beforeAll(async () => {
  api = await startTestApi()
})
afterAll(() => api.close())

/** Signs in through the route and returns the raw cookie, as someone copying it would keep it. */
async function stolenCookie(email: string, password = TEST_PASSWORD) {
  const res = await request(api.app).post('/api/auth/login').send({ email, password })
  expect(res.status).toBe(200)
  const header = ([] as string[]).concat(res.headers['set-cookie'] ?? [])
  return header.find((c) => c.startsWith(`${SESSION_COOKIE}=`))!.split(';')[0]!
}

const replay = (cookie: string) => request(api.app).get('/api/auth/me').set('Cookie', cookie)

describe('sign-out', () => {
  it('when a signed-out cookie is replayed, then 401 at once', async () => {
    const { email } = await signedInAgent(api.app)
    const cookie = await stolenCookie(email)
    expect((await replay(cookie)).status).toBe(200)
    const out = await request(api.app).post('/api/auth/logout').set('Cookie', cookie)
    expect(out.status).toBe(204)
    expect((await replay(cookie)).status).toBe(401)
  })

  it('when the user signs out everywhere, then every session of theirs ends and no one else’s', async () => {
    const { agent, email } = await signedInAgent(api.app)
    const otherBrowser = await stolenCookie(email)
    const someoneElse = await signedInAgent(api.app)
    expect((await agent.post('/api/auth/logout-everywhere')).status).toBe(204)
    expect((await agent.get('/api/auth/me')).status).toBe(401)
    expect((await replay(otherBrowser)).status).toBe(401)
    expect((await someoneElse.agent.get('/api/auth/me')).status).toBe(200)
  })

  it('when nobody is signed in, then signing out everywhere is a 401', async () => {
    expect((await request(api.app).post('/api/auth/logout-everywhere')).status).toBe(401)
  })
})

describe('account changes end sessions', () => {
  it('when the password is reset by e-mail, then every earlier cookie gets 401', async () => {
    const { agent, email } = await signedInAgent(api.app)
    const kept = await stolenCookie(email)
    await request(api.app).post('/api/auth/password-reset').send({ email })
    const mail = await waitForMail(api.ctx, email)
    const token = new URL(mail.text.match(/https?:\/\/\S+/)![0]).searchParams.get('token')!
    await request(api.app)
      .post('/api/auth/password-reset/confirm')
      .send({ token, password: 'reset to something new' })
    expect((await agent.get('/api/auth/me')).status).toBe(401)
    expect((await replay(kept)).status).toBe(401)
  })

  it('when an admin disables an account, then its sessions end and sign-in is refused until enabled', async () => {
    const admin = await signedInAdmin(api.app)
    const target = await signedInAgent(api.app)
    const off = await admin.agent
      .patch(`/api/admin/users/${target.user.id}`)
      .send({ disabled: true })
    expect(off.status).toBe(200)
    expect(off.body.user.disabledAt).toEqual(expect.any(String))
    expect((await target.agent.get('/api/auth/me')).status).toBe(401)

    const refused = await request(api.app)
      .post('/api/auth/login')
      .send({ email: target.email, password: TEST_PASSWORD })
    expect(refused.status).toBe(403)
    expect(refused.body.error.code).toBe('account_disabled')
    const wrong = await request(api.app)
      .post('/api/auth/login')
      .send({ email: target.email, password: 'not the password' })
    expect(wrong.status).toBe(401) // a wrong password learns nothing about the account

    await admin.agent.patch(`/api/admin/users/${target.user.id}`).send({ disabled: false })
    expect((await replay(await stolenCookie(target.email))).status).toBe(200)
  })

  it('when an admin tries to disable their own account, then 400', async () => {
    const admin = await signedInAdmin(api.app)
    const res = await admin.agent
      .patch(`/api/admin/users/${admin.user.id}`)
      .send({ disabled: true })
    expect(res.status).toBe(400)
    expect(res.body.error.fields.disabled).toBeDefined()
  })
})

describe('cost and cookie', () => {
  it('when a signed-in request is served, then the session costs one database query', async () => {
    const { agent } = await signedInAgent(api.app)
    const queries: string[] = []
    const record = (q: { sql: string }) => queries.push(q.sql)
    api.ctx.db.on('query', record)
    try {
      expect((await agent.get('/api/auth/me')).status).toBe(200)
    } finally {
      api.ctx.db.off('query', record)
    }
    expect(queries).toHaveLength(1)
    expect(queries[0]).toMatch(/from "sessions" as "s" inner join "users" as "u"/)
  })

  it('when cookies are configured Secure (HTTPS), then the session cookie is __Host- prefixed and a plain one is ignored', async () => {
    const https = await startTestApi({ secureCookies: true })
    try {
      const { email } = await signedInAgent(https.app)
      const res = await request(https.app)
        .post('/api/auth/login')
        .send({ email, password: TEST_PASSWORD })
      const cookie = ([] as string[])
        .concat(res.headers['set-cookie'] ?? [])
        .find((c) => c.startsWith(`__Host-${SESSION_COOKIE}=`))!
      expect(cookie).toMatch(/; Secure/)
      expect(cookie).toMatch(/; Path=\//)
      expect(cookie).not.toMatch(/Domain=/i)
      const value = cookie.split(';')[0]!.split('=')[1]!
      const plain = await request(https.app)
        .get('/api/auth/me')
        .set('Cookie', `${SESSION_COOKIE}=${value}`)
      expect(plain.status).toBe(401)
      const prefixed = await request(https.app)
        .get('/api/auth/me')
        .set('Cookie', `__Host-${SESSION_COOKIE}=${value}`)
      expect(prefixed.status).toBe(200)
    } finally {
      await https.close()
    }
  })
})
