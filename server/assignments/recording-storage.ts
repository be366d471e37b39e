// Where recording bytes live: a small interface (put / size / get with a byte range / delete), kept in
// a bucket when S3_BUCKET is set (recording-storage-s3.ts), else on local disk under the data folder.
import { randomBytes } from 'node:crypto'
import { createReadStream, createWriteStream } from 'node:fs'
import { mkdir, rename, rm, stat } from 'node:fs/promises'
import path from 'node:path'
import type { Readable } from 'node:stream'
import { pipeline } from 'node:stream/promises'
import type { AppContext } from '../context'
import { bucketRecordingStorage } from './recording-storage-s3'

/** Inclusive byte offsets, as in an HTTP Range header. */
export interface ByteRange {
  start: number
  end: number
}

export interface RecordingStorage {
  /** Stores the bytes under the key; resolves to the number of bytes written. */
  put(key: string, body: Readable): Promise<number>
  /** Size in bytes, or null when nothing is stored under the key. */
  size(key: string): Promise<number | null>
  get(key: string, range?: ByteRange): Readable
  delete(key: string): Promise<void>
}

const KEY = /^[a-f0-9]{32}$/

/** A random, unguessable storage key (never derived from the uploaded file name). */
export const newStorageKey = () => randomBytes(16).toString('hex')

/** Recordings on the local disk, two-level sharded by key; keys are checked so no path escapes. */
export function localRecordingStorage(root: string): RecordingStorage {
  const fileOf = (key: string) => {
    if (!KEY.test(key)) throw new Error(`invalid storage key ${key}`)
    return path.join(root, key.slice(0, 2), key)
  }
  return {
    async put(key, body) {
      const file = fileOf(key)
      await mkdir(path.dirname(file), { recursive: true, mode: 0o700 })
      const partial = `${file}.part`
      try {
        await pipeline(body, createWriteStream(partial, { flags: 'wx', mode: 0o600 }))
      } catch (error) {
        await rm(partial, { force: true }) // an aborted upload leaves nothing behind
        throw error
      }
      await rename(partial, file)
      return (await stat(file)).size
    },
    async size(key) {
      try {
        return (await stat(fileOf(key))).size
      } catch {
        return null
      }
    },
    get: (key, range) =>
      createReadStream(fileOf(key), range ? { start: range.start, end: range.end } : {}),
    delete: (key) => rm(fileOf(key), { force: true }),
  }
}

/** Where the disk store keeps takes (and where the move into a bucket finds older ones). */
export const diskRecordingsDir = (dataDir: string) => path.join(dataDir, 'recordings')

const storages = new WeakMap<AppContext, RecordingStorage>()

/** The storage for this app instance (one per context, so tests can point dataDir elsewhere). */
export function recordingStorage(ctx: AppContext): RecordingStorage {
  let storage = storages.get(ctx)
  if (!storage) {
    const { s3, dataDir } = ctx.config
    storage = s3 ? bucketRecordingStorage(s3) : localRecordingStorage(diskRecordingsDir(dataDir))
    storages.set(ctx, storage)
  }
  return storage
}
