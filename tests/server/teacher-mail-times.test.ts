// Issue 16: e-mails write dates in the recipient's time zone (the invitee's, else the teacher's),
// and a changed due date is announced to the plan's students.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startTestApi, uniqueEmail, waitForMail, type TestApi } from '../helpers/api'
import { planBody, studentIn, teacherWithStudio, type Agent } from '../helpers/studio'

let api: TestApi
let teacher: Agent & { studioId: string }
let student: Agent
const setZone = (userId: string, timeZone: string) =>
  api.ctx.db('user_time_zones').insert({ user_id: userId, time_zone: timeZone })

beforeAll(async () => {
  api = await startTestApi()
  teacher = await teacherWithStudio(api.app, 'Zone Teacher')
  student = await studentIn(api.app, api.ctx, teacher.studioId, 'Zone Student')
  await setZone(teacher.user.id, 'America/Chicago')
  await setZone(student.user.id, 'Europe/Tallinn')
})
afterAll(() => api.close())

describe('dates in e-mails', () => {
  it("when a plan is assigned, then its due date is written in the student's time zone", async () => {
    const dueAt = '2031-12-10T21:59:00.000Z' // 23:59 in Tallinn (UTC+2 in December)
    const res = await teacher.agent
      .post('/api/plans')
      .send(planBody({ dueAt, studentIds: [student.user.id] }))
    expect(res.status).toBe(201)
    const mail = await waitForMail(api.ctx, student.email)
    expect(mail.text).toContain('due Wed, 10 Dec 2031, 23:59 (Europe/Tallinn)')
    expect(mail.text).not.toContain('UTC')
  })

  it('when the teacher moves the due date, then the students are told the new date; an edit keeping it sends nothing', async () => {
    const created = await teacher.agent
      .post('/api/plans')
      .send(planBody({ title: 'Moving plan', studentIds: [student.user.id] }))
    const first = await waitForMail(api.ctx, student.email)
    const plan = created.body.plan
    const body = { title: plan.title, notes: plan.notes, items: plan.items }
    const moved = await teacher.agent
      .put(`/api/plans/${plan.id}`)
      .send({ ...body, dueAt: '2031-12-12T10:00:00.000Z' })
    expect(moved.status).toBe(200)
    const mail = await waitForMail(api.ctx, student.email, first.id)
    expect(mail.subject).toBe('New due date: Moving plan')
    expect(mail.text).toContain('Fri, 12 Dec 2031, 12:00 (Europe/Tallinn)')
    const kept = await teacher.agent
      .put(`/api/plans/${plan.id}`)
      .send({ ...body, notes: 'Edited', dueAt: '2031-12-12T10:00:00.000Z' })
    expect(kept.status).toBe(200)
    await expect(waitForMail(api.ctx, student.email, mail.id)).rejects.toThrow(/no mail/)
  })

  it("when an address without an account is invited, then the expiry is in the teacher's time zone", async () => {
    const email = uniqueEmail('zone-invitee')
    const res = await teacher.agent
      .post(`/api/studio/studios/${teacher.studioId}/invitations`)
      .send({ email })
    expect(res.status).toBeLessThan(300)
    const mail = await waitForMail(api.ctx, email)
    expect(mail.text).toMatch(/expires on \w{3}, \d+ \w{3} \d{4}, \d\d:\d\d \(America\/Chicago\)/)
  })
})
