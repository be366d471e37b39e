// Grading "find this exact pitch on the neck" (Pitch Hunt, Range Runs, Octave Scatter, Window Cycle).
import {
  nameInContext,
  positionsOf,
  toUnicode,
  type AccidentalPreference,
  type KeyRef,
  type Position,
} from '../../theory'
import type { Grade } from './types'

export interface Neck {
  tuning: readonly number[]
  frets: number
  accidentals: AccidentalPreference
  /** The key notes are named in (nameInContext), when the drill plays in one. */
  key?: KeyRef | null
}

/** The neck with the drill's key (tonic and scale of its settings), for naming notes. */
export const keyed = <N extends Neck>(neck: N, settings: { tonic: string; scale: string }): N => ({
  ...neck,
  key: { tonic: settings.tonic, scale: settings.scale },
})

/** A pitch named for the drill: in its key, else with the instrument's accidentals ("B♭2"). */
export const nameOnNeck = (neck: Neck, pitch: number) =>
  toUnicode(nameInContext(pitch, { key: neck.key, prefer: neck.accidentals }))

/** A picked cell as the attempt stores it: "string:fret" (0 = lowest string). */
export const cellText = (cell: Position) => `${cell.string}:${cell.fret}`

export const sameCell = (a: Position, b: Position) => a.string === b.string && a.fret === b.fret

/** The place of a pitch nearest a picked cell (by fret distance, then string distance). */
export function nearestPlace(places: readonly Position[], pick: Position): Position | null {
  let best: Position | null = null
  let bestDistance = Infinity
  for (const place of places) {
    const distance = Math.abs(place.fret - pick.fret) * 10 + Math.abs(place.string - pick.string)
    if (distance < bestDistance) [best, bestDistance] = [place, distance]
  }
  return best
}

/** A cell the student picked on the board, with the pitch it sounds. */
export type PickedCell = Position & { pitch: number }

export interface LocateOptions {
  neck: Neck
  expectedPitch: number
  /** How the expected pitch is named in feedback (spelled in the key when the drill has one). */
  expectedName?: string
  pick: PickedCell
  /** The cell the question was drawn from, stored when the pick is wrong. */
  questionCell?: Position | null
}

/**
 * Grades one pick: right when the picked cell sounds exactly the expected pitch (octave included),
 * on any string. The attempt stores the picked cell when right; when wrong, the question's cell or
 * else the place of the expected pitch nearest the pick (the place the student should have found).
 */
export function gradeLocate(options: LocateOptions): Grade {
  const { neck, expectedPitch, pick } = options
  const places = positionsOf(neck.tuning, neck.frets, expectedPitch)
  const name = options.expectedName
    ? toUnicode(options.expectedName)
    : nameOnNeck(neck, expectedPitch)
  const correct = pick.pitch === expectedPitch
  const picked = nameOnNeck(neck, pick.pitch)
  const feedback = correct
    ? `Right: ${name}.`
    : `That is ${picked}; ${name} is ${describeMiss(pick.pitch, expectedPitch)}. It lives at the marked places.`
  return {
    correct,
    answer: cellText(pick),
    cell: correct
      ? { string: pick.string, fret: pick.fret }
      : (options.questionCell ?? nearestPlace(places, pick)),
    complete: true,
    counted: true,
    feedback,
    pick: { string: pick.string, fret: pick.fret },
    reveal: places,
    detail: {},
  }
}

/** "an octave lower", "2 semitones higher" … from the pick's point of view. */
export function describeMiss(picked: number, expected: number): string {
  const difference = expected - picked
  const direction = difference > 0 ? 'higher' : 'lower'
  const size = Math.abs(difference)
  if (size % 12 === 0)
    return size === 12 ? `an octave ${direction}` : `${size / 12} octaves ${direction}`
  return `${size} semitone${size === 1 ? '' : 's'} ${direction}`
}

/** The grade for "show me" on a locate question: a miss that reveals every place. */
export function revealLocate(neck: Neck, expectedPitch: number, expectedName?: string): Grade {
  const places = positionsOf(neck.tuning, neck.frets, expectedPitch)
  const name = expectedName ? toUnicode(expectedName) : nameOnNeck(neck, expectedPitch)
  return {
    correct: false,
    answer: '',
    cell: places[0] ?? null,
    complete: true,
    counted: true,
    feedback: `${name} lives at the marked places.`,
    reveal: places,
    detail: { revealed: true },
  }
}
