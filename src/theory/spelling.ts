// Spelling pitches "in the current key": scale tones as the scale spells them, others by key signature.
import { assertPitch } from './guard'
import { pitchName, spellPitch } from './pitch'
import { resolveScale } from './scale'
import type { AccidentalPreference } from './types'

/**
 * Whether a key leans to sharps or flats, for naming notes that are not in its scale: flats when
 * the scale's spelling uses more flats than sharps (G harmonic minor: Bb, Eb against F#), else
 * sharps (also when it uses none, as in C major).
 *
 * @example
 * accidentalPreferenceOf('Eb', 'minor') // 'flat'
 * accidentalPreferenceOf('E', 'major') // 'sharp'
 */
export function accidentalPreferenceOf(tonic: string, scale: string): AccidentalPreference {
  const accidentals = [
    ...resolveScale(tonic, scale)
      .names.map((name) => name.slice(1))
      .join(''),
  ]
  const flats = accidentals.filter((sign) => sign === 'b').length
  return flats > accidentals.length - flats ? 'flat' : 'sharp'
}

/**
 * Names a MIDI pitch as the current key spells it: scale tones with the scale's spelling (octave
 * following the letter, so Cb3 = 47), other pitches with the key's sharps or flats.
 *
 * @example
 * spellInKey(47, 'Gb', 'major') // 'Cb3'
 * spellInKey(42, 'Eb', 'major') // 'Gb2' (not in the scale; a flat key)
 */
export function spellInKey(pitch: number, tonic: string, scale: string): string {
  assertPitch(pitch)
  const info = resolveScale(tonic, scale)
  const name = info.names[info.pitchClasses.indexOf(pitch % 12)]
  return name === undefined
    ? pitchName(pitch, accidentalPreferenceOf(tonic, scale))
    : spellPitch(pitch, name)
}
