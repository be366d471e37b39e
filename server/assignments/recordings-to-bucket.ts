// Moves takes stored on local disk (before object storage) into the bucket; safe to run again: a
// take already in the bucket at its full size is not sent twice, and each file goes once it is there.
import { createReadStream } from 'node:fs'
import { readdir, rm, stat } from 'node:fs/promises'
import path from 'node:path'
import type { RecordingStorage } from './recording-storage'

const KEY = /^[a-f0-9]{32}$/

/** Storage keys of the finished takes under the disk store's folder (partial files skipped). */
async function diskKeys(root: string): Promise<string[]> {
  const names = await readdir(root, { recursive: true }).catch(() => [] as string[])
  return names.map((name) => path.basename(name)).filter((name) => KEY.test(name))
}

export interface MoveResult {
  moved: number
  alreadyThere: number
}

/** Copies every disk take into `bucket` under the same key, then deletes the disk file. */
export async function moveDiskTakesToBucket(
  root: string,
  bucket: RecordingStorage,
): Promise<MoveResult> {
  const result: MoveResult = { moved: 0, alreadyThere: 0 }
  for (const key of await diskKeys(root)) {
    const file = path.join(root, key.slice(0, 2), key)
    const { size } = await stat(file)
    if ((await bucket.size(key)) === size) result.alreadyThere++
    else {
      const written = await bucket.put(key, createReadStream(file))
      if (written !== size)
        throw new Error(`take ${key}: ${written} of ${size} bytes reached the bucket`)
      result.moved++
    }
    await rm(file)
  }
  return result
}
