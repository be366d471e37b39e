// One analysis frame → one pitch reading: pitchy's McLeod pitch method (MPM), then guards against
// octave errors and readings the frame is too short to support. Pure: runs in Node and a worklet.
import { PitchDetector } from 'pitchy'
import { frequencyLimits, type ListenRange } from './pitch-range'

export interface FrameReading {
  /** Fundamental frequency in hertz. */
  frequency: number
  /** MPM clarity (the normalized square difference at the period), 0–1. */
  clarity: number
}

export interface FrameAnalyserOptions {
  sampleRate: number
  range: ListenRange
  /** A reading below this clarity is no reading (noise, a chord, an attack). */
  minClarity?: number
}

/**
 * Analyses a frame (its length is the window: the samples since the onset, up to the longest).
 * `sounding` is the frequency of a note already heard: a reading that stays with it needs no octave
 * checks again (they were made for the verdict), which halves the work while a note rings.
 */
export type FrameAnalyser = (frame: Float32Array, sounding?: number) => FrameReading | null

export const MIN_CLARITY = 0.8
/** MPM's peak-picking constant k: the first key maximum at least k × the highest one. */
const PEAK_PICK = 0.9
/** A reading needs this many periods in its frame (one period cannot tell a pitch from noise). */
const MIN_PERIODS = 2
/**
 * A reading whose half lag still correlates this well is the octave above: the attack of some notes
 * holds a weak sub-octave that MPM locks onto (a true low note has odd partials and stays below).
 */
const OCTAVE_UP = 0.6
/** A reading this close (ratio) to the sounding note's frequency stays with it: a quarter tone. */
const SAME_NOTE = 2 ** (0.5 / 12)
/** The lag m·T is compared over at least this many periods of overlap. */
const CHECK_OVERLAP = 1
/**
 * The octave (or twelfth) below wins when its lag correlates better by this much: less would
 * override MPM's own choice for notes whose attack holds a weak sub-octave (some sampled basses).
 */
const SUBHARMONIC_MARGIN = 0.08

/** The normalized square difference function (MPM, eq. 9) at one whole-sample lag. */
export function nsdfAt(frame: Float32Array, lag: number): number {
  let acf = 0
  let energy = 0
  for (let j = 0; j + lag < frame.length; j += 1) {
    const a = frame[j] ?? 0
    const b = frame[j + lag] ?? 0
    acf += a * b
    energy += a * a + b * b
  }
  return energy > 0 ? (2 * acf) / energy : 0
}

/** The highest NSDF within two samples of a fractional lag, refined by a parabola. */
function nsdfPeak(frame: Float32Array, lag: number): number {
  const centre = Math.round(lag)
  let best = centre
  let bestValue = -Infinity
  for (let l = centre - 2; l <= centre + 2; l += 1) {
    const value = nsdfAt(frame, l)
    if (value > bestValue) [best, bestValue] = [l, value]
  }
  const [y0, y2] = [nsdfAt(frame, best - 1), nsdfAt(frame, best + 1)]
  const curve = y0 - 2 * bestValue + y2
  if (curve >= 0) return bestValue
  const shift = (0.5 * (y0 - y2)) / curve
  return bestValue - 0.25 * (y0 - y2) * shift
}

export function createFrameAnalyser(options: FrameAnalyserOptions): FrameAnalyser {
  const { sampleRate } = options
  const minClarity = options.minClarity ?? MIN_CLARITY
  const { lowHz, highHz } = frequencyLimits(options.range)
  const detectors = new Map<number, PitchDetector<Float32Array>>()

  function mpm(frame: Float32Array): [number, number] {
    let detector = detectors.get(frame.length)
    if (!detector) {
      detector = PitchDetector.forFloat32Array(frame.length)
      detector.clarityThreshold = PEAK_PICK
      detectors.set(frame.length, detector)
    }
    return detector.findPitch(frame, sampleRate)
  }

  // Below the range: MPM took a subharmonic; the octave above is the note if it correlates.
  function secondHarmonic(frame: Float32Array, frequency: number): FrameReading | null {
    const up = frequency * 2
    if (up < lowHz || up > highHz) return null
    const clarity = nsdfPeak(frame, sampleRate / up)
    return clarity >= minClarity ? { frequency: up, clarity } : null
  }

  // The second-harmonic check: the octave above, when its period fits the frame twice and correlates.
  function octaveAbove(frame: Float32Array, reading: FrameReading): FrameReading | null {
    const up = reading.frequency * 2
    if (up > highHz || frame.length < (MIN_PERIODS * sampleRate) / up) return null
    const clarity = nsdfPeak(frame, sampleRate / up)
    return clarity >= OCTAVE_UP ? { frequency: up, clarity } : null
  }

  // A note an octave (or a twelfth) below may sound with a weak fundamental: MPM then reports
  // its 2nd (3rd) harmonic. Its lag must correlate no better, else the lower note is taken;
  // `undefined` = the frame is still too short to rule the lower note out.
  function subharmonic(frame: Float32Array, reading: FrameReading): FrameReading | undefined {
    const period = sampleRate / reading.frequency
    for (const m of [2, 3]) {
      if (reading.frequency / m < lowHz) continue
      if (frame.length < (m + CHECK_OVERLAP) * period) return undefined
      const clarity = nsdfPeak(frame, m * period)
      if (clarity > reading.clarity + SUBHARMONIC_MARGIN)
        return subharmonic(frame, { frequency: reading.frequency / m, clarity })
    }
    return reading
  }

  return (frame, sounding) => {
    const [frequency, clarity] = mpm(frame)
    if (!(frequency > 0) || !Number.isFinite(frequency)) return null
    if (sounding && frequency < sounding * SAME_NOTE && frequency > sounding / SAME_NOTE)
      return clarity >= minClarity ? { frequency, clarity } : null
    let reading: FrameReading | null | undefined = { frequency, clarity }
    if (frequency < lowHz) reading = secondHarmonic(frame, frequency)
    if (!reading || reading.frequency > highHz) return null
    reading = octaveAbove(frame, reading) ?? subharmonic(frame, reading)
    if (!reading || reading.clarity < minClarity) return null
    if (frame.length < (MIN_PERIODS * sampleRate) / reading.frequency) return null
    return reading
  }
}
