// Issue 16 item 6: recordings worth reviewing — titles, free takes a student shares with a teacher,
// the teacher's reference takes (on a plan item or for one student), comments pinned to a moment of
// a take (inside its length), and who may do what with each.
import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startTestApi, type TestApi } from '../helpers/api'
import { createPlan, studentIn, teacherWithStudio, wavFile, type Agent } from '../helpers/studio'

let api: TestApi
let dataDir: string
let teacher: Agent & { studioId: string }
let otherTeacher: Agent & { studioId: string }
let student: Agent
let classmate: Agent
let plan: Awaited<ReturnType<typeof createPlan>>
beforeAll(async () => {
  dataDir = mkdtempSync(path.join(tmpdir(), 'ambitus-review-'))
  api = await startTestApi({ dataDir })
  teacher = await teacherWithStudio(api.app, 'Marta Review')
  otherTeacher = await teacherWithStudio(api.app, 'Other Review')
  student = await studentIn(api.app, api.ctx, teacher.studioId, 'Noa Review')
  classmate = await studentIn(api.app, api.ctx, teacher.studioId, 'Classmate Review')
  plan = await createPlan(teacher, { studentIds: [student.user.id] })
})
afterAll(async () => {
  await api.close()
  rmSync(dataDir, { recursive: true, force: true })
})

const TWO_SECONDS = () => wavFile(16000, 8000) // 16,000 samples at 8 kHz: 2 s

/** A free take of the student: title and teacher to share with, as the form sends them. */
function freeTake(agent: Agent, fields: Record<string, string> = {}, file = TWO_SECONDS()) {
  const req = agent.agent.post('/api/recordings')
  for (const [name, value] of Object.entries(fields)) req.field(name, value)
  return req.attach('file', file, 'take.wav')
}

function reference(agent: Agent, fields: Record<string, string>) {
  const req = agent.agent.post('/api/recordings/references')
  for (const [name, value] of Object.entries(fields)) req.field(name, value)
  return req.attach('file', TWO_SECONDS(), 'reference.wav')
}

const ids = (res: { body: { recordings: { id: string }[] } }) =>
  res.body.recordings.map((r) => r.id)

describe('free takes', () => {
  it('when a student uploads a titled take shared with their teacher, then both list it with its measured length', async () => {
    const res = await freeTake(student, {
      title: '  Walking line in F  ',
      shareWith: teacher.user.id,
    })
    expect(res.status).toBe(201)
    expect(res.body.recording).toMatchObject({
      title: 'Walking line in F',
      kind: 'take',
      planItemId: null,
      durationMs: 2000, // read from the WAV header: 16,000 frames / 8,000 Hz
      student: { id: student.user.id, name: 'Noa Review' },
      sharedWith: { id: teacher.user.id, name: 'Marta Review' },
    })
    expect(ids(await student.agent.get('/api/recordings'))).toContain(res.body.recording.id)
    const seen = await teacher.agent.get(`/api/recordings?student=${student.user.id}`)
    expect(ids(seen)).toContain(res.body.recording.id)
  })

  it('when a take is private, then the teacher neither lists nor plays it (403)', async () => {
    const res = await freeTake(student, { title: 'Just for me' })
    expect(ids(await teacher.agent.get('/api/recordings'))).not.toContain(res.body.recording.id)
    expect((await teacher.agent.get(`/api/recordings/${res.body.recording.id}/audio`)).status).toBe(
      403,
    )
    const shared = await student.agent
      .patch(`/api/recordings/${res.body.recording.id}`)
      .send({ shareWith: teacher.user.id })
    expect(shared.status).toBe(200)
    expect((await teacher.agent.get(`/api/recordings/${res.body.recording.id}/audio`)).status).toBe(
      200,
    )
  })

  it('when a student shares with a teacher who is not theirs, then 403 and nothing is stored', async () => {
    // Counted for this student only: other test files write takes into the same database.
    const count = () =>
      api.ctx.db('recordings').where({ student_id: student.user.id }).count({ n: '*' }).first()
    const before = await count()
    const res = await freeTake(student, { shareWith: otherTeacher.user.id })
    expect(res.status).toBe(403)
    expect(await count()).toEqual(before)
  })

  it('when the title is too long or the file is missing, then 400 with field errors', async () => {
    const long = await freeTake(student, { title: 'x'.repeat(121) })
    expect(long.status).toBe(400)
    expect(Object.keys(long.body.error.fields)).toEqual(['title'])
    const none = await student.agent.post('/api/recordings').field('title', 'No file')
    expect(none.status).toBe(400)
    expect(Object.keys(none.body.error.fields)).toEqual(['file'])
  })

  it('when the file is not audio, then 415 and nothing is stored', async () => {
    const res = await freeTake(student, {}, Buffer.from('MZ this is not audio at all'))
    expect(res.status).toBe(415)
  })

  it('when a take is retitled, then the teacher may rename it too but only the student deletes it', async () => {
    const { id } = (await freeTake(student, { shareWith: teacher.user.id })).body.recording
    const renamed = await teacher.agent
      .patch(`/api/recordings/${id}`)
      .send({ title: 'Bar 9 rushes' })
    expect(renamed.status).toBe(200)
    expect(renamed.body.recording.title).toBe('Bar 9 rushes')
    expect((await teacher.agent.delete(`/api/recordings/${id}`)).status).toBe(403)
    expect((await classmate.agent.patch(`/api/recordings/${id}`).send({ title: 'x' })).status).toBe(
      403,
    )
    expect((await student.agent.patch(`/api/recordings/${id}`).send({})).status).toBe(400)
    expect((await student.agent.delete(`/api/recordings/${id}`)).status).toBe(204)
    expect((await student.agent.get(`/api/recordings/${id}/audio`)).status).toBe(404)
  })

  it('when a student lists another student’s takes, then 403; a teacher outside the studio too', async () => {
    expect((await student.agent.get(`/api/recordings?student=${classmate.user.id}`)).status).toBe(
      403,
    )
    const outsider = await otherTeacher.agent.get(`/api/recordings?student=${student.user.id}`)
    expect(outsider.status).toBe(403)
    expect((await student.agent.get('/api/recordings?student=nope')).status).toBe(400)
  })
})

