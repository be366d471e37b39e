// Pitches as MIDI numbers (C4 = 60) and their ASCII names in scientific pitch notation.
import { assertPitch, MIDI_MAX, MIDI_MIN } from './guard'
import type { AccidentalPreference } from './types'

const LETTER_CHROMA: Readonly<Record<string, number>> = {
  C: 0,
  D: 2,
  E: 4,
  F: 5,
  G: 7,
  A: 9,
  B: 11,
}
const SHARP_NAMES = ['C', 'C#', 'D', 'D#', 'E', 'F', 'F#', 'G', 'G#', 'A', 'A#', 'B']
const FLAT_NAMES = ['C', 'Db', 'D', 'Eb', 'E', 'F', 'Gb', 'G', 'Ab', 'A', 'Bb', 'B']
const NOTE_PATTERN = /^([A-Ga-g])(#*|b*)(-?\d+)?$/
const UNICODE_TO_ASCII: ReadonlyArray<[string, string]> = [
  ['𝄪', '##'],
  ['𝄫', 'bb'],
  ['♯', '#'],
  ['♭', 'b'],
]

interface NoteParts {
  letter: string
  alteration: number
  octave: number | undefined
}

function splitNote(name: string): NoteParts | undefined {
  const match = NOTE_PATTERN.exec(toAscii(name))
  if (!match) return undefined
  const [, letter = 'C', accidentals = '', octave] = match
  const sign = accidentals.startsWith('#') ? 1 : -1
  return {
    letter: letter.toUpperCase(),
    alteration: sign * accidentals.length,
    octave: octave === undefined ? undefined : Number(octave),
  }
}

function mod12(value: number): number {
  return ((value % 12) + 12) % 12
}

/**
 * Parses an ASCII note name with an octave in scientific pitch notation into a MIDI number. The
 * octave number follows the letter, so "Cb3" is 47 and "B#3" is 60; the letter may be lower case and
 * ♯/♭ glyphs are accepted. Throws a RangeError for anything else or a note outside MIDI 0–127.
 *
 * @example
 * parsePitch('Eb1') // 27
 * parsePitch('Cb3') // 47
 * parsePitch('B#3') // 60
 */
export function parsePitch(name: string): number {
  const parts = splitNote(name)
  if (!parts || parts.octave === undefined) {
    throw new RangeError(`"${name}" is not a note name with an octave, such as "Eb1" or "F#3".`)
  }
  const pitch = 12 * (parts.octave + 1) + (LETTER_CHROMA[parts.letter] ?? 0) + parts.alteration
  if (pitch < MIDI_MIN || pitch > MIDI_MAX) {
    throw new RangeError(`"${name}" is outside the MIDI range C-1 to G9.`)
  }
  return pitch
}

/**
 * Returns the pitch class (0 = C … 11 = B) of a note name with or without an octave, e.g. for a
 * fretboard label or a typed answer. Throws a RangeError when the text is not a note name.
 *
 * @example
 * pitchClassOf('Eb') // 3
 * pitchClassOf('B#3') // 0
 */
export function pitchClassOf(name: string): number {
  const parts = splitNote(name)
  if (!parts) throw new RangeError(`"${name}" is not a note name, such as "Eb" or "F#3".`)
  return mod12((LETTER_CHROMA[parts.letter] ?? 0) + parts.alteration)
}

/**
 * Names a pitch class (0 = C … 11 = B) with sharps (the default) or flats; whole numbers outside
 * 0–11 wrap around the octave.
 *
 * @example
 * pitchClassName(6) // 'F#'
 * pitchClassName(6, 'flat') // 'Gb'
 */
export function pitchClassName(pitchClass: number, prefer: AccidentalPreference = 'sharp'): string {
  if (!Number.isInteger(pitchClass)) {
    throw new RangeError(`Pitch class must be a whole number; got ${String(pitchClass)}.`)
  }
  const names = prefer === 'flat' ? FLAT_NAMES : SHARP_NAMES
  return names[mod12(pitchClass)] ?? 'C'
}

/**
 * Names a MIDI pitch in ASCII scientific pitch notation, with sharps (the default) or flats for
 * the black keys. Use `spellPitch` or `spellInKey` when the key decides the spelling.
 *
 * @example
 * pitchName(54) // 'F#3'
 * pitchName(54, 'flat') // 'Gb3'
 */
export function pitchName(pitch: number, prefer: AccidentalPreference = 'sharp'): string {
  assertPitch(pitch)
  return `${pitchClassName(pitch, prefer)}${Math.floor(pitch / 12) - 1}`
}

/**
 * How many semitones a pitch-class name lies above the C of its letter's octave, not wrapped:
 * "Cb" is −1 and "B#" is 12. Adding it to a C gives the spelled note in the same octave number.
 *
 * @example
 * semitonesAboveC('Eb') // 3
 * semitonesAboveC('Cb') // -1
 */
export function semitonesAboveC(pitchClass: string): number {
  const parts = splitNote(pitchClass)
  if (!parts || parts.octave !== undefined) {
    throw new RangeError(`"${pitchClass}" is not a pitch-class name, such as "Eb" or "F#".`)
  }
  return (LETTER_CHROMA[parts.letter] ?? 0) + parts.alteration
}

/**
 * Spells a MIDI pitch with a given pitch-class name, working out the octave from the letter (so
 * 47 spelled as "Cb" is "Cb3"). Throws a RangeError when the name is not that pitch's class.
 *
 * @example
 * spellPitch(47, 'Cb') // 'Cb3'
 * spellPitch(60, 'B#') // 'B#3'
 */
export function spellPitch(pitch: number, pitchClass: string): string {
  assertPitch(pitch)
  const fromC = pitch - semitonesAboveC(pitchClass)
  if (mod12(fromC) !== 0)
    throw new RangeError(`${pitchName(pitch)} cannot be spelled as ${pitchClass}.`)
  const ascii = toAscii(pitchClass)
  return `${ascii.charAt(0).toUpperCase()}${ascii.slice(1)}${fromC / 12 - 1}`
}

/**
 * Reads a note name typed by a student as an answer (case-insensitive, # or b or ♯/♭, spaces
 * around it ignored) and returns its pitch class. Throws a RangeError with a hint otherwise.
 *
 * @example
 * pitchClassFromAnswer('c#') // 1
 * pitchClassFromAnswer(' DB ') // 1
 */
export function pitchClassFromAnswer(text: string): number {
  const match = /^([a-g])(#{1,2}|b{1,2})?$/i.exec(toAscii(text.trim()))
  if (!match) {
    throw new RangeError(`"${text}" is not a note name: type a letter A–G, then # or b if needed.`)
  }
  const [, letter = 'C', accidentals = ''] = match
  const sign = accidentals.startsWith('#') ? 1 : -1
  return mod12((LETTER_CHROMA[letter.toUpperCase()] ?? 0) + sign * accidentals.length)
}

/**
 * Renders the ASCII note names in a text with music glyphs (♯ ♭ 𝄪 𝄫) for display; everything
 * else is left as it is.
 *
 * @example
 * toUnicode('F#3') // 'F♯3'
 * toUnicode('Eb minor') // 'E♭ minor'
 */
export function toUnicode(text: string): string {
  return text.replace(
    /\b([A-G])(#+|b+)(?![A-Za-z])/g,
    (_match, letter: string, accidentals: string) => {
      const glyph = accidentals.startsWith('#') ? ['𝄪', '♯'] : ['𝄫', '♭']
      const pairs = glyph[0]?.repeat(Math.floor(accidentals.length / 2)) ?? ''
      return `${letter}${pairs}${accidentals.length % 2 ? glyph[1] : ''}`
    },
  )
}

/**
 * Turns music glyphs (♯ ♭ 𝄪 𝄫) back into ASCII accidentals, e.g. before parsing pasted text.
 *
 * @example
 * toAscii('E♭1') // 'Eb1'
 * toAscii('F𝄪') // 'F##'
 */
export function toAscii(text: string): string {
  if (!/[^\x20-\x7e]/.test(text)) return text
  return UNICODE_TO_ASCII.reduce((result, [glyph, ascii]) => result.split(glyph).join(ascii), text)
}
