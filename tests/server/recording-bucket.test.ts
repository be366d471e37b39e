// Recordings in a bucket of their own on the local object store: refused and oversized takes leave no
// object behind, and the move of takes kept on disk into the bucket is complete and safe to repeat.
import { CreateBucketCommand, ListObjectsV2Command } from '@aws-sdk/client-s3'
import { randomBytes, randomUUID } from 'node:crypto'
import { Readable } from 'node:stream'
import { mkdirSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { bucketClient, bucketRecordingStorage } from '../../server/assignments/recording-storage-s3'
import { newStorageKey, recordingStorage } from '../../server/assignments/recording-storage'
import { moveDiskTakesToBucket } from '../../server/assignments/recordings-to-bucket'
import { loadConfig } from '../../server/config'
import { startTestApi, type TestApi } from '../helpers/api'
import { createPlan, studentIn, teacherWithStudio, wavFile, type Agent } from '../helpers/studio'

const settings = {
  ...loadConfig(process.env, { jwtSecret: 'unused'.repeat(6) }).s3!,
  bucket: `takes-${randomUUID().slice(0, 8)}`,
}
const client = bucketClient(settings)
let api: TestApi
let student: Agent
let assignmentId: string
let itemId: string

beforeAll(async () => {
  await client.send(new CreateBucketCommand({ Bucket: settings.bucket }))
  api = await startTestApi({ s3: settings })
  const teacher = await teacherWithStudio(api.app)
  student = await studentIn(api.app, api.ctx, teacher.studioId)
  const plan = await createPlan(teacher, { studentIds: [student.user.id] })
  ;[assignmentId, itemId] = [plan.assignees[0]!.assignmentId, plan.items[0]!.id]
})
afterAll(() => api.close())

/** The storage keys of every object in the test's bucket. */
async function objectKeys() {
  const listed = await client.send(new ListObjectsV2Command({ Bucket: settings.bucket }))
  return (listed.Contents ?? []).map((o) => path.basename(o.Key!)).sort()
}

const upload = (bytes: Buffer, name: string) =>
  student.agent
    .post(`/api/assignments/${assignmentId}/recordings`)
    .field('planItemId', itemId)
    .attach('file', bytes, name)

describe('takes in the bucket', () => {
  it('when takes are stored, refused by content and too large, then exactly the stored ones are objects', async () => {
    expect((await upload(wavFile(), 'a.wav')).status).toBe(201)
    expect(
      (await upload(Buffer.concat([Buffer.from('MZ'), Buffer.alloc(300)]), 'b.wav')).status,
    ).toBe(415)
    const big = Buffer.concat([wavFile(10), Buffer.alloc(20 * 1024 * 1024)])
    expect((await upload(big, 'c.wav')).status).toBe(413)
    expect((await upload(wavFile(6_000_000 / 2 / 1.05), 'd.wav')).status).toBe(201) // past one 5 MB part
    const rows = await api.ctx.db('recordings').where({ assignment_id: assignmentId })
    expect(rows).toHaveLength(2)
    expect(await objectKeys()).toEqual(
      rows.map((r: { storage_key: string }) => r.storage_key).sort(),
    )
    const multipart = rows.find((r: { size_bytes: number }) => r.size_bytes > 5 * 1024 * 1024)
    expect(await recordingStorage(api.ctx).size(multipart.storage_key)).toBe(multipart.size_bytes)
  })
})

describe('moving takes from disk into the bucket', () => {
  it('when run twice, then every take is in the bucket with its bytes once and the disk is empty', async () => {
    const root = mkdtempSync(path.join(tmpdir(), 'ambitus-disk-takes-'))
    const bucket = bucketRecordingStorage(settings)
    const takes = new Map(
      [newStorageKey(), newStorageKey(), newStorageKey()].map((k) => [k, randomBytes(5000)]),
    )
    for (const [key, bytes] of takes) {
      mkdirSync(path.join(root, key.slice(0, 2)), { recursive: true })
      writeFileSync(path.join(root, key.slice(0, 2), key), bytes)
    }
    const [first] = takes.keys()
    writeFileSync(path.join(root, first!.slice(0, 2), `${first}.part`), 'x') // an upload cut off
    await bucket.put(first!, Readable.from([takes.get(first!)!])) // a move interrupted after its copy

    expect(await moveDiskTakesToBucket(root, bucket)).toEqual({ moved: 2, alreadyThere: 1 })
    expect(await moveDiskTakesToBucket(root, bucket)).toEqual({ moved: 0, alreadyThere: 0 })
    for (const [key, bytes] of takes) {
      const chunks: Buffer[] = []
      for await (const chunk of bucket.get(key)) chunks.push(chunk as Buffer)
      expect(Buffer.compare(Buffer.concat(chunks), bytes)).toBe(0)
    }
    expect(
      readdirSync(root, { recursive: true }).filter((n) =>
        /^[a-f0-9]{32}$/.test(path.basename(String(n))),
      ),
    ).toEqual([])
    rmSync(root, { recursive: true, force: true })
  })
})
