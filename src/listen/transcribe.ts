// transcribe(): the notes in a recording, through the same streaming detector the browser runs,
// with the noise gate estimated from the recording's quietest stretches.
import { DEFAULT_GATE_DB } from './calibration'
import { createNoteDetector } from './note-detector'
import { ONSET_BLOCK } from './onset-tracker'
import type { PitchLike } from './pitch-range'

export interface TranscribedNote {
  /** MIDI pitch (C4 = 60). */
  pitch: number
  /** Scientific pitch name with sharps ("F#2"). */
  name: string
  /** When the note started, in ms from the first sample. */
  onsetMs: number
  /** How far from 12-TET (A4 = referenceHz), in cents. */
  cents: number
}

export interface TranscribeOptions {
  lowest: PitchLike
  highest?: PitchLike
  referenceHz?: number
  /** Noise gate in dBFS; estimated from the recording when absent. */
  gateDb?: number
}

/** Quietest tenth of the block peaks, +10 dB; never below −72 dBFS nor above −30 dBFS. */
export function estimateGateDb(samples: Float32Array): number {
  const peaks: number[] = []
  for (let start = 0; start + ONSET_BLOCK <= samples.length; start += ONSET_BLOCK * 4) {
    let peak = 0
    for (let i = start; i < start + ONSET_BLOCK * 4 && i < samples.length; i += 1)
      peak = Math.max(peak, Math.abs(samples[i] ?? 0))
    peaks.push(peak)
  }
  if (peaks.length === 0) return DEFAULT_GATE_DB
  peaks.sort((a, b) => a - b)
  const quiet = peaks[Math.floor(peaks.length * 0.1)] ?? 0
  const db = quiet > 0 ? 20 * Math.log10(quiet) + 10 : -120
  return Math.min(-30, Math.max(-72, db))
}

/**
 * The notes played in a mono recording, in order: MIDI pitch, name, onset (ms) and cents.
 * `lowest`/`highest` are the instrument's range as names ("E1") or MIDI numbers.
 * @example transcribe(samples, 48000, { lowest: 'E1', highest: 'G4' }) // [{ pitch: 33, name: 'A1', onsetMs: 0, cents: 0.4 }]
 */
export function transcribe(
  samples: Float32Array,
  sampleRate: number,
  options: TranscribeOptions,
): TranscribedNote[] {
  if (!(sampleRate >= 8000 && sampleRate <= 192000))
    throw new RangeError('The sample rate must be between 8000 and 192000 Hz.')
  const detector = createNoteDetector({
    sampleRate,
    ...options,
    gateDb: options.gateDb ?? estimateGateDb(samples),
  })
  // A little silence after the end lets a note that sounds to the last sample be heard out.
  const tail = new Float32Array(detector.window)
  const notes: TranscribedNote[] = []
  for (const chunk of [samples, tail])
    for (const event of detector.push(chunk))
      if (event.type === 'note')
        notes.push({
          pitch: event.pitch,
          name: event.name,
          onsetMs: event.onsetMs,
          cents: event.cents,
        })
  return notes
}
