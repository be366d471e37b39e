// Sign-in, sessions and roles against the real database.
import jwt from 'jsonwebtoken'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { SESSION_COOKIE } from '../../server/auth/session-token'
import {
  signedInAgent,
  startTestApi,
  TEST_PASSWORD,
  uniqueEmail,
  waitForMail,
  type TestApi,
} from '../helpers/api'

let api: TestApi
beforeAll(async () => {
  api = await startTestApi()
})
afterAll(() => api.close())

const sessionCookie = (res: request.Response) =>
  ([] as string[])
    .concat(res.headers['set-cookie'] ?? [])
    .find((c) => c.startsWith(`${SESSION_COOKIE}=`))

describe('register, sign in, me, sign out', () => {
  it('when a student registers, signs out and signs in again, then /me names them with their role', async () => {
    const agent = request.agent(api.app)
    const email = uniqueEmail('flow')
    const created = await agent
      .post('/api/auth/register')
      .send({ email, password: TEST_PASSWORD, name: 'Ada Flow', role: 'student' })
    expect(created.status).toBe(201)
    expect(created.body.user).toMatchObject({ email, role: 'student', name: 'Ada Flow' })
    expect(created.body.user.passwordHash).toBeUndefined()

    expect((await agent.post('/api/auth/logout')).status).toBe(204)
    expect((await agent.get('/api/auth/me')).status).toBe(401)

    const login = await agent
      .post('/api/auth/login')
      .send({ email: email.toUpperCase(), password: TEST_PASSWORD })
    expect(login.status).toBe(200)
    const cookie = sessionCookie(login)
    expect(cookie).toMatch(/HttpOnly/i)
    expect(cookie).toMatch(/SameSite=Lax/i)
    expect(cookie).not.toMatch(/Secure/i) // plain http on loopback

    const me = await agent.get('/api/auth/me')
    expect(me.status).toBe(200)
    expect(me.body.user).toMatchObject({ email, role: 'student' })
  })

  it('when X-Forwarded-Proto claims HTTPS but no proxy is trusted, then the cookie stays as configured', async () => {
    const { email } = await signedInAgent(api.app)
    const res = await request(api.app)
      .post('/api/auth/login')
      .set('X-Forwarded-Proto', 'https')
      .send({ email, password: TEST_PASSWORD })
    expect(sessionCookie(res)).toBeDefined()
    expect(sessionCookie(res)).not.toMatch(/Secure/)
  })

  it('when the password is wrong, then 401 and no cookie', async () => {
    const { email } = await signedInAgent(api.app)
    const res = await request(api.app)
      .post('/api/auth/login')
      .send({ email, password: 'not the password' })
    expect(res.status).toBe(401)
    expect(res.body.error.code).toBe('unauthorized')
    expect(sessionCookie(res)).toBeUndefined()
  })

  it('when the e-mail is unknown, then the same 401 as a wrong password', async () => {
    const res = await request(api.app)
      .post('/api/auth/login')
      .send({ email: uniqueEmail('ghost'), password: 'whatever-it-is' })
    expect(res.status).toBe(401)
    expect(res.body.error.message).toBe('E-mail or password is not right.')
  })

  it('when an e-mail is already registered, then 409 with a field error', async () => {
    const { email } = await signedInAgent(api.app)
    const res = await request(api.app)
      .post('/api/auth/register')
      .send({ email, password: TEST_PASSWORD, name: 'Twin', role: 'teacher' })
    expect(res.status).toBe(409)
    expect(res.body.error.fields.email[0]).toMatch(/already registered/)
  })
})

describe('boundary validation', () => {
  it('when the body is invalid, then 400 with a message per field', async () => {
    const res = await request(api.app)
      .post('/api/auth/register')
      .send({ email: 'nope', password: 'short', name: '', role: 'admin' })
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'name', 'password', 'role'])
    expect(res.body.error.fields.password[0]).toMatch(/at least 10/)
  })

  it('when the body is not JSON, then 400 not 500', async () => {
    const res = await request(api.app)
      .post('/api/auth/login')
      .set('content-type', 'application/json')
      .send('{"email":')
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('invalid_input')
  })

  it('when the body is larger than the limit, then 413', async () => {
    const res = await request(api.app)
      .post('/api/auth/login')
      .send({ email: 'a@b.test', password: 'x'.repeat(300_000) })
    expect(res.status).toBe(413)
  })

  it('when an API path does not exist, then a JSON 404', async () => {
    const res = await request(api.app).get('/api/no-such-thing')
    expect(res.status).toBe(404)
    expect(res.body.error.code).toBe('not_found')
  })
})

