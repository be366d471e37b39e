// Chord types the chord-tones drill practises: lead-sheet suffix, tonal's type name, group, label.

/**
 * The chord families of the chord-tones drill.
 *
 * @example
 * const group: ChordGroup = 'seventh'
 */
export type ChordGroup = 'triad' | 'sixth' | 'seventh'

/**
 * One practised chord type: the suffix written after the root ("m7b5"), tonal's type name, its
 * group and a label for pickers.
 *
 * @example
 * CHORD_TYPES.find((type) => type.suffix === 'm7b5')?.tonal // 'half-diminished'
 */
export interface ChordTypeData {
  suffix: string
  tonal: string
  group: ChordGroup
  label: string
}

const type = (suffix: string, tonal: string, group: ChordGroup, label: string) => ({
  suffix,
  tonal,
  group,
  label,
})

/**
 * The triads, sixth chords and seventh chords bassists practise as arpeggios, written with
 * common lead-sheet suffixes (common practice); other tonal chord symbols parse too.
 *
 * @example
 * CHORD_TYPES.filter((type) => type.group === 'triad').map((type) => type.suffix) // ['', 'm', 'dim', 'aug', 'sus2', 'sus4']
 */
export const CHORD_TYPES: readonly ChordTypeData[] = [
  type('', 'major', 'triad', 'Major triad'),
  type('m', 'minor', 'triad', 'Minor triad'),
  type('dim', 'diminished', 'triad', 'Diminished triad'),
  type('aug', 'augmented', 'triad', 'Augmented triad'),
  type('sus2', 'suspended second', 'triad', 'Suspended 2nd'),
  type('sus4', 'suspended fourth', 'triad', 'Suspended 4th'),
  type('6', 'sixth', 'sixth', 'Major sixth'),
  type('m6', 'minor sixth', 'sixth', 'Minor sixth'),
  type('maj7', 'major seventh', 'seventh', 'Major seventh'),
  type('7', 'dominant seventh', 'seventh', 'Dominant seventh'),
  type('m7', 'minor seventh', 'seventh', 'Minor seventh'),
  type('m7b5', 'half-diminished', 'seventh', 'Half-diminished (minor 7 ♭5)'),
  type('dim7', 'diminished seventh', 'seventh', 'Diminished seventh'),
  type('mMaj7', 'minor/major seventh', 'seventh', 'Minor-major seventh'),
  type('7sus4', 'suspended fourth seventh', 'seventh', 'Dominant seventh sus4'),
]

/**
 * Lead-sheet glyphs tonal does not read, with the suffix they stand for (common practice).
 *
 * @example
 * CHORD_SUFFIX_GLYPHS['Δ7'] // 'maj7'
 */
export const CHORD_SUFFIX_GLYPHS: Readonly<Record<string, string>> = {
  Δ7: 'maj7',
  Δ: 'maj7',
  '△7': 'maj7',
  '△': 'maj7',
  '⦰7': 'm7b5',
  '⦰': 'm7b5',
  '-': 'm',
}
