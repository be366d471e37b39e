// The pitches a detector listens for and the analysis sizes that follow from them: the window holds
// at least two periods of the lowest note (a quarter tone flat), the hop is about 5 ms.
import { pitchToFrequency } from '../theory/frequency'
import { parsePitch } from '../theory/pitch'

/** A pitch as a scientific pitch name ("E1", "F#3") or a MIDI number (28). */
export type PitchLike = string | number

export interface ListenRange {
  /** Lowest MIDI pitch that can sound (the lowest open string). */
  lowest: number
  /** Highest MIDI pitch that can sound. */
  highest: number
  /** A4 in hertz (ISO 16: 440). */
  referenceHz: number
}

/** Notes above the lowest that a range covers when no highest is given (four octaves). */
export const DEFAULT_SPAN = 48
/** How far outside the range (in semitones) a reading may lie: a string tuned a quarter tone low. */
export const RANGE_SLACK = 0.6
/** Periods of the lowest note the longest analysis window holds (two needed, a little spare). */
const WINDOW_PERIODS = 2.25

function toPitch(value: PitchLike, what: string): number {
  if (typeof value === 'string') return parsePitch(value)
  if (!Number.isInteger(value) || value < 0 || value > 127)
    throw new RangeError(`${what} must be a note name such as "E1" or a MIDI number 0–127.`)
  return value
}

/**
 * Reads `lowest`/`highest` (names or MIDI numbers) into a range; throws a RangeError a player can
 * read for a name that is not a note or a highest below the lowest.
 * @example resolveRange({ lowest: 'E1' }) // { lowest: 28, highest: 76, referenceHz: 440 }
 */
export function resolveRange(options: {
  lowest: PitchLike
  highest?: PitchLike
  referenceHz?: number
}): ListenRange {
  const lowest = toPitch(options.lowest, 'The lowest note')
  const highest =
    options.highest === undefined
      ? Math.min(127, lowest + DEFAULT_SPAN)
      : toPitch(options.highest, 'The highest note')
  if (highest < lowest) throw new RangeError('The highest note must not be below the lowest.')
  const referenceHz = options.referenceHz ?? 440
  if (!(referenceHz >= 400 && referenceHz <= 480))
    throw new RangeError('The reference pitch must be between 400 and 480 Hz.')
  return { lowest, highest, referenceHz }
}

/** Lowest and highest frequency a reading may have (the range widened by RANGE_SLACK). */
export function frequencyLimits(range: ListenRange): { lowHz: number; highHz: number } {
  return {
    lowHz: pitchToFrequency(range.lowest - RANGE_SLACK, range.referenceHz),
    highHz: pitchToFrequency(range.highest + RANGE_SLACK, range.referenceHz),
  }
}

/**
 * Samples between two analyses: a whole number of 128-sample render quanta, about 5 ms.
 * @example hopSize(48000) // 256
 */
export function hopSize(sampleRate: number): number {
  return 128 * Math.max(1, Math.round((sampleRate * 0.0053) / 128))
}

/**
 * The longest analysis window in samples: 2.25 periods of the lowest note a quarter tone flat,
 * rounded up to whole hops (E1 at 48 kHz: 2816 samples, 59 ms; B0: 3840 samples, 80 ms).
 * @example analysisWindow({ lowest: 28, highest: 67, referenceHz: 440 }, 48000) // 2816
 */
export function analysisWindow(range: ListenRange, sampleRate: number): number {
  const period = sampleRate / frequencyLimits(range).lowHz
  const hop = hopSize(sampleRate)
  return Math.ceil((WINDOW_PERIODS * period) / hop) * hop
}
