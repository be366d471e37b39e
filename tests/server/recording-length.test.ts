// Issue 16: a take recorded in the browser keeps its recorded length (WebM from MediaRecorder has
// none in its header), so players can show it; an uploaded file's length is read from the file; a
// nonsense length is a 400 and nothing is stored.
import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startTestApi, type TestApi } from '../helpers/api'
import {
  createPlan,
  oggOpusFile,
  studentIn,
  teacherWithStudio,
  wavFile,
  type Agent,
} from '../helpers/studio'

let api: TestApi
let dataDir: string
let student: Agent
let itemId: string
let assignmentId: string
beforeAll(async () => {
  dataDir = mkdtempSync(path.join(tmpdir(), 'ambitus-lengths-'))
  api = await startTestApi({ dataDir })
  const teacher = await teacherWithStudio(api.app)
  student = await studentIn(api.app, api.ctx, teacher.studioId)
  const plan = await createPlan(teacher, { studentIds: [student.user.id] })
  itemId = plan.items[0]!.id
  assignmentId = plan.assignees[0]!.assignmentId
})
afterAll(async () => {
  await api.close()
  rmSync(dataDir, { recursive: true, force: true })
})

const upload = (durationMs?: string) => {
  const req = student.agent
    .post(`/api/assignments/${assignmentId}/recordings`)
    .field('planItemId', itemId)
  if (durationMs !== undefined) req.field('durationMs', durationMs)
  return req.attach('file', wavFile(), 'take.wav')
}

describe('recorded length', () => {
  it('when a take comes with its recorded length, then the length is stored and listed with it', async () => {
    const res = await upload('4210')
    expect(res.status).toBe(201)
    expect(res.body.recording.durationMs).toBe(4210)
    const [assignment] = (await student.agent.get('/api/plans/assigned')).body.assignments
    expect(assignment.items[0].recordings[0]).toMatchObject({ durationMs: 4210 })
  })

  it('when an uploaded file comes without one, then the length is read from the file (music-metadata)', async () => {
    const res = await upload()
    expect(res.status).toBe(201)
    // wavFile(): 800 frames at 8,000 Hz = 100 ms, as its RIFF header says
    expect(res.body.recording.durationMs).toBe(100)
  })

  it('when the file does not state its length, then the length is null and the take is kept', async () => {
    const res = await student.agent
      .post(`/api/assignments/${assignmentId}/recordings`)
      .field('planItemId', itemId)
      .attach('file', oggOpusFile(), 'head-only.ogg')
    expect(res.status).toBe(201)
    expect(res.body.recording.durationMs).toBeNull()
  })

  it('when the length is not a number or longer than a take can be, then 400 and nothing is stored', async () => {
    // Counted for this student only: other test files write takes into the same database.
    const count = () =>
      api.ctx.db('recordings').where({ student_id: student.user.id }).count({ n: '*' }).first()
    const before = await count()
    for (const bad of ['soon', '-5', String(2 * 3600 * 1000)]) {
      const res = await upload(bad)
      expect(res.status).toBe(400)
      expect(Object.keys(res.body.error.fields)).toEqual(['durationMs'])
    }
    expect(await count()).toEqual(before)
  })
})
