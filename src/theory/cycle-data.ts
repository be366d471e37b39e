// Key cycles: the order of the keys and how each tonic is spelled by default.

/**
 * The built-in key cycles.
 *
 * @example
 * const cycle: CycleId = 'fourths'
 */
export type CycleId = 'fourths' | 'fifths' | 'chromatic' | 'whole-tone'

/**
 * A built-in cycle: semitone offsets from the starting key and default tonic spellings from C.
 *
 * @example
 * CYCLES.find((cycle) => cycle.id === 'fifths')?.label // 'Cycle of fifths'
 */
export interface CycleData {
  id: CycleId
  label: string
  offsets: readonly number[]
  tonics: readonly string[]
}

const times = (step: number) => Array.from({ length: 12 }, (_, index) => (index * step) % 12)

/**
 * The built-in key cycles. Fourths is the default for window cycles; whole steps runs the
 * whole-tone row of the starting key, then the row a semitone above, so every key comes once.
 *
 * @example
 * CYCLES[0].tonics // ['C', 'F', 'Bb', 'Eb', 'Ab', 'Db', 'Gb', 'B', 'E', 'A', 'D', 'G']
 */
export const CYCLES: readonly CycleData[] = [
  {
    id: 'fourths',
    label: 'Cycle of fourths',
    offsets: times(5),
    tonics: 'C F Bb Eb Ab Db Gb B E A D G'.split(' '),
  },
  {
    id: 'fifths',
    label: 'Cycle of fifths',
    offsets: times(7),
    tonics: 'C G D A E B F# Db Ab Eb Bb F'.split(' '),
  },
  {
    id: 'chromatic',
    label: 'Chromatic (up a semitone each key)',
    offsets: times(1),
    tonics: 'C Db D Eb E F F# G Ab A Bb B'.split(' '),
  },
  {
    id: 'whole-tone',
    label: 'Whole steps (two whole-tone rows)',
    offsets: [0, 2, 4, 6, 8, 10, 1, 3, 5, 7, 9, 11],
    tonics: 'C D E F# Ab Bb Db Eb F G A B'.split(' '),
  },
]
