// Window Cycle: the keys of a cycle played root to octave inside a low/high window.
import {
  instrumentRange,
  keyCycleInWindow,
  lowestScaleTone,
  windowFromFrets,
  type PitchWindow,
  type ScaleTone,
  type WindowKey,
} from '../../theory'
import { cycleKeys, type CycleSettings } from '../../contract/drills'
import type { DrillQuestion } from '../engine/types'

export interface CycleQuestion extends DrillQuestion {
  tonic: string
  scale: string
  /** 1-based; the closing octave of the tonic is degree 1 again (`octave` true). */
  degree: number
  octave: boolean
  /** Spelled in the key, with octave ("Gb2"). */
  name: string
  displaced: boolean
  /** Which key of the session (0-based). */
  keyIndex: number
}

export interface CycleNeck {
  tuning: readonly number[]
  frets: number
}

/** A first window for a new student: the first four frets of the neck, else the lowest octave. */
export function defaultWindow(neck: CycleNeck): PitchWindow {
  const frets = windowFromFrets({
    tuning: neck.tuning,
    lowFret: 0,
    highFret: Math.min(4, neck.frets),
  })
  const range = instrumentRange(neck.tuning, neck.frets)
  return frets.high - frets.low >= 11
    ? frets
    : { low: range.low, high: Math.min(range.high, range.low + 12) }
}

export type CyclePlan = { keys: WindowKey[]; error: null } | { keys: []; error: string }

/** Plays the cycle in the window; a window that cannot hold the keys gives the theory core's message. */
export function planCycle(
  settings: Pick<CycleSettings, 'low' | 'high' | 'scale' | 'cycle' | 'customTonics'>,
): CyclePlan {
  try {
    return {
      keys: keyCycleInWindow({
        low: settings.low,
        high: settings.high,
        scale: settings.scale,
        tonics: cycleKeys(settings),
      }),
      error: null,
    }
  } catch (error) {
    if (error instanceof RangeError) return { keys: [], error: error.message }
    throw error
  }
}

/** The key's lowest tone on this instrument and its degree (awkward keys start above the root). */
export function lowestToneOf(neck: CycleNeck, tonic: string, scale: string): ScaleTone {
  return lowestScaleTone(neck.tuning, neck.frets, tonic, scale)
}

/**
 * The questions of a session: whole keys in cycle order until at least `questionCount` notes
 * (the whole cycle when the count is null).
 */
export function cycleQuestions(
  keys: readonly WindowKey[],
  scale: string,
  questionCount: number | null,
): CycleQuestion[] {
  const questions: CycleQuestion[] = []
  for (const [keyIndex, key] of keys.entries()) {
    if (questionCount !== null && questions.length >= questionCount) break
    const size = key.pitches.length - 1
    key.pitches.forEach((pitch, index) => {
      const degree = (index % size) + 1
      const displaced = key.displaced[index] ?? false
      questions.push({
        key: `${keyIndex}:${index}`,
        expectedPitch: pitch,
        cell: null,
        tonic: key.tonic,
        scale,
        degree,
        octave: index === size,
        name: key.names[index] ?? '',
        displaced,
        keyIndex,
        detail: { key: key.tonic, scale, degree, displaced },
      })
    })
  }
  return questions
}
