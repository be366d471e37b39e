// Which rendered sample plays a pitch, and how fast: pure arithmetic shared by the render script
// (scripts/render-samples.ts) and the Tone.js voice. 12-TET: a rate of 2^(semitones/12).
import { pitchToFrequency } from '../theory'

export type SampleVoice = 'bass' | 'guitar'

export interface SampleSet {
  /** General MIDI program (0-based) of FluidR3Mono rendered for this voice. */
  program: number
  /** MIDI pitches rendered, every 4 semitones, so no note is repitched by more than 2. */
  pitches: readonly number[]
  /** Seconds rendered per note (the note is released a little before the end). */
  seconds: number
}

const every4 = (low: number, high: number) =>
  Array.from({ length: Math.floor((high - low) / 4) + 1 }, (_, i) => low + 4 * i)

export const SAMPLE_SETS: Record<SampleVoice, SampleSet> = {
  // Fingered electric bass (GM 34, program 33): B0 (23) to G4 (67).
  bass: { program: 33, pitches: every4(23, 67), seconds: 1.6 },
  // Clean electric guitar (GM 28, program 27): B1 (35) to D#6 (87).
  guitar: { program: 27, pitches: every4(35, 87), seconds: 1.4 },
}

/** Where the app serves the rendered samples; files are named by MIDI pitch (28.mp3). */
export const SAMPLE_BASE_URL = '/samples'
export const SAMPLE_EXTENSION = 'mp3'
/** Past this many semitones a sample sounds unnatural; the synth voice plays instead. */
export const MAX_REPITCH = 6

/** The voice for a tuning: bass when the highest open string is below E3 (bass tops: G2, C3). */
export function voiceFor(tuning: readonly number[]): SampleVoice {
  return Math.max(...tuning) < 52 ? 'bass' : 'guitar'
}

/** The URLs Tone.Sampler loads for a voice, keyed by MIDI pitch. */
export function sampleUrls(voice: SampleVoice): Record<number, string> {
  return Object.fromEntries(
    SAMPLE_SETS[voice].pitches.map((pitch) => [pitch, `${pitch}.${SAMPLE_EXTENSION}`]),
  )
}

/**
 * The sample nearest a pitch (ties go to the lower sample), and the playback rate that makes it sound
 * at that pitch with A4 = referenceHz: 2^(semitones/12) · referenceHz/440.
 */
export function nearestSample(
  pitch: number,
  referenceHz: number,
  pitches: readonly number[],
): { samplePitch: number; semitones: number; playbackRate: number } {
  const samplePitch = pitches.reduce((best, candidate) =>
    Math.abs(candidate - pitch) < Math.abs(best - pitch) ? candidate : best,
  )
  const semitones = pitch - samplePitch
  return { samplePitch, semitones, playbackRate: 2 ** (semitones / 12) * (referenceHz / 440) }
}

/** The frequency to ask a voice for: the 12-TET pitch with A4 at the player's reference. */
export function playbackFrequency(pitch: number, referenceHz: number): number {
  return pitchToFrequency(pitch, referenceHz)
}

/** Where a sample is trimmed: this far before its onset, so the pluck's attack is kept whole. */
export const ONSET_PREROLL_S = 0.002

/**
 * The index of the first sample louder than `fraction` of the peak: where the note starts. MP3
 * encoding puts ~25 ms of silence (encoder delay) in front of every note and the SoundFont's attack
 * adds a few ms more; trimming to the onset makes a note sound when it is asked for.
 * @example onsetIndex(new Float32Array([0, 0.001, 0.5, -1])) // 2
 */
export function onsetIndex(samples: Float32Array, fraction = 0.01): number {
  let peak = 0
  for (const v of samples) peak = Math.max(peak, Math.abs(v))
  if (peak === 0) return 0
  const index = samples.findIndex((v) => Math.abs(v) > peak * fraction)
  return Math.max(0, index)
}
