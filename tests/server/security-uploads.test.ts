// Findings 8 and 9 as the attack: 20 takes sent at once against the limit of 10 per item, uploads
// held open (the owner check comes before the body, the bytes stream to disk, a third parallel
// upload is refused), and a plan created for a student who is not the teacher's.
import { existsSync, mkdtempSync, readdirSync, rmSync, statSync } from 'node:fs'
import http from 'node:http'
import type { AddressInfo } from 'node:net'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { sessionCookieName } from '../../server/auth/session-token'
import { issueSessionToken } from '../../server/auth/sessions'
import { uploadsInFlight } from '../../server/assignments/recording-upload'
import { CSRF_HEADER, CSRF_VALUE } from '../../server/lib/csrf'
import { signedInAgent, startTestApi, type TestApi } from '../helpers/api'
import {
  createPlan,
  planBody,
  studentIn,
  teacherWithStudio,
  wavFile,
  type Agent,
} from '../helpers/studio'

let api: TestApi
let dataDir: string
let server: http.Server
let teacher: Agent & { studioId: string }
let student: Agent
let assignmentId: string
let itemId: string

beforeAll(async () => {
  dataDir = mkdtempSync(path.join(tmpdir(), 'ambitus-upload-attacks-'))
  api = await startTestApi({ dataDir, s3: undefined }) // the disk store: its partial files show streaming
  server = await new Promise<http.Server>((ready) => {
    const listening = api.bareApp.listen(0, '127.0.0.1', () => ready(listening))
  })
  teacher = await teacherWithStudio(api.app, 'Upload Teacher')
  student = await studentIn(api.app, api.ctx, teacher.studioId, 'Upload Student')
  const plan = await createPlan(teacher, { studentIds: [student.user.id] })
  itemId = plan.items[0]!.id
  assignmentId = plan.assignees[0]!.assignmentId
})
afterAll(async () => {
  await new Promise((r) => server.close(r))
  await api.close()
  rmSync(dataDir, { recursive: true, force: true })
})

/** Every file under the recordings folder (name and size), partial ones included. */
function storedFiles(root: string) {
  const dir = path.join(root, 'recordings')
  if (!existsSync(dir)) return []
  return readdirSync(dir, { recursive: true, encoding: 'utf8' })
    .map((name) => path.join(dir, name))
    .filter((file) => statSync(file).isFile())
    .map((file) => ({ name: path.basename(file), size: statSync(file).size }))
}

const BOUNDARY = 'attack-boundary-7f3a'
function multipart(planItemId: string, file: Buffer) {
  const head = Buffer.from(
    `--${BOUNDARY}\r\nContent-Disposition: form-data; name="planItemId"\r\n\r\n${planItemId}\r\n` +
      `--${BOUNDARY}\r\nContent-Disposition: form-data; name="file"; filename="take.wav"\r\n` +
      'Content-Type: audio/wav\r\n\r\n',
  )
  return Buffer.concat([head, file, Buffer.from(`\r\n--${BOUNDARY}--\r\n`)])
}

/**
 * An upload over a raw socket that sends only the first `sent` bytes of its body and then waits:
 * `finish()` sends the rest. `response` settles as soon as the server answers, body complete or not.
 */
async function heldUpload(userId: string, body: Buffer, sent: number) {
  const cookie = `${sessionCookieName(api.ctx.config)}=${await issueSessionToken(api.ctx, userId)}`
  const req = http.request({
    host: '127.0.0.1',
    port: (server.address() as AddressInfo).port,
    method: 'POST',
    path: `/api/assignments/${assignmentId}/recordings`,
    headers: {
      cookie,
      [CSRF_HEADER]: CSRF_VALUE,
      'content-type': `multipart/form-data; boundary=${BOUNDARY}`,
      'content-length': body.length,
    },
  })
  const response = new Promise<{ status: number; body: string }>((resolve, reject) => {
    req.on('error', reject)
    req.on('response', (res) => {
      let text = ''
      res.on('data', (chunk: Buffer) => (text += chunk.toString()))
      res.on('end', () => resolve({ status: res.statusCode!, body: text }))
    })
  })
  req.write(body.subarray(0, sent))
  return { response, finish: () => req.end(body.subarray(sent)), abort: () => req.destroy() }
}

/** Waits (without a deadline of its own) until the condition holds; the test timeout bounds it. */
async function until(condition: () => boolean | Promise<boolean>) {
  while (!(await condition())) await new Promise((r) => setTimeout(r, 20))
}

