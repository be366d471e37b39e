// The leftover of finding 11: a teacher made a student must not keep reading their students, and
// the students are told. Their studios pause (invitations withdrawn, plans kept by the students)
// and open again as they were when the account is a teacher's again.
import request from 'supertest'
import { afterAll, beforeAll, expect, it } from 'vitest'
import { issueSessionToken } from '../../server/auth/sessions'
import { sessionCookieName } from '../../server/auth/session-token'
import { latestMailTo } from '../../server/admin/mail-log-repository'
import { signedInAdmin, startTestApi, uniqueEmail, waitForMail, type TestApi } from '../helpers/api'
import { createPlan, studentIn, teacherWithStudio, wavFile } from '../helpers/studio'

let api: TestApi
beforeAll(async () => {
  api = await startTestApi()
})
afterAll(() => api.close())

/** The account as it is now, through a fresh session (the old ones end with the role change). */
async function freshAgent(userId: string) {
  const agent = request.agent(api.app)
  const token = await issueSessionToken(api.ctx, userId)
  agent.jar.setCookies([`${sessionCookieName(api.ctx.config)}=${token}; Path=/`], '127.0.0.1', '/')
  return agent
}

it('when a teacher is made a student, then their studios pause: no more reading students, invitations withdrawn, students told and keeping their plans', async () => {
  const admin = await signedInAdmin(api.app)
  const teacher = await teacherWithStudio(api.app, 'Leaving Teacher')
  const student = await studentIn(api.app, api.ctx, teacher.studioId, 'Staying Student')
  const plan = await createPlan(teacher, { studentIds: [student.user.id] })
  const assignmentId = plan.assignees[0]!.assignmentId
  const take = await student.agent
    .post(`/api/assignments/${assignmentId}/recordings`)
    .field('planItemId', plan.items[0]!.id)
    .attach('file', wavFile(), 'take.wav')
  const invited = uniqueEmail('pending')
  await teacher.agent
    .post(`/api/studio/studios/${teacher.studioId}/invitations`)
    .send({ email: invited })
  const link = await waitForMail(api.ctx, invited)
  const token = decodeURIComponent(/token=(\S+)/.exec(link.text)![1]!)
  const before = (await latestMailTo(api.ctx.db, student.email))?.id ?? 0

  const res = await admin.agent
    .patch(`/api/admin/users/${teacher.user.id}`)
    .send({ role: 'student' })
  expect(res.status).toBe(200)

  const former = await freshAgent(teacher.user.id)
  const sid = student.user.id
  expect((await former.get(`/api/progress/summary?student=${sid}`)).status).toBe(403)
  expect((await former.get(`/api/assignments/${assignmentId}/comments`)).status).toBe(403)
  const audio = `/api/assignments/${assignmentId}/recordings/${take.body.recording.id}/audio`
  expect((await former.get(audio)).status).toBe(403)
  expect((await former.get(`/api/plans/items/${plan.items[0]!.id}`)).status).toBe(403)
  expect((await former.get('/api/studio/students')).status).toBe(403)
  expect((await request(api.app).get('/api/invitations/preview').query({ token })).status).toBe(410)

  const told = await waitForMail(api.ctx, student.email, before)
  expect(told.subject).toBe(`"Studio of Leaving Teacher" is paused`)
  expect(told.text).toContain('Leaving Teacher can no longer see your progress')
  const assigned = await student.agent.get('/api/plans/assigned')
  expect(assigned.body.assignments.map((a: { planId: string }) => a.planId)).toEqual([plan.id])
  expect((await student.agent.get(audio)).status).toBe(200)
})

it('when the former teacher is made a teacher again, then the studio opens as it was', async () => {
  const admin = await signedInAdmin(api.app)
  const teacher = await teacherWithStudio(api.app, 'Returning Teacher')
  const student = await studentIn(api.app, api.ctx, teacher.studioId)
  for (const role of ['student', 'teacher'])
    expect(
      (await admin.agent.patch(`/api/admin/users/${teacher.user.id}`).send({ role })).status,
    ).toBe(200)

  const back = await freshAgent(teacher.user.id)
  const roster = await back.get('/api/studio/students')
  expect(roster.body.students.map((s: { id: string }) => s.id)).toEqual([student.user.id])
  expect((await back.get(`/api/progress/summary?student=${student.user.id}`)).status).toBe(200)
})
