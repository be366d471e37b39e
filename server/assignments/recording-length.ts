// The length of an uploaded take, read from the stored file by music-metadata (WAV and MP3 say it
// in their headers, Ogg in its last page); browser takes bring their measured length instead.
import type { Readable } from 'node:stream'
import { parseStream } from 'music-metadata'
import { LONGEST_TAKE_MS } from '../../src/contract/recordings'
import type { RecordingStorage } from './recording-storage'

/** The take's length in whole ms, or null when the file does not tell (it still plays). */
export async function measuredLength(
  storage: RecordingStorage,
  file: { storageKey: string; size: number; mimeType: string },
): Promise<number | null> {
  const stream = storage.get(file.storageKey) as Readable
  try {
    const { format } = await parseStream(
      stream,
      { mimeType: file.mimeType, size: file.size },
      { duration: true, skipCovers: true },
    )
    const ms = Math.round((format.duration ?? 0) * 1000)
    return ms >= 1 && ms <= LONGEST_TAKE_MS ? ms : null
  } catch {
    return null
  } finally {
    stream.destroy()
  }
}
