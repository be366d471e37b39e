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

export function createNoteTracker(options: {
  sampleRate: number
  range: ListenRange
  hop: number
  window: number
}) {
  const { sampleRate, hop, window } = options
  const ms = (index: number) => (index * 1000) / sampleRate
  const toPitch = (frequency: number) => 69 + 12 * Math.log2(frequency / options.range.referenceHz)
  let start: number | null = null
  let sounding: Sounding | null = null
  let run: Run | null = null
  let gate = 0

  function extend(exact: number, at: number, afterGap = false): Run {
    const pitch = Math.round(exact)
    if (run && run.pitch === pitch && Math.abs(exact - run.last) < STEADY)
      return { ...run, count: run.count + 1, last: exact }
    return { pitch, count: 1, firstAt: at, last: exact, afterGap }
  }

  function heard(pitch: number, exact: number, onset: number, at: number, level: number) {
    sounding = { pitch, exact, steadyAt: at, peak: level, gap: 0 }
    run = null
    return { pitch, cents: (exact - pitch) * 100, onsetMs: ms(onset), verdictMs: ms(at) }
  }

  function afterOnset(exact: number, at: number, level: number): TrackedNote | null {
    run = extend(exact, at)
    return run.count >= AGREE ? heard(run.pitch, exact, start ?? at, at, level) : null
  }

  function followLength(pitch: number): number {
    const period = sampleRate / (options.range.referenceHz * 2 ** ((pitch - 69) / 12))
    return Math.min(window, Math.max(2, Math.ceil((FOLLOW_PERIODS * period) / hop)) * hop)
  }

  function samePitch(note: Sounding, exact: number, at: number, level: number, afterGap: boolean) {
    const broken =
      afterGap && level >= REPLUCK_LEVEL * note.peak && level >= REPLUCK_ABOVE_GATE * gate
    if (broken || run?.afterGap) {
      run = extend(exact, at, broken)
      if (run.count >= AGREE) return heard(note.pitch, exact, note.steadyAt + hop, at, level)
      return null
    }
    Object.assign(note, { steadyAt: at, exact })
    run = null
    return null
  }

  function afterVerdict(note: Sounding, exact: number, at: number, level: number) {
    const afterGap = note.gap >= Math.max(3, (GAP_SHARE * followLength(note.pitch)) / hop)
    note.gap = 0
    note.peak = Math.max(note.peak, level)
    if (Math.abs(exact - note.exact) < STEADY) return samePitch(note, exact, at, level, afterGap)
    run = extend(exact, at, afterGap)
    if (run.count < LEGATO_AGREE || run.pitch === note.pitch) return null
    if (HARMONIC_MOVES.has(Math.abs(run.pitch - note.pitch))) return null
    const quick = run.firstAt - note.steadyAt <= followLength(note.pitch) + 2 * hop
    if (quick || run.afterGap) return heard(run.pitch, exact, note.steadyAt + hop, at, level)
    // A slide: the same note, now sounding at its new pitch.
    sounding = { ...note, pitch: run.pitch, exact, steadyAt: at }
    run = null
    return null
  }

  return {
    /** The noise gate (linear peak level) the input level is compared with. */
    setGate: (value: number) => void (gate = value),
    start(onset: number) {
      start = onset
      sounding = null
      run = null
    },
    stop() {
      start = null
      sounding = null
      run = null
    },
    /** The frequency of the note sounding now (heard and followed), if any. */
    soundingHz: () =>
      sounding ? options.range.referenceHz * 2 ** ((sounding.exact - 69) / 12) : undefined,
    /** How many samples the next frame should hold: all since the onset, or a note's follow window. */
    frameLength(available: number): number {
      return Math.min(available, sounding ? followLength(sounding.pitch) : window)
    },
    /** One frame's reading (null = no pitch) at absolute sample `at`, with the input level there. */
    frame(reading: FrameReading | null, at: number, level: number): TrackedNote | null {
      if (start === null) return null
      if (!reading) {
        run = null
        if (sounding) sounding.gap += 1
        return null
      }
      const exact = toPitch(reading.frequency)
      return sounding ? afterVerdict(sounding, exact, at, level) : afterOnset(exact, at, level)
    },
  }
}
