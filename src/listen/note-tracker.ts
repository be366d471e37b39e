// From frame readings to notes. After an onset, a verdict needs AGREE consecutive readings of one
// pitch. After the verdict the note is followed with a short window (4 of its periods): a move to
// a new steady pitch is a new note when it is quick (hammer-on, pull-off) or comes after the pitch
// was lost (the window straddled a re-pluck), and the same note when it glides (a slide); the
// same pitch coming back at full level after it was lost is the string plucked again; a move by a
// harmonic interval is the string's overtones taking over from a decaying fundamental.
import type { FrameReading } from './frame-analysis'
import type { ListenRange } from './pitch-range'

export interface TrackedNote {
  pitch: number
  cents: number
  onsetMs: number
  verdictMs: number
}

/** Consecutive agreeing readings before a verdict. */
export const AGREE = 3
/** A note without an onset must be steadier than a verdict after an onset: one reading more. */
const LEGATO_AGREE = AGREE + 1
/** Readings of one steady pitch stay this close (semitones). */
const STEADY = 0.12
/** Periods of the sounding note in the window that follows it. */
const FOLLOW_PERIODS = 4
/**
 * The pitch is lost (a break in the string's vibration: a re-pluck) when the readings stop for
 * this share of the follow window (the time the window takes to cross the break), at least 3.
 */
const GAP_SHARE = 0.6
/**
 * After a break the same pitch is a new pluck at this share of the note's peak level and this far
 * above the noise gate: a fading tail that flickers in and out of the noise is not.
 */
const REPLUCK_LEVEL = 0.4
const REPLUCK_ABOVE_GATE = 1.5
/** Moves by these intervals are overtones taking over from a decaying fundamental. */
const HARMONIC_MOVES = new Set([12, 19, 24])

interface Run {
  pitch: number
  count: number
  firstAt: number
  last: number
  afterGap: boolean
}

interface Sounding {
  pitch: number
  exact: number
  /** Time (sample index) of the last reading steady at this pitch. */
  steadyAt: number
  /** The highest input level since the note was heard. */
  peak: number
  /** Frames without a reading since the last reading. */
  gap: number
}

export interface NoteTrackerOptions {
  sampleRate: number
  range: ListenRange
  hop: number
  window: number
}

export function createNoteTracker(options: NoteTrackerOptions): NoteTracker {
  return new NoteTracker(options)
}

export class NoteTracker {
  private onsetAt: number | null = null
  private sounding: Sounding | null = null
  private run: Run | null = null
  private gate = 0

  constructor(private readonly options: NoteTrackerOptions) {}

  /** The noise gate (linear peak level) the input level is compared with. */
  setGate(value: number): void {
    this.gate = value
  }

  start(onset: number): void {
    this.onsetAt = onset
    this.sounding = null
    this.run = null
  }

  stop(): void {
    this.onsetAt = null
    this.sounding = null
    this.run = null
  }

  /** The frequency of the note sounding now (heard and followed), if any. */
  soundingHz(): number | undefined {
    const { sounding } = this
    return sounding ? this.options.range.referenceHz * 2 ** ((sounding.exact - 69) / 12) : undefined
  }

  /** How many samples the next frame should hold: all since the onset, or a note's follow window. */
  frameLength(available: number): number {
    const { sounding } = this
    return Math.min(available, sounding ? this.followLength(sounding.pitch) : this.options.window)
  }

  /** One frame's reading (null = no pitch) at absolute sample `at`, with the input level there. */
  frame(reading: FrameReading | null, at: number, level: number): TrackedNote | null {
    if (this.onsetAt === null) return null
    const { sounding } = this
    if (!reading) {
      this.run = null
      if (sounding) sounding.gap += 1
      return null
    }
    const exact = this.toPitch(reading.frequency)
    return sounding
      ? this.afterVerdict(sounding, exact, at, level)
      : this.afterOnset(exact, at, level)
  }

  private ms(index: number): number {
    return (index * 1000) / this.options.sampleRate
  }

  private toPitch(frequency: number): number {
    return 69 + 12 * Math.log2(frequency / this.options.range.referenceHz)
  }

  private extend(exact: number, at: number, afterGap = false): Run {
    const pitch = Math.round(exact)
    const { run } = this
    if (run && run.pitch === pitch && Math.abs(exact - run.last) < STEADY)
      return { ...run, count: run.count + 1, last: exact }
    return { pitch, count: 1, firstAt: at, last: exact, afterGap }
  }

  private heard(pitch: number, exact: number, onset: number, at: number, level: number) {
    this.sounding = { pitch, exact, steadyAt: at, peak: level, gap: 0 }
    this.run = null
    return { pitch, cents: (exact - pitch) * 100, onsetMs: this.ms(onset), verdictMs: this.ms(at) }
  }

  private afterOnset(exact: number, at: number, level: number): TrackedNote | null {
    const run = (this.run = this.extend(exact, at))
    return run.count >= AGREE ? this.heard(run.pitch, exact, this.onsetAt ?? at, at, level) : null
  }

  private followLength(pitch: number): number {
    const { sampleRate, range, hop, window } = this.options
    const period = sampleRate / (range.referenceHz * 2 ** ((pitch - 69) / 12))
    return Math.min(window, Math.max(2, Math.ceil((FOLLOW_PERIODS * period) / hop)) * hop)
  }

  private samePitch(note: Sounding, exact: number, at: number, level: number, afterGap: boolean) {
    const broken =
      afterGap && level >= REPLUCK_LEVEL * note.peak && level >= REPLUCK_ABOVE_GATE * this.gate
    if (broken || this.run?.afterGap) {
      this.run = this.extend(exact, at, broken)
      if (this.run.count >= AGREE)
        return this.heard(note.pitch, exact, note.steadyAt + this.options.hop, at, level)
      return null
    }
    Object.assign(note, { steadyAt: at, exact })
    this.run = null
    return null
  }

  private afterVerdict(note: Sounding, exact: number, at: number, level: number) {
    const { hop } = this.options
    const afterGap = note.gap >= Math.max(3, (GAP_SHARE * this.followLength(note.pitch)) / hop)
    note.gap = 0
    note.peak = Math.max(note.peak, level)
    if (Math.abs(exact - note.exact) < STEADY)
      return this.samePitch(note, exact, at, level, afterGap)
    const run = (this.run = this.extend(exact, at, afterGap))
    if (run.count < LEGATO_AGREE || run.pitch === note.pitch) return null
    if (HARMONIC_MOVES.has(Math.abs(run.pitch - note.pitch))) return null
    const quick = run.firstAt - note.steadyAt <= this.followLength(note.pitch) + 2 * hop
    if (quick || run.afterGap) return this.heard(run.pitch, exact, note.steadyAt + hop, at, level)
    // A slide: the same note, now sounding at its new pitch.
    this.sounding = { ...note, pitch: run.pitch, exact, steadyAt: at }
    this.run = null
    return null
  }
}
