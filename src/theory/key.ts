// Key signatures of scales on a tonic, theoretical keys and their enharmonic alternatives.
import { Key, Mode } from 'tonal'
import { pitchClassOf } from './pitch'
import { resolveScale, scaleTypeName, tonicName } from './scale'
import { signatureFamilyOf } from './scale-catalog'
import { TONICS } from './scale-data'
import { accidentalsIn } from './scale-spelling'

/** Most sharps or flats a real key signature carries. @example MAX_SIGNATURE // 7 */
export const MAX_SIGNATURE = 7

/**
 * A key as the app names it: one of the 18 tonics and a scale.
 *
 * @example
 * const dMinor: KeyRef = { tonic: 'D', scale: 'minor' }
 */
export interface KeyRef {
  tonic: string
  scale: string
}

/**
 * What a key's signature holds: `alteration` counts sharps (positive) or flats (negative), a double
 * sharp counting twice; `accidentals` is its size. A key past 7 is theoretical, and `enharmonic`
 * then names the same-sounding tonic whose key has fewer accidentals.
 *
 * @example
 * keyInfo('D#', 'major') // { tonic: 'D#', scale: 'major', alteration: 9, accidentals: 9, theoretical: true, enharmonic: { tonic: 'Eb', alteration: -3, accidentals: 3 } }
 */
export interface KeyInfo extends KeyRef {
  alteration: number
  accidentals: number
  theoretical: boolean
  enharmonic?: { tonic: string; alteration: number; accidentals: number }
}

function ownAlteration(tonic: string, scale: string): number {
  return resolveScale(tonic, scale).names.reduce((sum, name) => {
    const sign = name.includes('#') ? 1 : -1
    return sum + sign * accidentalsIn(name)
  }, 0)
}

/**
 * The signed key signature a scale is written with (sharps positive, flats negative): a mode takes
 * its parent major key's, harmonic and melodic minor the natural minor's, pentatonics and blues the
 * major or minor key's; other scales count their own spelling (tonal Key and Mode).
 *
 * @example
 * keyAlteration('D', 'dorian') // 0 (C major's)
 * keyAlteration('G#', 'melodic minor') // 5 (G# minor's five sharps, not its spelling's F##)
 */
export function keyAlteration(tonic: string, scale: string): number {
  const name = tonicName(tonic)
  const type = scaleTypeName(scale)
  const family = signatureFamilyOf(type)
  const major = Key.majorKey(name).alteration
  if (family === 'mode') return major - Mode.get(type).alt
  if (family === 'major') return major
  if (family === 'minor') return Key.minorKey(name).alteration
  return ownAlteration(name, type)
}

/**
 * Describes a key's signature and marks it theoretical (more than 7 sharps or flats, as D# major's
 * 9 sharps or Gb minor's 9 flats), offering the enharmonic tonic with fewer accidentals.
 *
 * @example
 * keyInfo('Gb', 'minor').enharmonic?.tonic // 'F#'
 * keyInfo('Eb', 'minor').theoretical // false (6 flats)
 */
export function keyInfo(tonic: string, scale: string): KeyInfo {
  const name = tonicName(tonic)
  const type = scaleTypeName(scale)
  const alteration = keyAlteration(name, type)
  const accidentals = Math.abs(alteration)
  const info = { tonic: name, scale: type, alteration, accidentals }
  if (accidentals <= MAX_SIGNATURE) return { ...info, theoretical: false }
  const other = TONICS.filter((candidate) => candidate !== name)
    .filter((candidate) => pitchClassOf(candidate) === pitchClassOf(name))
    .map((candidate) => ({ tonic: candidate, alteration: keyAlteration(candidate, type) }))
    .map((candidate) => ({ ...candidate, accidentals: Math.abs(candidate.alteration) }))
    .sort((a, b) => a.accidentals - b.accidentals)[0]
  return other && other.accidentals < accidentals
    ? { ...info, theoretical: true, enharmonic: other }
    : { ...info, theoretical: true }
}
