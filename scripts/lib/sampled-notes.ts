// The app's own rendered notes (public/samples/*.mp3, decoded with mpg123-decoder) played back in
// Node: a note list {pitch, startMs, durationMs} becomes mono samples or a 16-bit PCM WAV, the way
// the app's sampler plays them (nearest sample, repitched; trimmed to its onset; released).
import { readFileSync } from 'node:fs'
import path from 'node:path'
import { MPEGDecoder } from 'mpg123-decoder'
import {
  nearestSample,
  ONSET_PREROLL_S,
  onsetIndex,
  SAMPLE_SETS,
  type SampleVoice,
} from '../../src/audio/sample-map'
import { ROOT } from './paths.mjs'

export { wavBytes } from './wav'

export interface PlayedNote {
  pitch: number
  startMs: number
  durationMs: number
  /** 0–1, default 0.8. */
  velocity?: number
}

interface Decoded {
  samples: Float32Array
  sampleRate: number
}

/** A note fades out over its last 25 ms, as a player's finger damps the string before the next. */
const RELEASE_MS = 25
const cache = new Map<string, Promise<Map<number, Decoded>>>()

async function decodeVoice(voice: SampleVoice): Promise<Map<number, Decoded>> {
  const decoder = new MPEGDecoder()
  await decoder.ready
  const notes = new Map<number, Decoded>()
  try {
    for (const pitch of SAMPLE_SETS[voice].pitches) {
      const file = path.join(ROOT, 'public', 'samples', voice, `${pitch}.mp3`)
      const decoded = decoder.decode(new Uint8Array(readFileSync(file)))
      const channel = decoded.channelData[0]
      if (!channel || decoded.errors.length) throw new Error(`could not decode ${file}`)
      // As the app's player does: start just before the onset (no encoder silence in front).
      const from = Math.max(
        0,
        onsetIndex(channel) - Math.round(ONSET_PREROLL_S * decoded.sampleRate),
      )
      notes.set(pitch, { samples: channel.slice(from), sampleRate: decoded.sampleRate })
      await decoder.reset()
    }
  } finally {
    decoder.free()
  }
  return notes
}

/** The decoded, onset-trimmed samples of a voice, keyed by MIDI pitch (decoded once). */
export function loadVoice(voice: SampleVoice): Promise<Map<number, Decoded>> {
  if (!cache.has(voice)) cache.set(voice, decodeVoice(voice))
  return cache.get(voice)!
}

/** One note resampled to `rate` × its speed (linear interpolation), silent after `length`. */
function playNote(source: Decoded, rate: number, length: number, release: number): Float32Array {
  const out = new Float32Array(Math.min(length, Math.floor(source.samples.length / rate)))
  const fadeFrom = Math.max(length / 2, length - release)
  for (let i = 0; i < out.length; i += 1) {
    const at = i * rate
    const k = Math.floor(at)
    const a = source.samples[k] ?? 0
    const b = source.samples[k + 1] ?? 0
    const gain = i < fadeFrom ? 1 : (length - i) / (length - fadeFrom)
    out[i] = (a + (b - a) * (at - k)) * gain
  }
  return out
}

/**
 * Renders notes with the app's samples (A4 = 440 Hz) at `sampleRate`; each note sounds for its
 * duration (the last 25 ms fading out); the take lasts until the last note ends, plus `tailMs`.
 */
export async function renderNotes(
  notes: PlayedNote[],
  options: { voice: SampleVoice; sampleRate?: number; tailMs?: number },
): Promise<Float32Array> {
  const sampleRate = options.sampleRate ?? 48_000
  const voice = await loadVoice(options.voice)
  const toSamples = (ms: number) => Math.round((ms * sampleRate) / 1000)
  const end = Math.max(0, ...notes.map((n) => n.startMs + n.durationMs))
  const out = new Float32Array(toSamples(end + (options.tailMs ?? 200)))
  for (const note of notes) {
    const { samplePitch, playbackRate } = nearestSample(
      note.pitch,
      440,
      SAMPLE_SETS[options.voice].pitches,
    )
    const source = voice.get(samplePitch)!
    const rate = (playbackRate * source.sampleRate) / sampleRate
    const played = playNote(source, rate, toSamples(note.durationMs), toSamples(RELEASE_MS))
    const at = toSamples(note.startMs)
    for (let i = 0; i < played.length && at + i < out.length; i += 1)
      out[at + i] = (out[at + i] ?? 0) + (played[i] ?? 0) * (note.velocity ?? 0.8)
  }
  return out
}
