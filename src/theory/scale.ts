// Scales on the 18 key tonics, spelled in the key (scale-spelling), with degrees and pitch classes.
import { ScaleType } from 'tonal'
import { assertPitch } from './guard'
import { pitchClassOf, semitonesAboveC, toAscii } from './pitch'
import { TONICS } from './scale-data'
import { spellScale, type ScaleDirection } from './scale-spelling'

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

function buildScale(tonic: string, scale: string, direction: ScaleDirection): ScaleInfo {
  const names = spellScale(tonic, scale, direction)
  const pitchClasses = names.map(pitchClassOf)
  const root = pitchClasses[0] ?? 0
  const steps = pitchClasses.map((pitchClass) => (pitchClass - root + 12) % 12)
  return { tonic, scale, names, pitchClasses, steps, fromC: names.map(semitonesAboveC) }
}

const SCALE_CACHE = new Map<string, ScaleInfo>()

/**
 * Resolves a scale on a tonic once (validated, spelled, with pitch classes and semitone steps above
 * the tonic) and remembers it, so drills can ask again cheaply. The direction only changes the
 * chromatic scale's spelling (sharps up, flats down). Throws a RangeError for an unknown tonic or
 * scale.
 *
 * @example
 * resolveScale('Eb', 'minor').steps // [0, 2, 3, 5, 7, 8, 10]
 * resolveScale('C', 'chromatic', 'down').names[1] // 'Db'
 */
export function resolveScale(
  tonic: string,
  scale: string,
  direction: ScaleDirection = 'up',
): ScaleInfo {
  const name = tonicName(tonic)
  const type = scaleTypeName(scale)
  const key = `${name} ${type} ${type === 'chromatic' ? direction : 'up'}`
  const known = SCALE_CACHE.get(key)
  if (known) return known
  const built = buildScale(name, type, direction)
  SCALE_CACHE.set(key, built)
  return built
}

/**
 * Spells a scale on one of the 18 key tonics, ascending from the tonic: the diatonic modes and the
 * harmonic and melodic minors one letter per degree, other scales from their intervals (as tonal
 * does), the blue note with one accidental, never more than two accidentals on a name. The
 * chromatic scale takes sharps going up, flats coming down (`direction`, default up).
 *
 * @example
 * scalePitchNames('Eb', 'minor') // ['Eb', 'F', 'Gb', 'Ab', 'Bb', 'Cb', 'Db']
 * scalePitchNames('C', 'chromatic', 'down') // ['C', 'Db', 'D', 'Eb', 'E', 'F', 'Gb', 'G', 'Ab', 'A', 'Bb', 'B']
 */
export function scalePitchNames(
  tonic: string,
  scale: string,
  direction: ScaleDirection = 'up',
): string[] {
  return [...resolveScale(tonic, scale, direction).names]
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
