// Window Cycle: the keys of a cycle played root to root inside a low/high window, up, down or
// alternating, each session continuing where the last one stopped.
import {
  cycleNotes,
  instrumentRange,
  keyCycleInWindow,
  pitchClassOf,
  scalePitchClasses,
  type CyclePosition,
  type WindowCycleOptions,
  lowestScaleTone,
  windowFromFrets,
  type PitchWindow,
  type ScaleTone,
  type WindowKey,
} from '../../theory'
import { cycleKeys, type CycleSettings, type CycleStop } from '../../contract/drills'
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
  /** The way this key goes: up (root to root above) or down (root to root below). */
  direction: 'up' | 'down'
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

/** The settings a cycle depends on; without a direction the theory core plays every key up. */
type CycleChoice = Pick<CycleSettings, 'low' | 'high' | 'scale' | 'cycle' | 'customTonics'> &
  Partial<Pick<CycleSettings, 'direction' | 'startTonic'>>

/** The theory core's options for these settings (a start key not in the cycle is left out). */
export function cycleOptions(settings: CycleChoice): WindowCycleOptions {
  const tonics = cycleKeys(settings)
  const start = settings.startTonic ?? null
  const inCycle = start !== null && tonics.some((t) => pitchClassOf(t) === pitchClassOf(start))
  return {
    low: settings.low,
    high: settings.high,
    scale: settings.scale,
    tonics,
    ...(settings.direction ? { direction: settings.direction } : {}),
    ...(inCycle ? { startTonic: start } : {}),
  }
}

/** Plays the cycle in the window; a window that cannot hold the keys gives the theory core's message. */
export function planCycle(settings: CycleChoice): CyclePlan {
  try {
    return { keys: keyCycleInWindow(cycleOptions(settings)), error: null }
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
 * Where a session continues after the last note played (its key found by pitch class in this
 * cycle); null — start at the start key — when there is none or its key is not in this cycle.
 */
export function positionAfter(
  options: WindowCycleOptions,
  stop: CycleStop | null,
): CyclePosition | null {
  if (!stop) return null
  const keyIndex = options.tonics.findIndex((t) => pitchClassOf(t) === pitchClassOf(stop.key))
  if (keyIndex < 0) return null
  const fromPosition = { keyIndex, noteIndex: stop.noteIndex, phase: stop.phase }
  try {
    return cycleNotes(options, { fromPosition, count: 1 }).nextPosition
  } catch (error) {
    if (error instanceof RangeError) return null // a stop these settings cannot place
    throw error
  }
}

/**
 * The questions of a session from `fromPosition` (else the start key): whole keys until at least
 * `questionCount` notes (a whole round of the cycle when the count is null), and where the next
 * session continues.
 */
export function cycleSession(
  options: WindowCycleOptions,
  fromPosition: CyclePosition | null,
  questionCount: number | null,
): { questions: CycleQuestion[]; nextPosition: CyclePosition } {
  const perKey = scalePitchClasses(options.tonics[0] ?? 'C', options.scale).length + 1
  const count = questionCount ?? options.tonics.length * perKey
  const { notes, nextPosition } = cycleNotes(options, { fromPosition, count, wholeKeys: true })
  let keyRun = -1
  const questions = notes.map((note, index): CycleQuestion => {
    if (index === 0 || note.noteIndex === 0) keyRun += 1
    const { tonic, degree, displaced, noteIndex, direction } = note
    return {
      key: String(index),
      expectedPitch: note.pitch,
      cell: null,
      tonic,
      scale: options.scale,
      degree,
      octave: note.octave,
      name: note.name,
      displaced,
      direction,
      keyIndex: keyRun,
      detail: { key: tonic, scale: options.scale, degree, displaced, noteIndex, phase: direction },
    }
  })
  return { questions, nextPosition }
}
