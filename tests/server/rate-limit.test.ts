// Sign-in and reset requests are rate limited (a separate app so the limits are low and isolated);
// the attacks on these limits are in security-sign-in.test.ts.
import request from 'supertest'
import { afterAll, beforeAll, expect, it } from 'vitest'
import { signedInAgent, startTestApi, TEST_PASSWORD, type TestApi } from '../helpers/api'

let api: TestApi
beforeAll(async () => {
  api = await startTestApi({ loginAttemptsPer15Min: 3, resetRequestsPerHour: 2 })
})
afterAll(() => api.close())

it('when sign-in fails too often from one address, then that address gets 429 even with the right password', async () => {
  const { email } = await signedInAgent(api.app)
  for (let i = 0; i < 3; i++) {
    expect(
      (
        await request(api.app)
          .post('/api/auth/login')
          .send({ email, password: 'wrong guess ' + i })
      ).status,
    ).toBe(401)
  }
  const res = await request(api.app)
    .post('/api/auth/login')
    .send({ email, password: TEST_PASSWORD })
  expect(res.status).toBe(429)
  expect(res.body.error.code).toBe('rate_limited')
})

it('when resets are asked for too often, then 429', async () => {
  const ask = () =>
    request(api.app).post('/api/auth/password-reset').send({ email: 'someone@example.test' })
  expect((await ask()).status).toBe(202)
  expect((await ask()).status).toBe(202)
  expect((await ask()).status).toBe(429)
})
