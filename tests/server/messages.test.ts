// Issue 16 item 4: a teacher writes to one student, a group or a whole studio, in the app and by
// e-mail; students read and mark them read; the teacher sees each student's read state.
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startTestApi, waitForMail, type TestApi } from '../helpers/api'
import { studentIn, teacherWithStudio, type Agent } from '../helpers/studio'

let api: TestApi
let teacher: Agent & { studioId: string }
let other: Agent & { studioId: string }
let [ada, ben, cy, stranger]: Agent[] = []

beforeAll(async () => {
  api = await startTestApi()
  teacher = await teacherWithStudio(api.app, 'Mira Teacher')
  other = await teacherWithStudio(api.app, 'Other Teacher')
  ada = await studentIn(api.app, api.ctx, teacher.studioId, 'Ada Student')
  ben = await studentIn(api.app, api.ctx, teacher.studioId, 'Ben Student')
  cy = await studentIn(api.app, api.ctx, teacher.studioId, 'Cy Student')
  stranger = await studentIn(api.app, api.ctx, other.studioId, 'Stranger Student')
})
afterAll(() => api.close())

const write = (to: object, extra: object = {}) =>
  teacher.agent
    .post('/api/messages')
    .send({ to, subject: 'Recital', body: 'Bring your tuner.\nWe start at 18:00.', ...extra })
const inbox = async (student: Agent) => (await student.agent.get('/api/messages')).body.messages

describe('writing to students', () => {
  it('when the teacher writes to one student, then only they get it, in the app and by e-mail', async () => {
    const res = await write({ kind: 'students', studentIds: [ada!.user.id] })
    expect(res.status).toBe(201)
    expect(res.body.message).toMatchObject({
      subject: 'Recital',
      audience: 'students',
      emailed: true,
      recipients: [{ studentId: ada!.user.id, name: 'Ada Student', readAt: null }],
    })
    const mail = await waitForMail(api.ctx, ada!.email)
    expect(mail.subject).toBe('Mira Teacher: Recital')
    expect(mail.text).toContain('> Bring your tuner.\n> We start at 18:00.')
    expect(mail.text).toMatch(/\/messages$/m)
    expect((await inbox(ada!))[0]).toMatchObject({ teacherName: 'Mira Teacher', readAt: null })
    expect(await inbox(ben!)).toEqual([])
  })

  it('when the teacher writes to the whole studio without e-mail, then every member gets it in the app only', async () => {
    const before = await waitForMail(api.ctx, cy!.email).catch(() => ({ id: 0 }))
    const res = await write({ kind: 'studio', studioId: teacher.studioId }, { email: false })
    expect(res.status).toBe(201)
    expect(res.body.message.studioName).toBeTruthy()
    expect(res.body.message.recipients.map((r: { name: string }) => r.name)).toEqual([
      'Ada Student',
      'Ben Student',
      'Cy Student',
    ])
    await expect(waitForMail(api.ctx, cy!.email, before.id)).rejects.toThrow(/no mail/)
    expect((await inbox(cy!)).map((m: { id: string }) => m.id)).toContain(res.body.message.id)
  })

  it('when a student reads a message, then the teacher sees who has read it and who has not', async () => {
    const sent = (await write({ kind: 'students', studentIds: [ben!.user.id, cy!.user.id] })).body
      .message
    const read = await ben!.agent.post(`/api/messages/${sent.id}/read`)
    expect(read.status).toBe(200)
    expect(read.body.message.readAt).not.toBeNull()
    const again = await ben!.agent.post(`/api/messages/${sent.id}/read`)
    expect(again.body.message.readAt).toBe(read.body.message.readAt) // the first reading counts
    const mine = (await teacher.agent.get('/api/messages')).body.messages
    const row = mine.find((m: { id: string }) => m.id === sent.id)
    expect(row.recipients).toEqual([
      { studentId: ben!.user.id, name: 'Ben Student', readAt: read.body.message.readAt },
      { studentId: cy!.user.id, name: 'Cy Student', readAt: null },
    ])
  })
})

describe('refusals', () => {
  it("when a teacher names another studio's student or studio, then 403 and nothing is stored", async () => {
    const count = async () => (await teacher.agent.get('/api/messages')).body.messages.length
    const before = await count()
    const foreign = await write({ kind: 'students', studentIds: [ada!.user.id, stranger!.user.id] })
    expect(foreign.status).toBe(403)
    const studio = await write({ kind: 'studio', studioId: other.studioId })
    expect(studio.status).toBe(403)
    expect(await count()).toBe(before)
    expect(await inbox(stranger!)).toEqual([])
  })

  it('when the body is empty, too long or names nobody, then 400 names the fields', async () => {
    const empty = await write({ kind: 'students', studentIds: [] }, { body: '  ', subject: '' })
    expect(empty.status).toBe(400)
    expect(Object.keys(empty.body.error.fields).sort()).toEqual(
      ['body', 'subject', 'to.studentIds'].sort(),
    )
    const long = await write(
      { kind: 'students', studentIds: [ada!.user.id] },
      { body: 'x'.repeat(4001) },
    )
    expect(long.status).toBe(400)
    expect(long.body.error.fields.body).toBeDefined()
  })

  it('when a student writes, a classmate marks read or another teacher deletes, then they are refused', async () => {
    const sent = (await write({ kind: 'students', studentIds: [ada!.user.id] })).body.message
    const posting = await ada!.agent
      .post('/api/messages')
      .send({ to: { kind: 'studio', studioId: teacher.studioId }, subject: 'x', body: 'x' })
    expect(posting.status).toBe(403)
    expect((await ben!.agent.post(`/api/messages/${sent.id}/read`)).status).toBe(404)
    expect((await other.agent.delete(`/api/messages/${sent.id}`)).status).toBe(403)
    expect((await teacher.agent.delete(`/api/messages/${sent.id}`)).status).toBe(204)
    expect((await inbox(ada!)).map((m: { id: string }) => m.id)).not.toContain(sent.id)
  })

  it('when nobody is signed in, then 401', async () => {
    const res = await request(api.app).get('/api/messages')
    expect(res.status).toBe(401)
  })
})
