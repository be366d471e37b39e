// One naming rule per context: in a key the key's spelling, else the player's sharps or flats.
import { ScaleType } from 'tonal'
import { assertPitch } from './guard'
import { keyAlteration, type KeyRef } from './key'
import { pitchClassName, pitchClassOf, spellPitch } from './pitch'
import { resolveScale } from './scale'
import { chromaticSpelling, type ScaleDirection } from './scale-spelling'
import type { AccidentalPreference } from './types'

/**
 * Where a note is named: in a key (its spelling wins), else with the instrument's preference
 * (sharps by default); `withOctave: false` names the pitch class only.
 *
 * @example
 * const context: NamingContext = { key: { tonic: 'Eb', scale: 'major' }, prefer: 'sharp' }
 */
export interface NamingContext {
  key?: KeyRef | null
  prefer?: AccidentalPreference
  withOctave?: boolean
}

/**
 * Whether a key leans to sharps or flats, for naming notes that are not in its scale: flats when
 * its key signature has flats (G harmonic minor: G minor's two flats), else sharps (also for C
 * major and A minor).
 *
 * @example
 * accidentalPreferenceOf('Eb', 'minor') // 'flat'
 * accidentalPreferenceOf('E', 'major') // 'sharp'
 */
export function accidentalPreferenceOf(tonic: string, scale: string): AccidentalPreference {
  return keyAlteration(tonic, scale) < 0 ? 'flat' : 'sharp'
}

function pitchClassFrom(pitch: string | number): number {
  if (typeof pitch === 'string') return pitchClassOf(pitch)
  assertPitch(pitch)
  return pitch % 12
}

// A white key has its natural name only; a black key its sharp and its flat name.
function plainNames(pitchClass: number, prefer: AccidentalPreference): string[] {
  const sharp = pitchClassName(pitchClass, 'sharp')
  const flat = pitchClassName(pitchClass, 'flat')
  if (sharp === flat) return [sharp]
  return prefer === 'flat' ? [flat, sharp] : [sharp, flat]
}

// Outside a minor key, the raised 6th and 7th of its harmonic and melodic forms come first (C# in D minor).
function outsideKey(pitchClass: number, key: KeyRef): string[] {
  const names = plainNames(pitchClass, accidentalPreferenceOf(key.tonic, key.scale))
  if (!ScaleType.get(resolveScale(key.tonic, key.scale).scale).intervals.includes('3m'))
    return names
  const raised = ['harmonic minor', 'melodic minor']
    .flatMap((scale) => resolveScale(key.tonic, scale).names)
    .find((name) => names.includes(name) && pitchClassOf(name) === pitchClass)
  return raised ? [raised, ...names.filter((name) => name !== raised)] : names
}

/**
 * The pitch-class names a student may answer for a pitch (a MIDI number or a note name), the
 * preferred first. In a key, scale notes only with the key's spelling; other notes either
 * single-accidental name (C# or Db), white keys their natural name. Without a key, a white key its
 * natural name only, a black key its sharp and flat name (`prefer` first) — never B## or Fb.
 *
 * @example
 * acceptedNames(61, { tonic: 'D', scale: 'minor' }) // ['C#', 'Db'] (the raised 7th)
 * acceptedNames('Bb', { tonic: 'C', scale: 'major' }) // ['A#', 'Bb']
 * acceptedNames(66, { tonic: 'Gb', scale: 'major' }) // ['Gb']
 * acceptedNames(64) // ['E']
 */
export function acceptedNames(
  pitch: string | number,
  key?: KeyRef | null,
  prefer: AccidentalPreference = 'sharp',
): string[] {
  const pitchClass = pitchClassFrom(pitch)
  if (!key) return plainNames(pitchClass, prefer)
  const info = resolveScale(key.tonic, key.scale)
  if (info.scale === 'chromatic') {
    const down = resolveScale(key.tonic, key.scale, 'down')
    const index = info.pitchClasses.indexOf(pitchClass)
    return [...new Set([info.names[index] ?? '', down.names[index] ?? ''])]
  }
  const name = info.names[info.pitchClasses.indexOf(pitchClass)]
  return name === undefined ? outsideKey(pitchClass, key) : [name]
}

/**
 * Names a MIDI pitch for a context — the one rule prompts, summaries, lists and chips share: in a
 * key, its spelling (scale notes as the scale spells them, others as `acceptedNames` prefers);
 * without a key, with the preference given (sharps by default). Octave follows the letter (Cb3 =
 * 47) unless `withOctave` is false.
 *
 * @example
 * nameInContext(44, { key: { tonic: 'Eb', scale: 'major' } }) // 'Ab2'
 * nameInContext(44, { prefer: 'sharp' }) // 'G#2'
 * nameInContext(47, { key: { tonic: 'Gb', scale: 'major' }, withOctave: false }) // 'Cb'
 */
export function nameInContext(pitch: number, context: NamingContext = {}): string {
  assertPitch(pitch)
  const name = acceptedNames(pitch, context.key, context.prefer)[0] ?? pitchClassName(pitch)
  return context.withOctave === false ? name : spellPitch(pitch, name)
}

/**
 * Names a MIDI pitch as the current key spells it: scale tones with the scale's spelling (octave
 * following the letter, so Cb3 = 47), other pitches as `nameInContext` does in that key.
 *
 * @example
 * spellInKey(47, 'Gb', 'major') // 'Cb3'
 * spellInKey(42, 'Eb', 'major') // 'Gb2' (not in the scale; a flat key)
 */
export function spellInKey(pitch: number, tonic: string, scale: string): string {
  return nameInContext(pitch, { key: { tonic, scale } })
}

/**
 * The chromatic scale on a tonic, ascending from it, spelled with sharps going up and flats coming
 * down; with a key, the key's own notes keep the key's spelling (common practice).
 *
 * @example
 * chromaticPitchNames('Eb', { direction: 'up', key: { tonic: 'Eb', scale: 'major' } })
 * // ['Eb', 'E', 'F', 'F#', 'G', 'Ab', 'A', 'Bb', 'B', 'C', 'C#', 'D']
 */
export function chromaticPitchNames(
  tonic: string,
  options: { direction?: ScaleDirection; key?: KeyRef | null } = {},
): string[] {
  const start = resolveScale(tonic, 'chromatic').tonic
  const keep = options.key ? resolveScale(options.key.tonic, options.key.scale).names : []
  return chromaticSpelling(start, options.direction ?? 'up', keep)
}
