// Recordings: uploads checked by content (a renamed executable is refused), size-capped (413),
// empty files refused; stored under random names in the bucket; played with range requests.
import { existsSync, mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import type { Response } from 'superagent'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { recordingStorage } from '../../server/assignments/recording-storage'
import { signedInAgent, startTestApi, type TestApi } from '../helpers/api'
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
let teacher: Agent & { studioId: string }
let student: Agent
let itemId: string
let assignmentId: string
beforeAll(async () => {
  dataDir = mkdtempSync(path.join(tmpdir(), 'ambitus-recordings-'))
  api = await startTestApi({ dataDir })
  teacher = await teacherWithStudio(api.app)
  student = await studentIn(api.app, api.ctx, teacher.studioId)
  const plan = await createPlan(teacher, { studentIds: [student.user.id] })
  itemId = plan.items[0]!.id
  assignmentId = plan.assignees[0]!.assignmentId
})
afterAll(async () => {
  await api.close()
  rmSync(dataDir, { recursive: true, force: true })
})

const upload = (agent: Agent, bytes: Buffer, filename: string, planItemId = itemId) =>
  agent.agent
    .post(`/api/assignments/${assignmentId}/recordings`)
    .field('planItemId', planItemId)
    .attach('file', bytes, filename)

const recordingPath = (id: string) => `/api/assignments/${assignmentId}/recordings/${id}`

/** Collects a binary response body into a Buffer. */
function binary(res: Response, done: (err: Error | null, body: Buffer) => void) {
  const chunks: Buffer[] = []
  res.on('data', (chunk: Buffer) => chunks.push(chunk))
  res.on('end', () => done(null, Buffer.concat(chunks)))
}

describe('uploading', () => {
  it('when the student uploads a real WAV file, then it is stored under a random name and listed with the item', async () => {
    const wav = wavFile()
    const res = await upload(student, wav, 'take 1.wav')
    expect(res.status).toBe(201)
    expect(res.body.recording).toMatchObject({
      planItemId: itemId,
      mimeType: 'audio/wav',
      sizeBytes: wav.length,
      originalName: 'take 1.wav',
    })
    const row = await api.ctx.db('recordings').where({ id: res.body.recording.id }).first()
    expect(row.storage_key).toMatch(/^[a-f0-9]{32}$/)
    // In the bucket the test set-up started (S3_BUCKET), not on the app's disk.
    expect(api.ctx.config.s3?.bucket).toBeTruthy()
    expect(await recordingStorage(api.ctx).size(row.storage_key)).toBe(wav.length)
    expect(existsSync(path.join(dataDir, 'recordings'))).toBe(false)
    const [assignment] = (await student.agent.get('/api/plans/assigned')).body.assignments
    expect(assignment.items[0].recordings.map((r: { id: string }) => r.id)).toContain(
      res.body.recording.id,
    )
  })

  it('when the student uploads an Ogg Opus file named .bin, then the content decides: it is Ogg audio', async () => {
    const res = await upload(student, oggOpusFile(), 'recording.bin')
    expect(res.status).toBe(201)
    expect(res.body.recording.mimeType).toBe('audio/ogg')
  })

  it('when an executable is renamed .mp3, then 415 and nothing is stored', async () => {
    const before = await api.ctx
      .db('recordings')
      .where({ assignment_id: assignmentId })
      .count({ n: '*' })
      .first()
    const elf = Buffer.concat([
      Buffer.from([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0]),
      Buffer.alloc(200),
    ])
    const res = await upload(student, elf, 'song.mp3')
    expect(res.status).toBe(415)
    expect(res.body.error.fields.file).toBeDefined()
    const pe = await upload(
      student,
      Buffer.concat([Buffer.from('MZ'), Buffer.alloc(300)]),
      'song.wav',
    )
    expect(pe.status).toBe(415)
    expect(
      await api.ctx
        .db('recordings')
        .where({ assignment_id: assignmentId })
        .count({ n: '*' })
        .first(),
    ).toEqual(before)
  })

  it('when the file is larger than 20 MB, then 413', async () => {
    const big = Buffer.concat([wavFile(10), Buffer.alloc(20 * 1024 * 1024)])
    const res = await upload(student, big, 'long.wav')
    expect(res.status).toBe(413)
  })

  it('when the file is empty or missing, then 400', async () => {
    expect((await upload(student, Buffer.alloc(0), 'empty.wav')).status).toBe(400)
    const none = await student.agent
      .post(`/api/assignments/${assignmentId}/recordings`)
      .field('planItemId', itemId)
    expect(none.status).toBe(400)
    expect(none.body.error.fields.file).toBeDefined()
  })

  it('when a student uploads to an item not assigned to them, then 403; a teacher cannot upload at all', async () => {
    const outsider = await signedInAgent(api.app)
    expect((await upload(outsider, wavFile(), 'x.wav')).status).toBe(403)
    expect((await upload(teacher, wavFile(), 'x.wav')).status).toBe(403)
    expect((await upload(student, wavFile(), 'x.wav', crypto.randomUUID())).status).toBe(404)
  })
})

describe('playing', () => {
  let id: string
  const wav = wavFile(500)
  beforeAll(async () => {
    id = (await upload(student, wav, 'range.wav')).body.recording.id
  })

  it('when the player asks for a byte range, then 206 with exactly those bytes and Content-Range', async () => {
    const res = await student.agent
      .get(`${recordingPath(id)}/audio`)
      .set('Range', 'bytes=44-99')
      .buffer(true)
      .parse(binary)
    expect(res.status).toBe(206)
    expect(res.headers['accept-ranges']).toBe('bytes')
    expect(res.headers['content-range']).toBe(`bytes 44-99/${wav.length}`)
    expect(res.headers['content-type']).toBe('audio/wav')
    expect(Buffer.compare(res.body as Buffer, wav.subarray(44, 100))).toBe(0)
  })

  it('when asked without a range, then 200 with the whole file; a range past the end is 416', async () => {
    const res = await teacher.agent
      .get(`${recordingPath(id)}/audio`)
      .buffer(true)
      .parse(binary)
    expect(res.status).toBe(200)
    expect(Buffer.compare(res.body as Buffer, wav)).toBe(0)
    const past = await student.agent
      .get(`${recordingPath(id)}/audio`)
      .set('Range', `bytes=${wav.length + 10}-`)
    expect(past.status).toBe(416)
    expect(past.headers['content-range']).toBe(`bytes */${wav.length}`)
  })

  it('when another teacher or student asks, then 403; the teacher may not delete it, the student may', async () => {
    const otherTeacher = await teacherWithStudio(api.app)
    const otherStudent = await signedInAgent(api.app)
    expect((await otherTeacher.agent.get(`${recordingPath(id)}/audio`)).status).toBe(403)
    expect((await otherStudent.agent.get(`${recordingPath(id)}/audio`)).status).toBe(403)
    expect((await teacher.agent.delete(recordingPath(id))).status).toBe(403)
    const key = (await api.ctx.db('recordings').where({ id }).first()).storage_key as string
    expect((await student.agent.delete(recordingPath(id))).status).toBe(204)
    expect(existsSync(path.join(dataDir, 'recordings', key.slice(0, 2), key))).toBe(false)
    expect((await student.agent.get(`${recordingPath(id)}/audio`)).status).toBe(404)
  })
})
