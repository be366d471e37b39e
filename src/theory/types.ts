// Plain data shapes shared across the theory core.

/**
 * A place on the neck: string index (0 = lowest-pitched string) and fret (0 = open string).
 *
 * @example
 * const fifthFretOnA: Position = { string: 1, fret: 5 }
 */
export interface Position {
  string: number
  fret: number
}

/**
 * An inclusive pitch window (MIDI numbers), e.g. the instrument's range or a practice window.
 *
 * @example
 * const window: PitchWindow = { low: 36, high: 48 } // C2 to C3
 */
export interface PitchWindow {
  low: number
  high: number
}

/**
 * Which accidental to use when a pitch class could be spelled either way.
 *
 * @example
 * pitchName(61, 'flat') // 'Db4'
 */
export type AccidentalPreference = 'sharp' | 'flat'
