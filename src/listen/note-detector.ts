// The streaming detector: samples in (any chunk size), events out — note verdicts, onsets, input
// level and tuner readings. One code path for the AudioWorklet, transcribe() and the benchmark.
import { pitchName } from '../theory/pitch'
import { DEFAULT_GATE_DB } from './calibration'
import { createFrameAnalyser, type FrameAnalyser } from './frame-analysis'
import { createOnsetTracker, ONSET_BLOCK } from './onset-tracker'
import {
  analysisWindow,
  frequencyLimits,
  hopSize,
  resolveRange,
  type ListenRange,
  type PitchLike,
} from './pitch-range'
import { createNoteTracker } from './note-tracker'

/** A note heard: MIDI pitch, its name, how far off 12-TET, when it started and when it was known. */
export interface HeardNote {
  pitch: number
  name: string
  cents: number
  onsetMs: number
  verdictMs: number
}

export type DetectorEvent =
  | ({ type: 'note' } & HeardNote)
  | { type: 'onset'; timeMs: number; levelDb: number }
  | { type: 'level'; timeMs: number; rmsDb: number; peakDb: number }
  | { type: 'tuner'; timeMs: number; frequency: number; pitch: number; clarity: number }
  | { type: 'silence'; timeMs: number }

export interface NoteDetectorOptions {
  sampleRate: number
  lowest: PitchLike
  highest?: PitchLike
  referenceHz?: number
  /** Noise gate in dBFS (peak): quieter is silence. From calibration; default −60. */
  gateDb?: number
  /** Replaces the pitch estimate of each frame (the benchmark's baseline). */
  analyser?: FrameAnalyser
}

export interface NoteDetector {
  readonly sampleRate: number
  readonly range: ListenRange
  /** Longest analysis window, in samples. */
  readonly window: number
  /** Feeds samples (mono, −1…1) and returns what they made known, in time order. */
  push(samples: Float32Array): DetectorEvent[]
  setGate(gateDb: number): void
}

const LEVEL_EVERY_MS = 50
const toDb = (amplitude: number) => (amplitude > 0 ? 20 * Math.log10(amplitude) : -120)
export const fromDb = (db: number) => 10 ** (db / 20)

export function createNoteDetector(options: NoteDetectorOptions): NoteDetector {
  const { sampleRate } = options
  const range = resolveRange(options)
  const window = analysisWindow(range, sampleRate)
  const hop = hopSize(sampleRate)
  const analyse = options.analyser ?? createFrameAnalyser({ sampleRate, range })
  const onsets = createOnsetTracker({
    sampleRate,
    lowestHz: frequencyLimits(range).lowHz,
    gate: fromDb(options.gateDb ?? DEFAULT_GATE_DB),
  })
  const notes = createNoteTracker({ sampleRate, range, hop, window })
  notes.setGate(fromDb(options.gateDb ?? DEFAULT_GATE_DB))
  const ms = (index: number) => (index * 1000) / sampleRate
  // The last `window` samples (and a block of spare), in a ring.
  const ring = new Float32Array(window + 2 * ONSET_BLOCK)
  const block = new Float32Array(ONSET_BLOCK)
  const frames = new Map<number, Float32Array>()
  const levelEvery = Math.round((LEVEL_EVERY_MS * sampleRate) / 1000)
  let written = 0
  let filled = 0
  let segmentStart: number | null = null
  let envelope = 0
  let squares = 0
  let levelPeak = 0

  // The last `length` samples, copied out of the ring in at most two pieces.
  function frameOf(length: number): Float32Array {
    let frame = frames.get(length)
    if (!frame) frames.set(length, (frame = new Float32Array(length)))
    const from = (written - length + ring.length) % ring.length
    const first = Math.min(length, ring.length - from)
    frame.set(ring.subarray(from, from + first))
    if (first < length) frame.set(ring.subarray(0, length - first), first)
    return frame
  }

  function analyseNow(events: DetectorEvent[]) {
    if (segmentStart === null) return
    const length = notes.frameLength(Math.floor((written - segmentStart) / hop) * hop)
    if (length < 2 * hop) return
    const reading = analyse(frameOf(length), notes.soundingHz())
    const time = ms(written)
    if (reading) {
      const pitch = 69 + 12 * Math.log2(reading.frequency / range.referenceHz)
      events.push({ type: 'tuner', timeMs: time, pitch, ...reading })
    }
    const note = notes.frame(reading, written, envelope)
    if (note) {
      events.push({ type: 'note', ...note, name: pitchName(note.pitch) })
      onsets.follow(sampleRate / (range.referenceHz * 2 ** ((note.pitch - 69) / 12)))
    }
  }

  function level(value: number, events: DetectorEvent[]) {
    squares += value * value
    levelPeak = Math.max(levelPeak, Math.abs(value))
    if (written % levelEvery !== 0) return
    const rmsDb = toDb(Math.sqrt(squares / levelEvery))
    events.push({ type: 'level', timeMs: ms(written), rmsDb, peakDb: toDb(levelPeak) })
    squares = 0
    levelPeak = 0
  }

  function endOfBlock(events: DetectorEvent[]) {
    const { onset, quiet, ...result } = onsets.block(block, written)
    envelope = result.envelope
    if (onset !== null) {
      segmentStart = onset
      onsets.follow(null)
      notes.start(onset)
      events.push({ type: 'onset', timeMs: ms(onset), levelDb: toDb(envelope) })
    } else if (quiet && segmentStart !== null) {
      segmentStart = null
      onsets.follow(null)
      notes.stop()
      events.push({ type: 'silence', timeMs: ms(written) })
    }
  }

  return {
    sampleRate,
    range,
    window,
    setGate(gateDb) {
      onsets.setGate(fromDb(gateDb))
      notes.setGate(fromDb(gateDb))
    },
    push(samples) {
      const events: DetectorEvent[] = []
      for (const value of samples) {
        ring[written % ring.length] = value
        block[filled] = value
        written += 1
        filled += 1
        level(value, events)
        if (filled === ONSET_BLOCK) {
          filled = 0
          endOfBlock(events)
        }
        if (written % hop === 0) analyseNow(events)
      }
      return events
    },
  }
}
