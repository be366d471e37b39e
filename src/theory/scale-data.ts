// Keys and scale names the app offers: the 30 major and minor keys and the curated scale names.
import { CURATED_SCALES } from './scale-catalog-data'

/**
 * The 15 major keys, C first, then the sharp keys (1–7 sharps) and the flat keys (1–7 flats).
 *
 * @example
 * MAJOR_KEY_TONICS[7] // 'C#' (7 sharps)
 */
export const MAJOR_KEY_TONICS: readonly string[] = 'C G D A E B F# C# F Bb Eb Ab Db Gb Cb'.split(
  ' ',
)

/**
 * The 15 minor keys in the same order as their relative majors (A minor shares C major's notes).
 *
 * @example
 * MINOR_KEY_TONICS[7] // 'A#' (7 sharps)
 */
export const MINOR_KEY_TONICS: readonly string[] = 'A E B F# C# G# D# A# D G C F Bb Eb Ab'.split(
  ' ',
)

/**
 * The 18 tonic names the 30 major and minor keys use; any scale may be built on any of them.
 *
 * @example
 * TONICS.includes('G#') // true (G# minor); TONICS.includes('Fb') // false
 */
export const TONICS: readonly string[] = 'C G D A E B F# C# F Bb Eb Ab Db Gb Cb G# D# A#'.split(' ')

/**
 * The scales offered first in pickers (the curated list), in teaching order; every other tonal
 * scale is still allowed, under "More scales".
 *
 * @example
 * COMMON_SCALES[1] // 'dorian'
 */
export const COMMON_SCALES: readonly string[] = CURATED_SCALES.map((scale) => scale.name)
