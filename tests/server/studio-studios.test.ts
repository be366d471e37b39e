// A teacher's studios: create, rename, list with counts, delete only when empty.
import { afterAll, beforeAll, expect, it } from 'vitest'
import { startTestApi, uniqueEmail, type TestApi } from '../helpers/api'
import { studentIn, teacherWithStudio } from '../helpers/studio'

let api: TestApi
beforeAll(async () => {
  api = await startTestApi()
})
afterAll(() => api.close())

it('when a teacher creates and renames studios, then the list shows them with student and invitation counts', async () => {
  const teacher = await teacherWithStudio(api.app, 'Two Rooms')
  await studentIn(api.app, api.ctx, teacher.studioId)
  await teacher.agent
    .post(`/api/studio/studios/${teacher.studioId}/invitations`)
    .send({ email: uniqueEmail() })
  const created = await teacher.agent
    .post('/api/studio/studios')
    .send({ name: '  Evening ensemble ' })
  expect(created.status).toBe(201)
  expect(created.body.studio).toMatchObject({ name: 'Evening ensemble', studentCount: 0 })
  const renamed = await teacher.agent
    .patch(`/api/studio/studios/${created.body.studio.id}`)
    .send({ name: 'Late ensemble' })
  expect(renamed.body.studio.name).toBe('Late ensemble')
  const list = await teacher.agent.get('/api/studio/studios')
  expect(
    list.body.studios.map(
      (s: { name: string; studentCount: number; pendingInvitations: number }) => [
        s.name,
        s.studentCount,
        s.pendingInvitations,
      ],
    ),
  ).toEqual([
    ['Studio of Two Rooms', 1, 1],
    ['Late ensemble', 0, 0],
  ])
})

it('when the name is empty or too long, then 400 on the name', async () => {
  const teacher = await teacherWithStudio(api.app)
  for (const name of ['   ', 'x'.repeat(81)]) {
    const res = await teacher.agent.post('/api/studio/studios').send({ name })
    expect(res.status).toBe(400)
    expect(res.body.error.fields.name).toBeDefined()
  }
})

it('when a studio still has students, then deleting it is a 409; once empty, it can go', async () => {
  const teacher = await teacherWithStudio(api.app)
  const student = await studentIn(api.app, api.ctx, teacher.studioId)
  expect((await teacher.agent.delete(`/api/studio/studios/${teacher.studioId}`)).status).toBe(409)
  await teacher.agent.delete(`/api/studio/studios/${teacher.studioId}/students/${student.user.id}`)
  expect((await teacher.agent.delete(`/api/studio/studios/${teacher.studioId}`)).status).toBe(204)
  expect((await teacher.agent.get('/api/studio/studios')).body.studios).toEqual([])
})
