// Fret geometry for drawing the neck: 12-TET fret distances from the nut, or even spacing.
import { assertPositive, assertWhole } from './guard'
import { MAX_FRETS } from './tuning'

/**
 * An inlay dot on a fret; `double` marks the octave frets (12, 24) that carry two dots.
 *
 * @example
 * const octave: Inlay = { fret: 12, double: true }
 */
export interface Inlay {
  fret: number
  double: boolean
}

const INLAY_FRETS = [3, 5, 7, 9, 12, 15, 17, 19, 21, 24, 27]

/**
 * Distance of each fret from the nut in 12-tone equal temperament, d(n) = L · (1 − 2^(−n/12)),
 * in the unit of `scaleLength`; the list has frets + 1 entries and [0] = 0 is the nut.
 *
 * @example
 * fretDistances(34, 12)[12] // 17 (the 12th fret halves the string)
 */
export function fretDistances(scaleLength: number, frets: number): number[] {
  assertPositive(scaleLength, 'Scale length')
  assertWhole(frets, 'Fret count', 1, MAX_FRETS)
  return Array.from({ length: frets + 1 }, (_, fret) => scaleLength * (1 - 2 ** (-fret / 12)))
}

/**
 * Evenly spaced fret distances over the same length as the true last fret, for an evenly drawn
 * neck; the list has frets + 1 entries and [0] = 0.
 *
 * @example
 * evenFretDistances(34, 24) // [0, 1.0625, 2.125, ..., 25.5]
 */
export function evenFretDistances(scaleLength: number, frets: number): number[] {
  const last = fretDistances(scaleLength, frets)[frets] ?? 0
  return Array.from({ length: frets + 1 }, (_, fret) => (last * fret) / frets)
}

/**
 * Where to draw a note for each fret: halfway between a fret and the one before it; [0] = 0 is
 * the nut, where open-string notes sit.
 *
 * @example
 * fretMidpoints([0, 2, 4]) // [0, 1, 3]
 */
export function fretMidpoints(distances: readonly number[]): number[] {
  return distances.map((distance, fret) =>
    fret === 0 ? 0 : (distance + (distances[fret - 1] ?? 0)) / 2,
  )
}

/**
 * The inlay dots of a neck with `frets` frets, following the usual pattern (3, 5, 7, 9, double 12,
 * 15, 17, 19, 21, double 24, 27).
 *
 * @example
 * inlayFrets(12) // [{ fret: 3, double: false }, ..., { fret: 12, double: true }]
 */
export function inlayFrets(frets: number): Inlay[] {
  assertWhole(frets, 'Fret count', 1, MAX_FRETS)
  return INLAY_FRETS.filter((fret) => fret <= frets).map((fret) => ({
    fret,
    double: fret % 12 === 0,
  }))
}
