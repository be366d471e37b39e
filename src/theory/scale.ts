// Scales on the 18 key tonics, spelled in the key (via tonal), with degrees and pitch classes.
import { Scale, ScaleType } from 'tonal'
import { assertPitch } from './guard'
import { pitchClassOf, semitonesAboveC, toAscii } from './pitch'
import { COMMON_SCALES, SCALE_LABELS, TONICS } from './scale-data'

const LETTERS = 'CDEFGAB'
const NATURAL_CHROMA = [0, 2, 4, 5, 7, 9, 11]

/**
 * A scale type the app supports: tonal's name, a label for pickers and its size.
 *
 * @example
 * SCALE_TYPES.find((type) => type.name === 'dorian')?.label // 'Dorian'
 */
export interface ScaleTypeInfo {
  name: string
  label: string
  noteCount: number
  common: boolean
  aliases: string[]
}

/**
 * A scale on a tonic: spelled pitch-class names, pitch classes, semitones above the tonic.
 *
 * @example
 * resolveScale('Gb', 'major').names // ['Gb', 'Ab', 'Bb', 'Cb', 'Db', 'Eb', 'F']
 */
export interface ScaleInfo {
  tonic: string
  scale: string
  names: readonly string[]
  pitchClasses: readonly number[]
  steps: readonly number[]
  /** Per degree, semitones above the C of the letter's octave ("Cb" −1, "B#" 12), for octaves. */
  fromC: readonly number[]
}

function labelOf(name: string): string {
  return SCALE_LABELS[name] ?? `${name.charAt(0).toUpperCase()}${name.slice(1)}`
}

function byTeachingOrder(a: string, b: string): number {
  const rank = (name: string) => COMMON_SCALES.indexOf(name) + 1 || COMMON_SCALES.length + 1
  return rank(a) - rank(b)
}

/**
 * Every scale type the app supports (all of tonal's), common ones first in teaching order, each
 * with a label for pickers, its note count and the other names tonal accepts for it.
 *
 * @example
 * SCALE_TYPES[0] // { name: 'major', label: 'Major (Ionian)', noteCount: 7, common: true, aliases: ['ionian'] }
 */
export const SCALE_TYPES: readonly ScaleTypeInfo[] = ScaleType.all()
  .map((type) => ({
    name: type.name,
    label: labelOf(type.name),
    noteCount: type.intervals.length,
    common: COMMON_SCALES.includes(type.name),
    aliases: [...type.aliases],
  }))
  .sort((a, b) => byTeachingOrder(a.name, b.name))

/**
 * Checks a tonic and returns it in canonical ASCII form (letter upper case, ♯/♭ accepted). Only the
 * 18 tonics of the 30 major and minor keys are allowed; anything else throws a RangeError.
 *
 * @example
 * tonicName('eb') // 'Eb'
 * tonicName('Fb') // RangeError: "Fb" is not a key tonic; use one of C, G, D, ...
 */
export function tonicName(tonic: string): string {
  if (TONICS.includes(tonic)) return tonic
  const ascii = toAscii(tonic.trim())
  const name = `${ascii.charAt(0).toUpperCase()}${ascii.slice(1)}`
  if (!TONICS.includes(name)) {
    throw new RangeError(`"${tonic}" is not a key tonic; use one of ${TONICS.join(', ')}.`)
  }
  return name
}

/**
 * Checks a scale name (tonal's names and aliases, any letter case) and returns tonal's canonical
 * name; an unknown name throws a RangeError.
 *
 * @example
 * scaleTypeName('Aeolian') // 'minor'
 * scaleTypeName('blues') // 'minor blues'
 */
export function scaleTypeName(scale: string): string {
  const type = ScaleType.get(scale.trim().toLowerCase())
  if (type.empty) {
    throw new RangeError(`"${scale}" is not a known scale; try major, minor, dorian or chromatic.`)
  }
  return type.name
}

