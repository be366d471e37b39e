// Request logs never contain passwords, session tokens or cookies.
import { afterAll, beforeAll, expect, it } from 'vitest'
import request from 'supertest'
import { SESSION_COOKIE } from '../../server/auth/session-token'
import { startTestApi, TEST_PASSWORD, uniqueEmail, type TestApi } from '../helpers/api'

const lines: string[] = []
let api: TestApi
beforeAll(async () => {
  api = await startTestApi({}, lines)
})
afterAll(() => api.close())

it('when a user registers, signs in and calls the API with the cookie, then no secret reaches the log', async () => {
  const email = uniqueEmail('logged')
  const agent = request.agent(api.app)
  await agent
    .post('/api/auth/register')
    .send({ email, password: TEST_PASSWORD, name: 'Log Check', role: 'student' })
  const login = await agent.post('/api/auth/login').send({ email, password: TEST_PASSWORD })
  const cookie = ([] as string[])
    .concat(login.headers['set-cookie'] ?? [])
    .find((c) => c.startsWith(SESSION_COOKIE))!
  const token = cookie.split(';')[0]!.split('=')[1]!
  await agent.get('/api/auth/me')
  await agent
    .post('/api/auth/password-reset/confirm')
    .send({ token: 'a-reset-token-that-is-long-enough', password: TEST_PASSWORD })

  const log = lines.join('\n')
  expect(lines.length).toBeGreaterThanOrEqual(4) // the requests were logged at all
  expect(log).toContain('/api/auth/login')
  expect(log).not.toContain(TEST_PASSWORD)
  expect(log).not.toContain(token)
  expect(log).not.toContain('a-reset-token-that-is-long-enough')
  expect(log.toLowerCase()).not.toContain('cookie')
})
