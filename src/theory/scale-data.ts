// Keys and scale names the app offers: the 30 major and minor keys and labels for tonal's scales.

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
 * The scales offered first in pickers, in teaching order; every other tonal scale is still allowed.
 *
 * @example
 * COMMON_SCALES[1] // 'minor'
 */
// prettier-ignore
export const COMMON_SCALES: readonly string[] = [
  'major', 'minor', 'harmonic minor', 'melodic minor', 'dorian', 'phrygian', 'lydian', 'mixolydian',
  'locrian', 'major pentatonic', 'minor pentatonic', 'minor blues', 'major blues', 'whole tone',
  'diminished', 'half-whole diminished', 'chromatic',
]

/**
 * Labels that say more than the tonal name; other scales are labelled by their capitalised name.
 *
 * @example
 * SCALE_LABELS['melodic minor'] // 'Melodic minor (ascending)'
 */
export const SCALE_LABELS: Readonly<Record<string, string>> = {
  major: 'Major (Ionian)',
  minor: 'Natural minor (Aeolian)',
  'melodic minor': 'Melodic minor (ascending)',
  'minor blues': 'Blues (minor)',
  'major blues': 'Blues (major)',
  diminished: 'Diminished (whole-half)',
  'half-whole diminished': 'Diminished (half-whole)',
}
