// Written versus sounding pitch: bass and guitar parts are written an octave above sounding.
import { assertPitch } from './guard'
import type { Instrument } from './tuning-data'

/**
 * Semitones between written and sounding pitch per instrument: bass and guitar are written an
 * octave above where they sound (common practice; orchestration handbooks).
 *
 * @example
 * WRITTEN_TRANSPOSITION.bass // 12
 */
export const WRITTEN_TRANSPOSITION: Readonly<Record<Instrument, number>> = { bass: 12, guitar: 12 }

/**
 * The written pitch of a sounding MIDI pitch on an instrument (names elsewhere stay at sounding
 * pitch, in scientific pitch notation). Throws a RangeError for an unknown instrument or a written
 * pitch past MIDI 127.
 *
 * @example
 * writtenPitch(28, 'bass') // 40 (the open E1 string is written E2)
 * writtenPitch(40, 'guitar') // 52 (low E2 is written E3)
 */
export function writtenPitch(pitch: number, instrument: Instrument): number {
  assertPitch(pitch)
  const shift = (WRITTEN_TRANSPOSITION as Record<string, number | undefined>)[instrument]
  if (shift === undefined) {
    throw new RangeError(`"${String(instrument)}" is not an instrument kind; use bass or guitar.`)
  }
  assertPitch(pitch + shift, 'The written pitch')
  return pitch + shift
}
