// The neck as a grid: open strings plus frets give pitches (note at string s, fret f = open[s] + f).
import { assertPitch, assertWhole, MIDI_MAX } from './guard'
import { assertValidStrings, assertValidTuning, MAX_FRETS } from './tuning'
import type { PitchWindow, Position } from './types'

/**
 * A position together with the pitch it sounds.
 *
 * @example
 * const note: FrettedNote = { string: 1, fret: 12, pitch: 45 } // A2 on a bass's A string
 */
export interface FrettedNote extends Position {
  pitch: number
}

/**
 * Returns the MIDI pitch at a string (0 = lowest-pitched string) and fret (0 = open). Throws a
 * RangeError for a string the tuning does not have, a fret outside 0–30 or a note above MIDI 127.
 *
 * @example
 * noteAt([28, 33, 38, 43], 1, 12) // 45 (A2)
 */
export function noteAt(tuning: readonly number[], string: number, fret: number): number {
  assertValidStrings(tuning)
  assertWhole(string, 'String number', 0, tuning.length - 1)
  assertWhole(fret, 'Fret', 0, MAX_FRETS)
  const pitch = (tuning[string] ?? 0) + fret
  assertPitch(pitch, 'The fretted note')
  return pitch
}

/**
 * Lists every place a pitch can be played on an instrument with `frets` frets, by string (lowest
 * first) and then fret; empty when the pitch is out of reach.
 *
 * @example
 * positionsOf([28, 33, 38, 43], 24, 45) // [{ string: 0, fret: 17 }, { string: 1, fret: 12 }, { string: 2, fret: 7 }, { string: 3, fret: 2 }]
 */
export function positionsOf(tuning: readonly number[], frets: number, pitch: number): Position[] {
  assertValidTuning(tuning, frets)
  assertPitch(pitch)
  const positions: Position[] = []
  tuning.forEach((open, string) => {
    const fret = pitch - open
    if (fret >= 0 && fret <= frets) positions.push({ string, fret })
  })
  return positions
}

/**
 * Returns the instrument's range: from the lowest open string to the highest open string plus the
 * fret count.
 *
 * @example
 * instrumentRange([28, 33, 38, 43], 24) // { low: 28, high: 67 } (E1 to G4)
 */
export function instrumentRange(tuning: readonly number[], frets: number): PitchWindow {
  assertValidTuning(tuning, frets)
  return { low: Math.min(...tuning), high: Math.max(...tuning) + frets }
}

/**
 * Lists every position in a fret region [lowFret, highFret] with its pitch, string by string from
 * the lowest, then by fret (e.g. the blank region a Neck Recall drill asks about).
 *
 * @example
 * positionsInRegion([28, 33], 0, 1) // [{ string: 0, fret: 0, pitch: 28 }, { string: 0, fret: 1, pitch: 29 }, { string: 1, fret: 0, pitch: 33 }, { string: 1, fret: 1, pitch: 34 }]
 */
export function positionsInRegion(
  tuning: readonly number[],
  lowFret: number,
  highFret: number,
): FrettedNote[] {
  assertFretRegion(tuning, lowFret, highFret)
  return tuning.flatMap((open, string) =>
    Array.from({ length: highFret - lowFret + 1 }, (_, offset) => ({
      string,
      fret: lowFret + offset,
      pitch: open + lowFret + offset,
    })),
  )
}

/**
 * Throws a RangeError unless [lowFret, highFret] is a fret region (0 ≤ lowFret ≤ highFret ≤ 30)
 * on a valid tuning whose notes stay within MIDI 0–127.
 *
 * @example
 * assertFretRegion([28, 33, 38, 43], 5, 8) // passes
 */
export function assertFretRegion(
  tuning: readonly number[],
  lowFret: number,
  highFret: number,
): void {
  assertValidStrings(tuning)
  assertWhole(lowFret, 'The lowest fret', 0, MAX_FRETS)
  assertWhole(highFret, 'The highest fret', lowFret, MAX_FRETS)
  if (Math.max(...tuning) + highFret > MIDI_MAX) {
    throw new RangeError(`The highest string's fret ${highFret} goes above MIDI note ${MIDI_MAX}.`)
  }
}
