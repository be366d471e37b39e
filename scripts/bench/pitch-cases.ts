// The takes npm run bench:pitch listens to: single notes (synthetic tone, Karplus–Strong, the app's
// sampled notes) for every bass and guitar note, clean and noisy, note sequences with repeated
// notes, and noise-only takes. Deterministic (seeded).
import { createRandom } from '../../src/theory/random'
import { renderNotes, type PlayedNote } from '../lib/sampled-notes'
import {
  karplusStrong,
  mixInto,
  pluckedTone,
  whiteNoise,
  withNoise,
  hum,
} from '../lib/test-signals'

export type Source = 'tone' | 'ks' | 'sampled'
export type Condition = 'clean' | 'noisy'

export interface Instrument {
  name: 'bass' | 'guitar'
  lowest: number
  highest: number
}

// 5-string bass B0–G2 with 24 frets (top G4); 6-string guitar E2–E4 with 24 frets (top E6).
export const BASS: Instrument = { name: 'bass', lowest: 23, highest: 67 }
export const GUITAR: Instrument = { name: 'guitar', lowest: 40, highest: 88 }

export interface Take {
  label: string
  instrument: Instrument
  source: Source
  condition: Condition
  sampleRate: number
  samples: Float32Array
  /** What was played: pitch and onset (ms). */
  played: { pitch: number; onsetMs: number }[]
  /** The 2 s of the same room before playing (for the noise-gate calibration). */
  room: Float32Array
}

const LEAD_MS = 150
const NOTE_MS = 700
const rateOf = (source: Source) => (source === 'sampled' ? 44_100 : 48_000)

function synthetic(
  source: Source,
  pitch: number,
  sampleRate: number,
  durationS: number,
  seed: number,
) {
  const random = createRandom(seed)
  const options = { sampleRate, durationS, seed, fundamental: 0.3 + 0.7 * random() }
  return source === 'ks' ? karplusStrong(pitch, options) : pluckedTone(pitch, options)
}

async function render(
  source: Source,
  notes: PlayedNote[],
  instrument: Instrument,
  sampleRate: number,
  seed: number,
) {
  if (source === 'sampled')
    return renderNotes(notes, { voice: instrument.name, sampleRate, tailMs: 150 })
  const end = Math.max(...notes.map((n) => n.startMs + n.durationMs)) + 150
  const out = new Float32Array(Math.round((end * sampleRate) / 1000))
  // Like the sampled notes: each sounds for its duration, its last 25 ms fading out (damped).
  notes.forEach((note, k) => {
    const tone = synthetic(source, note.pitch, sampleRate, note.durationMs / 1000, seed + k)
    const fade = Math.round(0.025 * sampleRate)
    for (let i = 0; i < fade; i += 1) tone[tone.length - fade + i]! *= 1 - i / fade
    mixInto(out, tone, Math.round((note.startMs * sampleRate) / 1000), note.velocity ?? 0.8)
  })
  return out
}

function roomAndNoise(
  samples: Float32Array,
  sampleRate: number,
  condition: Condition,
  seed: number,
) {
  const mainsHz = seed % 2 ? 50 : 60
  if (condition === 'clean') return { samples, room: new Float32Array(2 * sampleRate) }
  const noisy = withNoise(samples, sampleRate, { snrDb: 20, mainsHz, seed })
  const level = Math.sqrt(
    noisy.reduce((s, v, i) => s + (v - (samples[i] ?? 0)) ** 2, 0) / noisy.length / 2,
  )
  const room = mixInto(
    whiteNoise(2 * sampleRate, level, seed + 1),
    hum(2 * sampleRate, sampleRate, mainsHz, level),
  )
  return { samples: noisy, room }
}

async function take(
  instrument: Instrument,
  source: Source,
  condition: Condition,
  notes: PlayedNote[],
  seed: number,
  label: string,
): Promise<Take> {
  const sampleRate = rateOf(source)
  const clean = await render(source, notes, instrument, sampleRate, seed)
  const { samples, room } = roomAndNoise(clean, sampleRate, condition, seed)
  const played = notes.map((n) => ({ pitch: n.pitch, onsetMs: n.startMs }))
  return { label, instrument, source, condition, sampleRate, samples, played, room }
}

/** Every note of both instruments, from every source, clean and noisy. */
export async function* singleNotes(): AsyncGenerator<Take> {
  for (const instrument of [BASS, GUITAR])
    for (let pitch = instrument.lowest; pitch <= instrument.highest; pitch += 1)
      for (const source of ['tone', 'ks', 'sampled'] as const)
        for (const condition of ['clean', 'noisy'] as const) {
          const notes = [{ pitch, startMs: LEAD_MS, durationMs: NOTE_MS }]
          yield take(instrument, source, condition, notes, pitch * 31 + source.length, `${pitch}`)
        }
}

/** Runs of 12 notes, a third of them repeated, 160–420 ms apart, loud and soft. */
export async function* sequences(count = 8): AsyncGenerator<Take> {
  for (let k = 0; k < count; k += 1) {
    const random = createRandom(1000 + k)
    const instrument = k % 2 ? GUITAR : BASS
    const notes: PlayedNote[] = []
    let pitch = instrument.lowest + Math.floor(random() * 20)
    let at = LEAD_MS
    for (let n = 0; n < 12; n += 1) {
      if (n > 0 && random() > 0.35)
        pitch = Math.min(
          instrument.highest,
          Math.max(instrument.lowest, pitch + Math.round(random() * 10 - 5)),
        )
      const durationMs = 160 + Math.round(random() * 260)
      notes.push({ pitch, startMs: at, durationMs, velocity: 0.5 + 0.4 * random() })
      at += durationMs
    }
    for (const source of ['tone', 'ks', 'sampled'] as const)
      for (const condition of ['clean', 'noisy'] as const)
        yield take(instrument, source, condition, notes, 7000 + k, `sequence ${k + 1}`)
  }
}

/** Room noise and hum only, 3 s: any note heard is a wrong accept. */
export function* noiseOnly(): Generator<Take> {
  for (const [k, instrument] of [BASS, GUITAR, BASS, GUITAR].entries()) {
    const sampleRate = 48_000
    const mainsHz = k % 2 ? 50 : 60
    const level = 0.01 * (k + 1)
    const noise = () =>
      mixInto(
        whiteNoise(3 * sampleRate, level, 50 + k),
        hum(3 * sampleRate, sampleRate, mainsHz, level),
      )
    const samples = noise()
    yield {
      label: 'noise',
      instrument,
      source: 'tone',
      condition: 'noisy',
      sampleRate,
      samples,
      played: [],
      room: noise(),
    }
  }
}
