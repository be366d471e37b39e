// A spelled note name taken apart for notation: letter, alteration, octave (scientific pitch notation).
import { toAscii, type Instrument } from '../theory'

/**
 * A note name as notation needs it: step letter, alteration in semitones, octave number.
 *
 * @example
 * const parts: SpelledNote = { step: 'E', alter: -1, octave: 2 } // Eb2
 */
export interface SpelledNote {
  step: 'C' | 'D' | 'E' | 'F' | 'G' | 'A' | 'B'
  alter: number
  octave: number
}

const NAME = /^([A-G])(#{1,2}|b{1,2})?(-?\d+)$/

/**
 * Takes a spelled note name apart; the octave follows the letter, so "Cb3" is octave 3 (MIDI 47).
 * Throws a RangeError for anything but a note name with an octave.
 *
 * @example
 * spelledNote('Cb3') // { step: 'C', alter: -1, octave: 3 }
 * spelledNote('F##2') // { step: 'F', alter: 2, octave: 2 }
 */
export function spelledNote(name: string): SpelledNote {
  const match = NAME.exec(toAscii(name))
  if (!match) throw new RangeError(`"${name}" is not a note name with an octave, such as "Eb2".`)
  const [, step = 'C', accidentals = '', octave = '0'] = match
  const sign = accidentals.startsWith('#') ? 1 : -1
  return {
    step: step as SpelledNote['step'],
    alter: sign * accidentals.length,
    octave: Number(octave),
  }
}

/**
 * Bass and guitar parts are written an octave above they sound (common practice; any orchestration
 * handbook): the octaves to add to a sounding pitch to get the written one.
 *
 * @example
 * WRITTEN_OCTAVE_ABOVE.bass // 1
 */
export const WRITTEN_OCTAVE_ABOVE: Readonly<Record<Instrument, number>> = { bass: 1, guitar: 1 }

/**
 * Which instrument a tuning is for, for clefs and MIDI sounds: bass when the highest open string is
 * at most C3 (basses top out at G2 or C3; guitars, even baritones, go above).
 *
 * @example
 * instrumentOfTuning([28, 33, 38, 43]) // 'bass'
 * instrumentOfTuning([35, 40, 45, 50, 55, 59, 64]) // 'guitar'
 */
export function instrumentOfTuning(tuning: readonly number[]): Instrument {
  return Math.max(...tuning) <= 48 ? 'bass' : 'guitar'
}