describe('parallel uploads against the limit of 10 takes per item (finding 8)', () => {
  it('when 20 takes are sent at once, then exactly 10 are stored, the rest get 409 and no file is left over', async () => {
    const root = mkdtempSync(path.join(tmpdir(), 'ambitus-upload-race-'))
    const wide = await startTestApi({ dataDir: root, uploadsPerUser: 20, s3: undefined })
    try {
      const t = await teacherWithStudio(wide.app)
      const s = await studentIn(wide.app, wide.ctx, t.studioId)
      const plan = await createPlan(t, { studentIds: [s.user.id] })
      const [item, assignment] = [plan.items[0]!.id, plan.assignees[0]!.assignmentId]
      const wav = wavFile(400)

      const answers = await Promise.all(
        Array.from({ length: 20 }, () =>
          s.agent
            .post(`/api/assignments/${assignment}/recordings`)
            .field('planItemId', item)
            .attach('file', wav, 'take.wav'),
        ),
      )

      const statuses = answers.map((r) => r.status).sort()
      console.log(`20 parallel uploads answered: ${statuses.join(' ')}`)
      expect(statuses.filter((st) => st === 201)).toHaveLength(10)
      expect(statuses.filter((st) => st === 409)).toHaveLength(10)
      const rows = await wide.ctx.db('recordings').where({ assignment_id: assignment })
      expect(rows).toHaveLength(10)
      expect(
        storedFiles(root)
          .map((f) => f.name)
          .sort(),
      ).toEqual(rows.map((r: { storage_key: string }) => r.storage_key).sort())
    } finally {
      await wide.close()
      rmSync(root, { recursive: true, force: true })
    }
  })
})

describe('uploads held open (finding 9)', () => {
  it('when another student starts a 20 MB upload, then 403 arrives before the body is sent and nothing is written', async () => {
    const outsider = await signedInAgent(api.app, 'student', 'Upload Outsider')
    const body = multipart(itemId, Buffer.alloc(20 * 1024 * 1024))
    const before = storedFiles(dataDir).length

    const held = await heldUpload(outsider.user.id, body, 64 * 1024)
    const answer = await held.response // were the body read first, this would never settle

    expect(answer.status).toBe(403)
    held.abort()
    expect(storedFiles(dataDir)).toHaveLength(before)
  })

  it('when two uploads are in flight, then the bytes are already on disk and a third upload gets 429', async () => {
    const wav = wavFile(300_000) // ~600 kB
    const first = await heldUpload(student.user.id, multipart(itemId, wav), 400_000)
    const second = await heldUpload(student.user.id, multipart(itemId, wav), 1000)
    await until(async () => (await uploadsInFlight(api.ctx, student.user.id)) === 2)
    // Streamed, not buffered: the partial file grows on disk while the body is still arriving.
    await until(() => storedFiles(dataDir).some((f) => f.name.endsWith('.part') && f.size > 0))

    const third = await student.agent
      .post(`/api/assignments/${assignmentId}/recordings`)
      .field('planItemId', itemId)
      .attach('file', wavFile(), 'take.wav')
    expect(third.status).toBe(429)
    expect(third.body.error.code).toBe('too_many_uploads')

    first.finish()
    second.finish()
    expect([(await first.response).status, (await second.response).status]).toEqual([201, 201])
    await until(async () => (await uploadsInFlight(api.ctx, student.user.id)) === 0) // freed after the answer
    expect(storedFiles(dataDir).filter((f) => f.name.endsWith('.part'))).toEqual([])
  })

  it('when an upload is cut off halfway, then its slot is freed and no partial file stays', async () => {
    const held = await heldUpload(student.user.id, multipart(itemId, wavFile(300_000)), 300_000)
    await until(() => storedFiles(dataDir).some((f) => f.name.endsWith('.part') && f.size > 0))
    held.abort()
    await held.response.catch(() => undefined)
    await until(async () => (await uploadsInFlight(api.ctx, student.user.id)) === 0)
    await until(() => !storedFiles(dataDir).some((f) => f.name.endsWith('.part')))
    const rows = await api.ctx.db('recordings').where({ assignment_id: assignmentId })
    expect(storedFiles(dataDir)).toHaveLength(rows.length)
  })
})

describe('creating a plan and assigning it is one transaction (finding 8)', () => {
  it("when a plan is created for the teacher's student and another teacher's student, then 403 and no plan exists", async () => {
    const other = await teacherWithStudio(api.app)
    const foreign = await studentIn(api.app, api.ctx, other.studioId)
    const before = await api.ctx
      .db('plans')
      .where({ teacher_id: teacher.user.id })
      .count({ n: '*' })

    const res = await teacher.agent
      .post('/api/plans')
      .send(planBody({ title: 'Sneaky plan', studentIds: [student.user.id, foreign.user.id] }))

    expect(res.status).toBe(403)
    expect(await api.ctx.db('plans').where({ title: 'Sneaky plan' })).toEqual([])
    expect(
      await api.ctx.db('plans').where({ teacher_id: teacher.user.id }).count({ n: '*' }),
    ).toEqual(before)
  })
})
