// The scales the trade practises, with their trade names, groups and key-signature families.

/**
 * Where a scale sits in pickers: the curated groups first, every other tonal scale under "more".
 *
 * @example
 * const group: ScaleGroupId = 'modes'
 */
export type ScaleGroupId = 'modes' | 'minor' | 'pentatonic-blues' | 'symmetric' | 'colour' | 'more'

/**
 * Which key signature a scale is written with: a mode takes its parent major key's, a major or
 * minor scale the tonic's major or natural-minor key's, `own` counts the scale's own accidentals.
 *
 * @example
 * const family: SignatureFamily = 'minor' // harmonic minor is written with the natural minor's signature
 */
export type SignatureFamily = 'mode' | 'major' | 'minor' | 'own'

/**
 * One curated scale: tonal's name, the trade's name for pickers, its group and signature family.
 *
 * @example
 * CURATED_SCALES[0] // { name: 'major', label: 'Major (Ionian)', group: 'modes', family: 'mode' }
 */
export interface CuratedScale {
  name: string
  label: string
  group: Exclude<ScaleGroupId, 'more'>
  family: SignatureFamily
}

/**
 * The picker groups in display order, with their headings.
 *
 * @example
 * SCALE_GROUPS.at(-1) // { id: 'more', label: 'More scales' }
 */
export const SCALE_GROUPS: readonly { id: ScaleGroupId; label: string }[] = [
  { id: 'modes', label: 'Major and its modes' },
  { id: 'minor', label: 'Minor scales' },
  { id: 'pentatonic-blues', label: 'Pentatonic and blues' },
  { id: 'symmetric', label: 'Symmetric and chromatic' },
  { id: 'colour', label: 'Jazz and colour scales' },
  { id: 'more', label: 'More scales' },
]

const entry = (
  name: string,
  label: string,
  group: CuratedScale['group'],
  family: SignatureFamily,
): CuratedScale => ({ name, label, group, family })

/**
 * The scales bass and guitar teachers assign, in teaching order, named as the trade names them
 * (modes by their Greek names, the minors by their common names; common practice).
 *
 * @example
 * CURATED_SCALES.find((scale) => scale.name === 'half-whole diminished')?.label // 'Diminished, half-whole (dominant)'
 */
export const CURATED_SCALES: readonly CuratedScale[] = [
  entry('major', 'Major (Ionian)', 'modes', 'mode'),
  entry('dorian', 'Dorian', 'modes', 'mode'),
  entry('phrygian', 'Phrygian', 'modes', 'mode'),
  entry('lydian', 'Lydian', 'modes', 'mode'),
  entry('mixolydian', 'Mixolydian', 'modes', 'mode'),
  entry('minor', 'Natural minor (Aeolian)', 'modes', 'mode'),
  entry('locrian', 'Locrian', 'modes', 'mode'),
  entry('harmonic minor', 'Harmonic minor', 'minor', 'minor'),
  entry('melodic minor', 'Melodic minor (ascending, jazz minor)', 'minor', 'minor'),
  entry('major pentatonic', 'Major pentatonic', 'pentatonic-blues', 'major'),
  entry('minor pentatonic', 'Minor pentatonic', 'pentatonic-blues', 'minor'),
  entry('minor blues', 'Blues (minor)', 'pentatonic-blues', 'minor'),
  entry('major blues', 'Blues (major)', 'pentatonic-blues', 'major'),
  entry('whole tone', 'Whole tone', 'symmetric', 'major'),
  entry('half-whole diminished', 'Diminished, half-whole (dominant)', 'symmetric', 'own'),
  entry('diminished', 'Diminished, whole-half', 'symmetric', 'own'),
  entry('chromatic', 'Chromatic', 'symmetric', 'major'),
  entry('phrygian dominant', 'Phrygian dominant (Spanish)', 'colour', 'own'),
  entry('lydian dominant', 'Lydian dominant (Lydian ♭7)', 'colour', 'own'),
  entry('altered', 'Altered (super Locrian)', 'colour', 'own'),
  entry('locrian #2', 'Locrian ♮2 (half-diminished)', 'colour', 'own'),
  entry('bebop', 'Bebop dominant', 'colour', 'own'),
  entry('harmonic major', 'Harmonic major', 'colour', 'major'),
  entry('double harmonic major', 'Double harmonic major', 'colour', 'own'),
  entry('hungarian minor', 'Hungarian minor', 'colour', 'minor'),
]

/**
 * Readable names for tonal scales whose own names read as data ("mystery #1"); the other scales
 * under "More scales" are named by `readableScaleName`.
 *
 * @example
 * MORE_SCALE_LABELS['mystery #1'] // 'Mystery scale no. 1'
 */
export const MORE_SCALE_LABELS: Readonly<Record<string, string>> = {
  'mystery #1': 'Mystery scale no. 1',
  'minor #7m pentatonic': 'Minor pentatonic with major 7th',
  'lydian #5p pentatonic': 'Lydian ♯5 pentatonic',
  'minor six pentatonic': 'Minor 6 pentatonic',
  'minor six diminished': 'Minor 6 diminished',
  ultralocrian: 'Ultralocrian (super Locrian 𝄫7)',
  'locrian 6': 'Locrian ♮6',
  'vietnamese 1': 'Vietnamese (1)',
  bebop: 'Bebop dominant',
  'six tone symmetric': 'Six-tone symmetric',
  'flat three pentatonic': 'Flat-three pentatonic',
  'flat six pentatonic': 'Flat-six pentatonic',
}