describe('reference takes', () => {
  it('when the teacher adds a reference to a plan item, then the assigned student sees it labelled as a reference', async () => {
    const itemId = plan.items[0]!.id
    const res = await reference(teacher, { planItemId: itemId, title: 'Slow run, 60 BPM' })
    expect(res.status).toBe(201)
    expect(res.body.recording).toMatchObject({
      kind: 'reference',
      planItemId: itemId,
      student: null,
    })
    const [assignment] = (await student.agent.get('/api/plans/assigned')).body.assignments
    expect(assignment.items[0].references).toEqual([
      expect.objectContaining({ id: res.body.recording.id, title: 'Slow run, 60 BPM' }),
    ])
    expect((await student.agent.get(`/api/recordings/${res.body.recording.id}/audio`)).status).toBe(
      200,
    )
    // The classmate is not assigned this plan.
    const other = await classmate.agent.get(`/api/recordings/${res.body.recording.id}/audio`)
    expect(other.status).toBe(403)
  })

  it('when a reference names both or neither of item and student, then 400', async () => {
    const both = await reference(teacher, {
      planItemId: plan.items[0]!.id,
      studentId: student.user.id,
    })
    expect(both.status).toBe(400)
    expect(Object.keys(both.body.error.fields)).toEqual(['planItemId'])
    expect((await reference(teacher, { title: 'nowhere' })).status).toBe(400)
  })

  it('when another teacher adds a reference to this plan or for this student, then 403', async () => {
    expect((await reference(otherTeacher, { planItemId: plan.items[0]!.id })).status).toBe(403)
    expect((await reference(otherTeacher, { studentId: student.user.id })).status).toBe(403)
  })

  it('when the teacher records a reference for one student, then that student lists it and cannot rename it', async () => {
    const res = await reference(teacher, { studentId: student.user.id, title: 'Listen first' })
    const { id } = res.body.recording
    expect(ids(await student.agent.get('/api/recordings'))).toContain(id)
    expect(ids(await classmate.agent.get('/api/recordings'))).not.toContain(id)
    expect((await student.agent.patch(`/api/recordings/${id}`).send({ title: 'x' })).status).toBe(
      403,
    )
    expect((await student.agent.delete(`/api/recordings/${id}`)).status).toBe(403)
  })
})

