// Takes for Chromium's file-fed microphone: a note list ({pitch, startMs, durationMs}) rendered
// with the app's own sampled notes (public/samples, decoded in Node) into a 16-bit PCM mono WAV
// under .test-output/takes. Launch the browser with launchBrowser({ microphoneFile }); Chromium
// plays the file in a loop.
import { mkdirSync, writeFileSync } from 'node:fs'
import path from 'node:path'
import { TEST_OUTPUT_DIR } from '../../scripts/lib/paths.mjs'
import { renderNotes, wavBytes, type PlayedNote } from '../../scripts/lib/sampled-notes'

export type { PlayedNote }

/** Writes the take and returns its absolute path. */
export async function writeTakeWav(
  name: string,
  notes: PlayedNote[],
  options: { voice: 'bass' | 'guitar'; sampleRate?: number; tailMs?: number },
): Promise<string> {
  const sampleRate = options.sampleRate ?? 48_000
  const samples = await renderNotes(notes, { ...options, sampleRate })
  const folder = path.join(TEST_OUTPUT_DIR, 'takes')
  mkdirSync(folder, { recursive: true })
  const file = path.join(folder, `${name}.wav`)
  writeFileSync(file, wavBytes(samples, sampleRate))
  return file
}
