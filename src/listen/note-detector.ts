// The streaming detector: samples in (any chunk size), events out — note verdicts, onsets, input
// level and tuner readings. One code path for the AudioWorklet, transcribe() and the benchmark.
import { pitchName } from '../theory/pitch'
import { DEFAULT_GATE_DB } from './calibration'
import { createFrameAnalyser, type FrameAnalyser } from './frame-analysis'
import { createOnsetTracker, ONSET_BLOCK, type OnsetTracker } from './onset-tracker'
import {
  analysisWindow,
  frequencyLimits,
  hopSize,
  resolveRange,
  type ListenRange,
  type PitchLike,
} from './pitch-range'
import { createNoteTracker, type NoteTracker } from './note-tracker'

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
  return new StreamingDetector(options)
}

/** The last samples heard, in a ring; frames are copied out of it. */
class SampleRing {
  private readonly samples: Float32Array
  private readonly frames = new Map<number, Float32Array>()
  written = 0

  constructor(length: number) {
    this.samples = new Float32Array(length)
  }

  write(value: number): void {
    this.samples[this.written % this.samples.length] = value
    this.written += 1
  }

  // The last `length` samples, copied out of the ring in at most two pieces.
  frameOf(length: number): Float32Array {
    const ring = this.samples
    let frame = this.frames.get(length)
    if (!frame) this.frames.set(length, (frame = new Float32Array(length)))
    const from = (this.written - length + ring.length) % ring.length
    const first = Math.min(length, ring.length - from)
    frame.set(ring.subarray(from, from + first))
    if (first < length) frame.set(ring.subarray(0, length - first), first)
    return frame
  }
}

class StreamingDetector implements NoteDetector {
  readonly sampleRate: number
  readonly range: ListenRange
  readonly window: number
  private readonly hop: number
  private readonly analyse: FrameAnalyser
  private readonly onsets: OnsetTracker
  private readonly notes: NoteTracker
  // The last `window` samples (and a block of spare).
  private readonly ring: SampleRing
  private readonly block = new Float32Array(ONSET_BLOCK)
  private readonly levelEvery: number
  private filled = 0
  private segmentStart: number | null = null
  private envelope = 0
  private squares = 0
  private levelPeak = 0

  constructor(options: NoteDetectorOptions) {
    const { sampleRate } = options
    const range = (this.range = resolveRange(options))
    const window = (this.window = analysisWindow(range, sampleRate))
    const gate = fromDb(options.gateDb ?? DEFAULT_GATE_DB)
    this.sampleRate = sampleRate
    this.hop = hopSize(sampleRate)
    this.analyse = options.analyser ?? createFrameAnalyser({ sampleRate, range })
    const lowestHz = frequencyLimits(range).lowHz
    this.onsets = createOnsetTracker({ sampleRate, lowestHz, gate })
    this.notes = createNoteTracker({ sampleRate, range, hop: this.hop, window })
    this.notes.setGate(gate)
    this.ring = new SampleRing(window + 2 * ONSET_BLOCK)
    this.levelEvery = Math.round((LEVEL_EVERY_MS * sampleRate) / 1000)
  }

  setGate(gateDb: number): void {
    this.onsets.setGate(fromDb(gateDb))
    this.notes.setGate(fromDb(gateDb))
  }

  push(samples: Float32Array): DetectorEvent[] {
    const events: DetectorEvent[] = []
    const { ring, block, hop } = this
    for (const value of samples) {
      ring.write(value)
      block[this.filled] = value
      this.filled += 1
      this.level(value, events)
      if (this.filled === ONSET_BLOCK) {
        this.filled = 0
        this.endOfBlock(events)
      }
      if (ring.written % hop === 0) this.analyseNow(events)
    }
    return events
  }

  private ms(index: number): number {
    return (index * 1000) / this.sampleRate
  }

  private analyseNow(events: DetectorEvent[]) {
    const { segmentStart, hop, notes, range } = this
    const written = this.ring.written
    if (segmentStart === null) return
    const length = notes.frameLength(Math.floor((written - segmentStart) / hop) * hop)
    if (length < 2 * hop) return
    const reading = this.analyse(this.ring.frameOf(length), notes.soundingHz())
    const time = this.ms(written)
    if (reading) {
      const pitch = 69 + 12 * Math.log2(reading.frequency / range.referenceHz)
      events.push({ type: 'tuner', timeMs: time, pitch, ...reading })
    }
    const note = notes.frame(reading, written, this.envelope)
    if (note) {
      events.push({ type: 'note', ...note, name: pitchName(note.pitch) })
      this.onsets.follow(this.sampleRate / (range.referenceHz * 2 ** ((note.pitch - 69) / 12)))
    }
  }

  private level(value: number, events: DetectorEvent[]) {
    this.squares += value * value
    this.levelPeak = Math.max(this.levelPeak, Math.abs(value))
    const written = this.ring.written
    if (written % this.levelEvery !== 0) return
    const rmsDb = toDb(Math.sqrt(this.squares / this.levelEvery))
    events.push({ type: 'level', timeMs: this.ms(written), rmsDb, peakDb: toDb(this.levelPeak) })
    this.squares = 0
    this.levelPeak = 0
  }

  private endOfBlock(events: DetectorEvent[]) {
    const written = this.ring.written
    const { onset, quiet, ...result } = this.onsets.block(this.block, written)
    this.envelope = result.envelope
    if (onset !== null) {
      this.segmentStart = onset
      this.onsets.follow(null)
      this.notes.start(onset)
      events.push({ type: 'onset', timeMs: this.ms(onset), levelDb: toDb(this.envelope) })
    } else if (quiet && this.segmentStart !== null) {
      this.segmentStart = null
      this.onsets.follow(null)
      this.notes.stop()
      events.push({ type: 'silence', timeMs: this.ms(written) })
    }
  }
}