describe('comments pinned to a moment', () => {
  let takeId: string
  beforeAll(async () => {
    takeId = (await freeTake(student, { shareWith: teacher.user.id })).body.recording.id
  })
  const pin = (agent: Agent, body: object) =>
    agent.agent.post(`/api/recordings/${takeId}/comments`).send(body)

  it('when the teacher and the student pin comments, then both read them in the order of their moments', async () => {
    expect((await pin(teacher, { atMs: 1500, body: 'The slide lands late' })).status).toBe(201)
    expect((await pin(student, { atMs: 250, body: 'Open E rings on' })).status).toBe(201)
    const res = await student.agent.get(`/api/recordings/${takeId}/comments`)
    expect(res.status).toBe(200)
    expect(res.body.comments.map((c: { atMs: number }) => c.atMs)).toEqual([250, 1500])
    expect(res.body.comments[1].author).toMatchObject({ name: 'Marta Review', role: 'teacher' })
    const listed = (await teacher.agent.get('/api/recordings')).body.recordings
    expect(listed.find((r: { id: string }) => r.id === takeId).commentCount).toBe(2)
  })

  it('when the moment lies past the end of the take, then 400 naming atMs', async () => {
    const res = await pin(teacher, { atMs: 2001, body: 'After the end' })
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields)).toEqual(['atMs'])
    expect(res.body.error.fields.atMs[0]).toContain('0:02')
    expect((await pin(teacher, { atMs: 2000, body: 'The very end' })).status).toBe(201)
  })

  it('when the body is empty, the moment negative or fractional, then 400 with each field', async () => {
    const res = await pin(student, { atMs: -1, body: '  ' })
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['atMs', 'body'])
    expect((await pin(student, { atMs: 1.5, body: 'half' })).status).toBe(400)
    expect((await pin(student, { atMs: 10, body: 'x', extra: 1 })).status).toBe(400)
  })

  it('when someone else comments or reads, then 403; signed out, 401', async () => {
    expect((await pin(classmate, { atMs: 10, body: 'Hi' })).status).toBe(403)
    expect((await pin(otherTeacher, { atMs: 10, body: 'Hi' })).status).toBe(403)
    expect((await classmate.agent.get(`/api/recordings/${takeId}/comments`)).status).toBe(403)
    const { default: request } = await import('supertest')
    expect((await request(api.app).get(`/api/recordings/${takeId}/comments`)).status).toBe(401)
  })

  it('when a comment is deleted, then only its author may', async () => {
    const { id } = (await pin(teacher, { atMs: 900, body: 'Mine' })).body.comment
    const path = `/api/recordings/${takeId}/comments/${id}`
    expect((await student.agent.delete(path)).status).toBe(403)
    expect((await teacher.agent.delete(path)).status).toBe(204)
    expect((await teacher.agent.delete(path)).status).toBe(404)
  })

  it('when a plan item’s reference is commented, then only its teacher pins; the students read', async () => {
    const ref = await reference(teacher, { planItemId: plan.items[0]!.id })
    const at = `/api/recordings/${ref.body.recording.id}/comments`
    expect(
      (await teacher.agent.post(at).send({ atMs: 100, body: 'Hear the ghost note' })).status,
    ).toBe(201)
    expect((await student.agent.post(at).send({ atMs: 100, body: 'Me too' })).status).toBe(403)
    const read = await student.agent.get(at)
    expect(read.body.comments).toHaveLength(1)
    expect(read.body.rights).toEqual({ canRetitle: false, canDelete: false, canComment: false })
  })
})

describe('takes on plan items', () => {
  it('when a take on a plan item has a title, then it is listed with it, and its comments and audio work through /api/recordings', async () => {
    const assignmentId = plan.assignees[0]!.assignmentId
    const res = await student.agent
      .post(`/api/assignments/${assignmentId}/recordings`)
      .field('planItemId', plan.items[0]!.id)
      .field('title', 'First go')
      .attach('file', TWO_SECONDS(), 'take.wav')
    expect(res.status).toBe(201)
    expect(res.body.recording).toMatchObject({ title: 'First go', kind: 'take', durationMs: 2000 })
    const { id } = res.body.recording
    const audio = await teacher.agent.get(`/api/recordings/${id}/audio`).set('Range', 'bytes=0-9')
    expect(audio.status).toBe(206)
    expect(audio.headers['content-range']).toMatch(/^bytes 0-9\/\d+$/)
    const pinned = await teacher.agent
      .post(`/api/recordings/${id}/comments`)
      .send({ atMs: 1200, body: 'Good' })
    expect(pinned.status).toBe(201)
    expect((await classmate.agent.get(`/api/recordings/${id}/comments`)).status).toBe(403)
  })
})
