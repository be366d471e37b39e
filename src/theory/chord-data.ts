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

/** Each group's types as [suffix, tonal's type name, label], in teaching order (common practice). */
const BY_GROUP: Readonly<Record<ChordGroup, readonly (readonly [string, string, string])[]>> = {
  triad: [
    ['', 'major', 'Major triad'],
    ['m', 'minor', 'Minor triad'],
    ['dim', 'diminished', 'Diminished triad'],
    ['aug', 'augmented', 'Augmented triad'],
    ['sus2', 'suspended second', 'Suspended 2nd'],
    ['sus4', 'suspended fourth', 'Suspended 4th'],
  ],
  sixth: [
    ['6', 'sixth', 'Major sixth'],
    ['m6', 'minor sixth', 'Minor sixth'],
  ],
  seventh: [
    ['maj7', 'major seventh', 'Major seventh'],
    ['7', 'dominant seventh', 'Dominant seventh'],
    ['m7', 'minor seventh', 'Minor seventh'],
    ['m7b5', 'half-diminished', 'Half-diminished (minor 7 ♭5)'],
    ['dim7', 'diminished seventh', 'Diminished seventh'],
    ['mMaj7', 'minor/major seventh', 'Minor-major seventh'],
    ['7sus4', 'suspended fourth seventh', 'Dominant seventh sus4'],
  ],
}

/**
 * The triads, sixth chords and seventh chords bassists practise as arpeggios, written with
 * common lead-sheet suffixes (common practice); other tonal chord symbols parse too.
 *
 * @example
 * CHORD_TYPES.filter((type) => type.group === 'triad').map((type) => type.suffix) // ['', 'm', 'dim', 'aug', 'sus2', 'sus4']
 */
export const CHORD_TYPES: readonly ChordTypeData[] = (
  Object.entries(BY_GROUP) as [ChordGroup, (typeof BY_GROUP)[ChordGroup]][]
).flatMap(([group, types]) =>
  types.map(([suffix, tonal, label]) => ({ suffix, tonal, group, label })),
)

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