// Seven-note scales use each letter once (degree n takes the n-th letter from the tonic's).
function spellByLetters(tonic: string, pitchClasses: readonly number[]): string[] {
  const first = LETTERS.indexOf(tonic.charAt(0))
  return pitchClasses.map((pitchClass, degree) => {
    const step = (first + degree) % 7
    const alteration = ((pitchClass - (NATURAL_CHROMA[step] ?? 0) + 18) % 12) - 6
    return `${LETTERS.charAt(step)}${(alteration > 0 ? '#' : 'b').repeat(Math.abs(alteration))}`
  })
}

function buildScale(tonic: string, scale: string): ScaleInfo {
  const tonalNames = Scale.get([tonic, scale]).notes
  const pitchClasses = tonalNames.map(pitchClassOf)
  const letters = new Set(tonalNames.map((name) => name.charAt(0)))
  const names =
    tonalNames.length === 7 && letters.size < 7 ? spellByLetters(tonic, pitchClasses) : tonalNames
  const root = pitchClasses[0] ?? 0
  const steps = pitchClasses.map((pitchClass) => (pitchClass - root + 12) % 12)
  return { tonic, scale, names, pitchClasses, steps, fromC: names.map(semitonesAboveC) }
}

const SCALE_CACHE = new Map<string, ScaleInfo>()

/**
 * Resolves a scale on a tonic once (validated, spelled, with pitch classes and semitone steps above
 * the tonic) and remembers it, so drills can ask again cheaply. Throws a RangeError for an unknown
 * tonic or scale.
 *
 * @example
 * resolveScale('Eb', 'minor').steps // [0, 2, 3, 5, 7, 8, 10]
 */
export function resolveScale(tonic: string, scale: string): ScaleInfo {
  const name = tonicName(tonic)
  const type = scaleTypeName(scale)
  const key = `${name} ${type}`
  const known = SCALE_CACHE.get(key)
  if (known) return known
  const built = buildScale(name, type)
  SCALE_CACHE.set(key, built)
  return built
}

/**
 * Spells a scale on one of the 18 key tonics as tonal does, ascending from the tonic, with each
 * letter used once in seven-note scales.
 *
 * @example
 * scalePitchNames('Eb', 'minor') // ['Eb', 'F', 'Gb', 'Ab', 'Bb', 'Cb', 'Db']
 */
export function scalePitchNames(tonic: string, scale: string): string[] {
  return [...resolveScale(tonic, scale).names]
}

/**
 * The pitch classes (0 = C … 11 = B) of a scale, in scale order from the tonic.
 *
 * @example
 * scalePitchClasses('D', 'major') // [2, 4, 6, 7, 9, 11, 1]
 */
export function scalePitchClasses(tonic: string, scale: string): number[] {
  return [...resolveScale(tonic, scale).pitchClasses]
}

/**
 * The scale degree (1-based) of a MIDI pitch in a key, or null when the pitch is not in the scale.
 *
 * @example
 * scaleDegreeOf(29, 'Eb', 'minor') // 2 (F)
 * scaleDegreeOf(28, 'Eb', 'minor') // null (E natural)
 */
export function scaleDegreeOf(pitch: number, tonic: string, scale: string): number | null {
  assertPitch(pitch)
  const index = resolveScale(tonic, scale).pitchClasses.indexOf(pitch % 12)
  return index === -1 ? null : index + 1
}

/**
 * Names a pitch as degree `index` (0-based, wrapping past the octave) of a resolved scale, octave
 * number following the letter; the pitch must have that degree's pitch class.
 *
 * @example
 * spellScaleTone(resolveScale('Gb', 'major'), 3, 47) // 'Cb3'
 */
export function spellScaleTone(info: ScaleInfo, index: number, pitch: number): string {
  const degree = index % info.names.length
  return `${info.names[degree] ?? ''}${(pitch - (info.fromC[degree] ?? 0)) / 12 - 1}`
}
