// Recordings in an S3-compatible bucket (the local fake started by our scripts, or real storage named
// by S3_ENDPOINT / S3_BUCKET / S3_REGION with credentials from the environment).
import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3'
import { Upload } from '@aws-sdk/lib-storage'
import { PassThrough, Readable, Transform } from 'node:stream'
import type { Config } from '../config'
import type { ByteRange, RecordingStorage } from './recording-storage'

/** Endpoint, bucket, region, addressing and credentials (from the environment only). */
export type BucketSettings = NonNullable<Config['s3']>

const KEY = /^[a-f0-9]{32}$/
const PREFIX = 'recordings/'

/** The object key of a storage key; keys are checked like the disk store's file names. */
export function objectKey(key: string) {
  if (!KEY.test(key)) throw new Error(`invalid storage key ${key}`)
  return `${PREFIX}${key.slice(0, 2)}/${key}`
}

/** A client for the bucket; checksums only where S3 requires them (fakes reject chunked trailers). */
export function bucketClient(settings: BucketSettings) {
  return new S3Client({
    endpoint: settings.endpoint,
    region: settings.region,
    forcePathStyle: settings.forcePathStyle,
    credentials: {
      accessKeyId: settings.accessKeyId,
      secretAccessKey: settings.secretAccessKey,
      sessionToken: settings.sessionToken,
    },
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  })
}

const isMissing = (error: unknown) =>
  error instanceof S3ServiceException &&
  (error.$metadata.httpStatusCode === 404 ||
    error.name === 'NotFound' ||
    error.name === 'NoSuchKey')

/** Counts the bytes that pass, so put() can answer the size without another request. */
function byteCounter() {
  const counter = new Transform({
    transform(chunk: Buffer, _encoding, done) {
      counter.bytes += chunk.length
      done(null, chunk)
    },
  }) as Transform & { bytes: number }
  counter.bytes = 0
  return counter
}

/** Reads (part of) an object as a stream at once; the request starts on the next tick. */
function readObject(client: S3Client, Bucket: string, Key: string, range?: ByteRange): Readable {
  const out = new PassThrough()
  const Range = range ? `bytes=${range.start}-${range.end}` : undefined
  client.send(new GetObjectCommand({ Bucket, Key, Range })).then(
    ({ Body }) => {
      const body = Body as Readable
      body.on('error', (error) => out.destroy(error))
      out.on('close', () => body.destroy())
      body.pipe(out)
    },
    (error: Error) => out.destroy(error),
  )
  return out
}

/** Recordings as objects `recordings/<2 hex>/<key>` in one bucket; streams multipart uploads. */
export function bucketRecordingStorage(
  settings: BucketSettings,
  client = bucketClient(settings),
): RecordingStorage {
  const Bucket = settings.bucket
  return {
    async put(key, body) {
      const counter = byteCounter()
      body.on('error', (error) => counter.destroy(error))
      const upload = new Upload({
        client,
        params: { Bucket, Key: objectKey(key), Body: body.pipe(counter) },
        queueSize: 2,
      })
      await upload.done()
      return counter.bytes
    },
    async size(key) {
      try {
        const head = await client.send(new HeadObjectCommand({ Bucket, Key: objectKey(key) }))
        return head.ContentLength ?? 0
      } catch (error) {
        if (isMissing(error)) return null
        throw error
      }
    },
    get: (key, range) => readObject(client, Bucket, objectKey(key), range),
    async delete(key) {
      await client.send(new DeleteObjectCommand({ Bucket, Key: objectKey(key) }))
    },
  }
}
