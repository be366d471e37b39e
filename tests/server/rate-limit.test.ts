// Sign-in, reset requests and every route that sends e-mail are rate limited (separate apps so the
// limits are low and isolated); the attacks on sign-in are in security-sign-in.test.ts.
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import {
  signedInAgent,
  startTestApi,
  TEST_PASSWORD,
  uniqueEmail,
  type TestApi,
} from '../helpers/api'
import { createPlan, studentIn, teacherWithStudio } from '../helpers/studio'

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

describe('routes that send e-mail', () => {
  let mail: TestApi
  beforeAll(async () => {
    mail = await startTestApi({ mailSendsPerHour: 2 })
  })
  afterAll(() => mail.close())

  it('when a teacher invites and re-sends past the limit, then 429 and no more mail', async () => {
    const teacher = await teacherWithStudio(mail.app)
    const invite = (email: string) =>
      teacher.agent.post(`/api/studio/studios/${teacher.studioId}/invitations`).send({ email })
    const first = await invite(uniqueEmail('a'))
    expect(first.status).toBe(201)
    const resend = await teacher.agent.post(
      `/api/studio/invitations/${first.body.invitation.id}/resend`,
    )
    expect(resend.status).toBe(200)
    const third = uniqueEmail('c')
    expect((await invite(third)).status).toBe(429)
    expect(await mail.ctx.db('studio_invitations').where({ email: third }).first()).toBeUndefined()
  })

  it('when comments and assignments pass the limit per account, then 429', async () => {
    const teacher = await teacherWithStudio(mail.app)
    const student = await studentIn(mail.app, mail.ctx, teacher.studioId)
    const plan = await createPlan(teacher, { studentIds: [student.user.id] }) // mails: 1
    const assignmentId = plan.assignees[0]!.assignmentId
    const comment = () =>
      teacher.agent.post(`/api/assignments/${assignmentId}/comments`).send({ body: 'Nice work' })
    expect((await comment()).status).toBe(201)
    expect((await comment()).status).toBe(201)
    expect((await comment()).status).toBe(429)
    const second = await createPlan(teacher) // assigned to nobody: sends nothing, not counted
    const assign = async () => {
      const other = await studentIn(mail.app, mail.ctx, teacher.studioId)
      return teacher.agent
        .post(`/api/plans/${second.id}/assignments`)
        .send({ studentIds: [other.user.id] })
    }
    expect((await assign()).status).toBe(200) // the second assignment mail this hour
    expect((await assign()).status).toBe(429)
  })

  it('when several accounts send from one address, then the address limit (twice) applies too', async () => {
    const own = await startTestApi({ mailSendsPerHour: 2 })
    const statuses: number[] = []
    try {
      for (let i = 0; i < 3; i++) {
        const teacher = await teacherWithStudio(own.app)
        for (let j = 0; j < 2; j++) {
          const res = await teacher.agent
            .post(`/api/studio/studios/${teacher.studioId}/invitations`)
            .send({ email: uniqueEmail('addr') })
          statuses.push(res.status)
        }
      }
    } finally {
      await own.close()
    }
    expect(statuses).toEqual([201, 201, 201, 201, 429, 429])
  })
})
