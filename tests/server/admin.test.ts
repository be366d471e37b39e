// Admin routes: users and the mail log; health.
import request from 'supertest'
import { afterAll, beforeAll, expect, it } from 'vitest'
import {
  signedInAdmin,
  signedInAgent,
  startTestApi,
  TEST_PASSWORD,
  type TestApi,
} from '../helpers/api'

let api: TestApi
beforeAll(async () => {
  api = await startTestApi()
})
afterAll(() => api.close())

it('when the database is up, then /api/health reports it', async () => {
  const res = await request(api.app).get('/api/health')
  expect(res.status).toBe(200)
  expect(res.body.database.status).toBe('ok')
})

it('when an admin lists users with a search, then only matches come back, paged', async () => {
  const admin = await signedInAdmin(api.app, 'Admin Person')
  const target = await signedInAgent(api.app, 'student', 'Zebulon Quartz')
  const res = await admin.agent
    .get('/api/admin/users')
    .query({ search: 'Zebulon Quartz', pageSize: 5 })
  expect(res.status).toBe(200)
  expect(res.body.items.map((u: { id: string }) => u.id)).toEqual([target.user.id])
  expect(res.body.total).toBe(1)
})

it('when an admin changes a role, then it sticks; an invalid role or id is a 400', async () => {
  const admin = await signedInAdmin(api.app)
  const target = await signedInAgent(api.app, 'student')
  const ok = await admin.agent.patch(`/api/admin/users/${target.user.id}`).send({ role: 'teacher' })
  expect(ok.status).toBe(200)
  expect(ok.body.user).toMatchObject({ id: target.user.id, role: 'teacher', disabledAt: null })
  const signIn = await request(api.app)
    .post('/api/auth/login')
    .send({ email: target.email, password: TEST_PASSWORD })
  expect(signIn.body.user.role).toBe('teacher')
  const bad = await admin.agent.patch('/api/admin/users/not-a-uuid').send({ role: 'wizard' })
  expect(bad.status).toBe(400)
  expect(Object.keys(bad.body.error.fields).sort()).toEqual(['params.id', 'role'])
})

it('when mail has been sent, then the admin mail log lists and opens it, its link hidden', async () => {
  const admin = await signedInAdmin(api.app)
  const someone = await signedInAgent(api.app)
  await request(api.app).post('/api/auth/password-reset').send({ email: someone.email })
  let listed: { items: { id: number; subject: string }[] } = { items: [] }
  for (let i = 0; i < 30 && listed.items.length === 0; i++) {
    listed = (await admin.agent.get('/api/admin/mail').query({ search: someone.email })).body
    if (!listed.items.length) await new Promise((r) => setTimeout(r, 100))
  }
  expect(listed.items).toHaveLength(1)
  const open = await admin.agent.get(`/api/admin/mail/${listed.items[0]!.id}`)
  expect(open.body.message.text).toContain('[link to /reset-password (hidden)]')
  expect(open.body.message.text).not.toContain('token=')
  expect((await admin.agent.get('/api/admin/mail/999999999')).status).toBe(404)
})
