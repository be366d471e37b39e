// Comments: one thread per assigned plan, written by its student and its teacher, each new comment
// mailed to the other one.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedInAgent, startTestApi, waitForMail, type TestApi } from '../helpers/api'
import { createPlan, studentIn, teacherWithStudio, type Agent } from '../helpers/studio'

let api: TestApi
let teacher: Agent & { studioId: string }
let student: Agent
let assignmentId: string
beforeAll(async () => {
  api = await startTestApi()
  teacher = await teacherWithStudio(api.app, 'Runa Teacher')
  student = await studentIn(api.app, api.ctx, teacher.studioId, 'Pia Student')
  assignmentId = (
    await createPlan(teacher, { title: 'Thread plan', studentIds: [student.user.id] })
  ).assignees[0]!.assignmentId
})
afterAll(() => api.close())

describe('comment thread', () => {
  it('when the teacher comments, then the student reads it in the thread and gets a mail', async () => {
    const res = await teacher.agent
      .post(`/api/assignments/${assignmentId}/comments`)
      .send({ body: '  Slow down on the G string.  ' })
    expect(res.status).toBe(201)
    expect(res.body.comment).toMatchObject({
      body: 'Slow down on the G string.',
      author: { name: 'Runa Teacher', role: 'teacher' },
    })
    const mail = await waitForMail(api.ctx, student.email)
    expect(mail.subject).toBe('Runa Teacher commented on "Thread plan"')
    expect(mail.text).toContain('> Slow down on the G string.')
    const thread = await student.agent.get(`/api/assignments/${assignmentId}/comments`)
    expect(thread.body.comments.map((c: { body: string }) => c.body)).toEqual([
      'Slow down on the G string.',
    ])
  })

  it('when the student replies, then the teacher gets a mail with a link to the student page and the count grows', async () => {
    await student.agent.post(`/api/assignments/${assignmentId}/comments`).send({ body: 'Will do!' })
    const mail = await waitForMail(api.ctx, teacher.email)
    expect(mail.text).toContain(`/studio/students/${student.user.id}`)
    const [assignment] = (await student.agent.get('/api/plans/assigned')).body.assignments
    expect(assignment.commentCount).toBe(2)
  })

  it('when the comment is empty or too long, then 400', async () => {
    expect(
      (await student.agent.post(`/api/assignments/${assignmentId}/comments`).send({ body: '   ' }))
        .status,
    ).toBe(400)
    expect(
      (
        await student.agent
          .post(`/api/assignments/${assignmentId}/comments`)
          .send({ body: 'x'.repeat(4001) })
      ).status,
    ).toBe(400)
  })

  it('when someone outside the assignment reads or writes, then 403; an unknown assignment is 404', async () => {
    const other = await signedInAgent(api.app, 'teacher')
    expect((await other.agent.get(`/api/assignments/${assignmentId}/comments`)).status).toBe(403)
    expect(
      (await other.agent.post(`/api/assignments/${assignmentId}/comments`).send({ body: 'hi' }))
        .status,
    ).toBe(403)
    expect(
      (await student.agent.get(`/api/assignments/${crypto.randomUUID()}/comments`)).status,
    ).toBe(404)
  })

  it("when an author deletes their comment, then it is gone; deleting someone else's is 403", async () => {
    const mine = (
      await student.agent.post(`/api/assignments/${assignmentId}/comments`).send({ body: 'typo' })
    ).body.comment
    expect(
      (await teacher.agent.delete(`/api/assignments/${assignmentId}/comments/${mine.id}`)).status,
    ).toBe(403)
    expect(
      (await student.agent.delete(`/api/assignments/${assignmentId}/comments/${mine.id}`)).status,
    ).toBe(204)
    const thread = await teacher.agent.get(`/api/assignments/${assignmentId}/comments`)
    expect(thread.body.comments.map((c: { id: string }) => c.id)).not.toContain(mine.id)
  })
})
