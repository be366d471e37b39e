// How a scale is spelled on a tonic: letters for diatonic scales, intervals for the rest, never 𝄪♯.
import { Note, Scale, ScaleType } from 'tonal'
import { pitchClassName, pitchClassOf } from './pitch'

/**
 * Which way a scale is played; the chromatic scale is spelled with sharps going up, flats coming
 * down (common practice).
 *
 * @example
 * const direction: ScaleDirection = 'down'
 */
export type ScaleDirection = 'up' | 'down'

/** Most accidentals one name may carry (a double sharp or double flat). @example MAX_ACCIDENTALS // 2 */
export const MAX_ACCIDENTALS = 2

// The heptatonic scales written one letter per degree: the seven diatonic modes and the two minors.
const LETTER_PER_DEGREE = new Set([
  'major',
  'dorian',
  'phrygian',
  'lydian',
  'mixolydian',
  'minor',
  'locrian',
  'harmonic minor',
  'melodic minor',
])
// The blue notes: ♭5 of the minor blues, ♭3 of the major blues (common practice).
const BLUE_NOTES: Readonly<Record<string, readonly string[]>> = {
  'minor blues': ['5d'],
  'major blues': ['3m'],
  'composite blues': ['3m', '5d'],
}
const LETTERS = 'CDEFGAB'
const NATURAL_CHROMA = [0, 2, 4, 5, 7, 9, 11]

/**
 * How many accidentals a pitch-class name carries ("F##" 2, "Eb" 1, "C" 0).
 *
 * @example
 * accidentalsIn('Bbb') // 2
 */
export function accidentalsIn(name: string): number {
  return name.length - 1
}

/**
 * Names a pitch class on a given letter ("F" and 7 → "F##"), or undefined when that would need
 * more than two accidentals.
 *
 * @example
 * nameOnLetter(7, 'F') // 'F##'
 * nameOnLetter(7, 'A') // 'Abb'
 */
export function nameOnLetter(pitchClass: number, letter: string): string | undefined {
  const natural = NATURAL_CHROMA[LETTERS.indexOf(letter)] ?? 0
  const alteration = ((pitchClass - natural + 18) % 12) - 6
  if (Math.abs(alteration) > MAX_ACCIDENTALS) return undefined
  return `${letter}${(alteration > 0 ? '#' : 'b').repeat(Math.abs(alteration))}`
}

// Degree n takes the n-th letter from the tonic's (a rarer spelling past a double accidental).
function spellByLetters(tonic: string, pitchClasses: readonly number[]): string[] {
  const first = LETTERS.indexOf(tonic.charAt(0))
  return pitchClasses.map(
    (pitchClass, degree) =>
      nameOnLetter(pitchClass, LETTERS.charAt((first + degree) % 7)) ?? pitchClassName(pitchClass),
  )
}

// A blue note that would need a double flat takes the letter below instead: ♯4 for ♭5.
function singleAccidentalBlueNote(name: string): string {
  if (accidentalsIn(name) < 2) return name
  const below = LETTERS.charAt((LETTERS.indexOf(name.charAt(0)) + 6) % 7)
  return nameOnLetter(pitchClassOf(name), below) ?? name
}

/**
 * The chromatic scale on a tonic, ascending from it: the tonic and the notes in `keep` (a key's own
 * spelling) as given, the others with sharps when going up and flats when coming down.
 *
 * @example
 * chromaticSpelling('C', 'up') // ['C', 'C#', 'D', 'D#', 'E', 'F', 'F#', 'G', 'G#', 'A', 'A#', 'B']
 * chromaticSpelling('Eb', 'down', ['Eb', 'F', 'G', 'Ab', 'Bb', 'C', 'D'])[1] // 'E'
 */
export function chromaticSpelling(
  tonic: string,
  direction: ScaleDirection,
  keep: readonly string[] = [],
): string[] {
  const root = pitchClassOf(tonic)
  const kept = new Map(keep.map((name) => [pitchClassOf(name), name]))
  kept.set(root, tonic)
  return Array.from({ length: 12 }, (_, step) => {
    const pitchClass = (root + step) % 12
    return kept.get(pitchClass) ?? pitchClassName(pitchClass, direction === 'up' ? 'sharp' : 'flat')
  })
}

/**
 * Spells a scale (tonal's name) on a tonic, ascending: the diatonic modes and the harmonic and
 * melodic minors one letter per degree, other scales from their intervals as tonal does, the blue
 * note with one accidental, the chromatic scale by direction; no name carries more than two
 * accidentals (a rarer spelling of the same pitch replaces it).
 *
 * @example
 * spellScale('C', 'flamenco') // ['C', 'Db', 'Eb', 'E', 'F#', 'G', 'Bb']
 * spellScale('Eb', 'minor blues') // ['Eb', 'Gb', 'Ab', 'A', 'Bb', 'Db']
 */
export function spellScale(
  tonic: string,
  scale: string,
  direction: ScaleDirection = 'up',
): string[] {
  if (scale === 'chromatic') return chromaticSpelling(tonic, direction)
  const notes = Scale.get([tonic, scale]).notes
  if (LETTER_PER_DEGREE.has(scale)) return spellByLetters(tonic, notes.map(pitchClassOf))
  const blue = BLUE_NOTES[scale] ?? []
  const intervals = ScaleType.get(scale).intervals
  return notes.map((name, degree) => {
    const spelled = blue.includes(intervals[degree] ?? '') ? singleAccidentalBlueNote(name) : name
    return accidentalsIn(spelled) > MAX_ACCIDENTALS ? Note.simplify(spelled) : spelled
  })
}

/**
 * Whether a scale is written one letter per degree (the seven diatonic modes, harmonic and
 * melodic minor).
 *
 * @example
 * isLetterPerDegree('dorian') // true
 * isLetterPerDegree('flamenco') // false
 */
export function isLetterPerDegree(scale: string): boolean {
  return LETTER_PER_DEGREE.has(scale)
}
