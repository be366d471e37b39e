// How each instrument is notated and heard in exports: clef, written octave, General MIDI program.
import type { Instrument } from '../theory'

/**
 * Notation and sound of an instrument's part. `transposeOctaves` and `clefOctaveChange` say how the
 * written octave (an octave above sounding, common practice for bass and guitar) is encoded.
 *
 * @example
 * INSTRUMENT_PARTS.bass.clef // { sign: 'F', line: 4 }
 */
export interface InstrumentPart {
  name: string
  abbreviation: string
  /** General MIDI program, 0-based as in a MIDI file (MusicXML writes it 1-based). */
  program: number
  clef: { sign: 'F' | 'G'; line: number }
  /** Octaves the clef's small 8 shifts (−1 = treble 8vb). */
  clefOctaveChange: number
  /** Octaves to add to a written pitch to get the sounding one (MusicXML <transpose>). */
  transposeOctaves: number
}

/**
 * Bass: plain bass clef, written an octave above sounding, so the part transposes (octave-change −1).
 * Guitar: treble clef with an 8 below, whose clef already says "an octave lower", so the encoded
 * pitches are the sounding ones. General MIDI (1-based) 34 = Electric Bass (finger), 28 = Electric
 * Guitar (clean).
 *
 * @example
 * INSTRUMENT_PARTS.guitar.clefOctaveChange // -1
 */
export const INSTRUMENT_PARTS: Readonly<Record<Instrument, InstrumentPart>> = {
  bass: {
    name: 'Electric Bass',
    abbreviation: 'Bass',
    program: 33,
    clef: { sign: 'F', line: 4 },
    clefOctaveChange: 0,
    transposeOctaves: -1,
  },
  guitar: {
    name: 'Electric Guitar',
    abbreviation: 'Gtr.',
    program: 27,
    clef: { sign: 'G', line: 2 },
    clefOctaveChange: -1,
    transposeOctaves: 0,
  },
}
