// Findings 7 and 8 (invitations) as the attack: a signed-in student using a link sent to someone
// else, and five parallel invitations to one address.
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import {
  signedInAgent,
  startTestApi,
  TEST_PASSWORD,
  uniqueEmail,
  waitForMail,
  type TestApi,
} from '../helpers/api'
import { teacherWithStudio } from '../helpers/studio'

let api: TestApi
beforeAll(async () => {
  api = await startTestApi()
})
afterAll(() => api.close())

type Teacher = Awaited<ReturnType<typeof teacherWithStudio>>
const invite = (teacher: Teacher, email: string) =>
  teacher.agent.post(`/api/studio/studios/${teacher.studioId}/invitations`).send({ email })

async function tokenFor(teacher: Teacher, email: string) {
  expect((await invite(teacher, email)).status).toBe(201)
  const mail = await waitForMail(api.ctx, email.toLowerCase())
  return decodeURIComponent(/token=(\S+)/.exec(mail.text)![1]!)
}

describe('an invitation is bound to its address (finding 7)', () => {
  it('when another signed-in student uses the link, then 403, they do not join and the teacher cannot read them', async () => {
    const teacher = await teacherWithStudio(api.app, 'Bound Teacher')
    const token = await tokenFor(teacher, uniqueEmail('invited'))
    const intruder = await signedInAgent(api.app, 'student', 'Link Finder')

    const res = await intruder.agent.post('/api/invitations/accept').send({ token })

    expect(res.status).toBe(403)
    expect(res.body.error.code).toBe('invitation_for_other_address')
    expect(await api.ctx.db('studio_members').where({ student_id: intruder.user.id })).toEqual([])
    const id = intruder.user.id
    expect((await teacher.agent.get(`/api/studio/students/${id}`)).status).toBe(403)
    expect((await teacher.agent.get('/api/progress/summary').query({ student: id })).status).toBe(
      403,
    )
    const roster = await teacher.agent.get('/api/studio/students')
    expect(roster.body.students).toEqual([])
    // The invitation stays usable for the invited address.
    expect((await request(api.app).get('/api/invitations/preview').query({ token })).status).toBe(
      200,
    )
  })

  it('when the invited address accepts signed in (any letter case), or by creating its account, then it joins', async () => {
    const teacher = await teacherWithStudio(api.app)
    const invited = await signedInAgent(api.app, 'student')
    const token = await tokenFor(teacher, invited.email.toUpperCase())
    expect((await invited.agent.post('/api/invitations/accept').send({ token })).status).toBe(200)

    const newcomer = uniqueEmail('newcomer')
    const second = await tokenFor(teacher, newcomer)
    const created = await request(api.app)
      .post('/api/invitations/accept')
      .send({ token: second, name: 'Wren Ashby', password: TEST_PASSWORD })
    expect(created.status).toBe(201)
    expect(created.body.user.email).toBe(newcomer)
    const emails = (await teacher.agent.get('/api/studio/students')).body.students.map(
      (s: { email: string }) => s.email,
    )
    expect(emails.sort()).toEqual([invited.email, newcomer].sort())
  })
})

describe('parallel invitations (finding 8)', () => {
  it('when five invitations to one address are sent at once, then no 5xx, one open invitation and one link', async () => {
    const teacher = await teacherWithStudio(api.app)
    const email = uniqueEmail('burst')

    const answers = await Promise.all(Array.from({ length: 5 }, () => invite(teacher, email)))

    const statuses = answers.map((r) => r.status)
    expect(statuses.filter((s) => s >= 500)).toEqual([])
    expect(statuses.every((s) => [200, 201, 409].includes(s))).toBe(true)
    expect(statuses.filter((s) => s === 201)).toHaveLength(1)
    const rows = await api.ctx.db('studio_invitations').where({ email })
    expect(rows).toHaveLength(1)
  })
})