describe('sessions and roles', () => {
  it('when no cookie is sent, then protected routes answer 401', async () => {
    expect((await request(api.app).get('/api/auth/me')).status).toBe(401)
    expect((await request(api.app).get('/api/studio/students')).status).toBe(401)
  })

  it('when a student calls a teacher-only route, then 403', async () => {
    const { agent } = await signedInAgent(api.app, 'student')
    const res = await agent.get('/api/studio/students')
    expect(res.status).toBe(403)
    expect(res.body.error.code).toBe('forbidden')
  })

  it('when a teacher calls an admin route, then 403', async () => {
    const { agent } = await signedInAgent(api.app, 'teacher')
    expect((await agent.get('/api/admin/users')).status).toBe(403)
  })

  it('when the JWT is tampered with, then 401', async () => {
    const { agent } = await signedInAgent(api.app)
    const login = await agent.get('/api/auth/me')
    expect(login.status).toBe(200)
    const session = await api.ctx.db('sessions').where({ user_id: login.body.user.id }).first()
    const forged = jwt.sign(
      { sub: login.body.user.id, sid: session.id },
      'some-other-secret-of-32-characters!!',
    )
    const res = await request(api.app)
      .get('/api/auth/me')
      .set('Cookie', `${SESSION_COOKIE}=${forged}`)
    expect(res.status).toBe(401)
  })

  it('when the JWT has expired, then 401 even though its session row is still there', async () => {
    const { user } = await signedInAgent(api.app)
    const session = await api.ctx.db('sessions').where({ user_id: user.id }).first()
    const expired = jwt.sign(
      { sub: user.id, sid: session.id, exp: Math.floor(Date.now() / 1000) - 60 },
      api.ctx.config.jwtSecret,
    )
    const res = await request(api.app)
      .get('/api/auth/me')
      .set('Cookie', `${SESSION_COOKIE}=${expired}`)
    expect(res.status).toBe(401)
  })

  it('when a valid JWT is replayed after a password change, then 401', async () => {
    const { agent, email } = await signedInAgent(api.app)
    const old = await request(api.app)
      .post('/api/auth/login')
      .send({ email, password: TEST_PASSWORD })
    const oldCookie = sessionCookie(old)!.split(';')[0]!
    const change = await agent
      .post('/api/auth/password')
      .send({ currentPassword: TEST_PASSWORD, newPassword: 'a brand new passphrase' })
    expect(change.status).toBe(204)
    expect((await agent.get('/api/auth/me')).status).toBe(200) // this session got a fresh cookie
    expect((await request(api.app).get('/api/auth/me').set('Cookie', oldCookie)).status).toBe(401)
  })
})

describe('change password', () => {
  it('when the current password is wrong, then 400 on that field and the password is unchanged', async () => {
    const { agent, email } = await signedInAgent(api.app)
    const res = await agent
      .post('/api/auth/password')
      .send({ currentPassword: 'wrong wrong wrong', newPassword: 'another passphrase' })
    expect(res.status).toBe(400)
    expect(res.body.error.fields.currentPassword).toBeDefined()
    expect(
      (await request(api.app).post('/api/auth/login').send({ email, password: TEST_PASSWORD }))
        .status,
    ).toBe(200)
  })
})

describe('password reset by e-mail', () => {
  it('when a reset is asked for, then the mailed single-use link sets a new password', async () => {
    const { email } = await signedInAgent(api.app)
    const ask = await request(api.app).post('/api/auth/password-reset').send({ email })
    expect(ask.status).toBe(202)

    const mail = await waitForMail(api.ctx, email)
    expect(mail.subject).toMatch(/Reset your Ambitus password/)
    const token = new URL(mail.text.match(/https?:\/\/\S+/)![0]).searchParams.get('token')!
    const stored = await api.ctx
      .db('password_resets')
      .select('token_hash')
      .orderBy('created_at', 'desc')
      .first()
    expect(stored.token_hash).not.toBe(token) // only a hash is stored

    const confirm = await request(api.app)
      .post('/api/auth/password-reset/confirm')
      .send({ token, password: 'reset passphrase 1' })
    expect(confirm.status).toBe(204)
    expect(
      (
        await request(api.app)
          .post('/api/auth/login')
          .send({ email, password: 'reset passphrase 1' })
      ).status,
    ).toBe(200)
    expect(
      (await request(api.app).post('/api/auth/login').send({ email, password: TEST_PASSWORD }))
        .status,
    ).toBe(401)

    const again = await request(api.app)
      .post('/api/auth/password-reset/confirm')
      .send({ token, password: 'reset passphrase 2' })
    expect(again.status).toBe(400)
    expect(again.body.error.code).toBe('invalid_token')
  })

  it('when the token is older than one hour, then it is refused', async () => {
    const { email } = await signedInAgent(api.app)
    const before = (await waitForMailOrZero(email)) ?? 0
    await request(api.app).post('/api/auth/password-reset').send({ email })
    const mail = await waitForMail(api.ctx, email, before)
    const token = new URL(mail.text.match(/https?:\/\/\S+/)![0]).searchParams.get('token')!
    await api.ctx
      .db('password_resets')
      .update({ expires_at: new Date(Date.now() - 1000) })
      .whereNull('used_at')
    const res = await request(api.app)
      .post('/api/auth/password-reset/confirm')
      .send({ token, password: 'too late passphrase' })
    expect(res.status).toBe(400)
  })

  it('when the e-mail has no account, then the same 202 and no mail is sent', async () => {
    const email = uniqueEmail('nobody')
    const res = await request(api.app).post('/api/auth/password-reset').send({ email })
    expect(res.status).toBe(202)
    await new Promise((r) => setTimeout(r, 300))
    expect(
      await api.ctx.db('captured_mail').whereRaw('? = any(recipients)', [email]).first(),
    ).toBeUndefined()
  })
})

async function waitForMailOrZero(email: string) {
  const row = await api.ctx
    .db('captured_mail')
    .whereRaw('? = any(recipients)', [email])
    .max('id as id')
    .first()
  return row?.id ? Number(row.id) : 0
}
