// Finding 11 as the attack: a student promoted by an admin must not stay in teachers' rosters (where
// they would keep reading as a student) nor keep the session from before the change.
import { afterAll, beforeAll, expect, it } from 'vitest'
import { signedInAdmin, signedInAgent, startTestApi, type TestApi } from '../helpers/api'
import { studentIn, teacherWithStudio } from '../helpers/studio'

let api: TestApi
let admin: Awaited<ReturnType<typeof signedInAgent>>
beforeAll(async () => {
  api = await startTestApi()
  admin = await signedInAdmin(api.app, 'Role Admin')
})
afterAll(() => api.close())

const rosterIds = async (teacher: Awaited<ReturnType<typeof teacherWithStudio>>) =>
  (await teacher.agent.get('/api/studio/students')).body.students.map((s: { id: string }) => s.id)

it('when a student in two studios is promoted to teacher, then both teachers stop seeing them and their session ends', async () => {
  const first = await teacherWithStudio(api.app, 'First Teacher')
  const second = await teacherWithStudio(api.app, 'Second Teacher')
  const student = await studentIn(api.app, api.ctx, first.studioId, 'Promoted Student')
  await api.ctx
    .db('studio_members')
    .insert({ studio_id: second.studioId, student_id: student.user.id })
  const bystander = await studentIn(api.app, api.ctx, first.studioId, 'Staying Student')
  expect(await rosterIds(first)).toContain(student.user.id)
  expect(await rosterIds(second)).toContain(student.user.id)

  const res = await admin.agent
    .patch(`/api/admin/users/${student.user.id}`)
    .send({ role: 'teacher' })
  expect(res.status).toBe(200)

  expect(await rosterIds(first)).not.toContain(student.user.id)
  expect(await rosterIds(second)).not.toContain(student.user.id)
  expect(await rosterIds(first)).toContain(bystander.user.id)
  expect((await first.agent.get(`/api/studio/students/${student.user.id}`)).status).toBe(403)
  expect((await student.agent.get('/api/auth/me')).status).toBe(401)
  expect((await bystander.agent.get('/api/auth/me')).status).toBe(200)
})

it('when the role sent is the one the account has, then nothing ends', async () => {
  const teacher = await teacherWithStudio(api.app)
  const student = await studentIn(api.app, api.ctx, teacher.studioId)
  const res = await admin.agent
    .patch(`/api/admin/users/${student.user.id}`)
    .send({ role: 'student' })
  expect(res.status).toBe(200)
  expect(await rosterIds(teacher)).toContain(student.user.id)
  expect((await student.agent.get('/api/auth/me')).status).toBe(200)
})

it('when a teacher is made a student, then their sessions end and they sign in to a student account', async () => {
  const teacher = await teacherWithStudio(api.app)
  const res = await admin.agent
    .patch(`/api/admin/users/${teacher.user.id}`)
    .send({ role: 'student' })
  expect(res.body.user.role).toBe('student')
  expect((await teacher.agent.get('/api/auth/me')).status).toBe(401)
})

it('when an admin tries to change their own role, then 400 and nothing changes', async () => {
  const res = await admin.agent.patch(`/api/admin/users/${admin.user.id}`).send({ role: 'student' })
  expect(res.status).toBe(400)
  expect(res.body.error.fields.role).toBeDefined()
  expect((await admin.agent.get('/api/auth/me')).body.user.role).toBe('admin')
})
