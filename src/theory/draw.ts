// Fair draws for Pitch Hunt: a pitch first (each distinct pitch equally likely), then a place of it.
import type { FrettedNote } from './fretboard'
import { randomInt, type Random } from './random'

/**
 * Draws a cell so that every distinct pitch among `cells` is equally likely, however many places
 * it has; then one of that pitch's places, each equally likely. `avoidPitch` (e.g. the last
 * question's) is left out when another pitch is there. Throws a RangeError for no cells.
 *
 * @example
 * drawByPitch(positionsInRegion([28, 33, 38, 43], 0, 5), createRandom(1)) // { string: 2, fret: 3, pitch: 41 }
 */
export function drawByPitch(
  cells: readonly FrettedNote[],
  random: Random,
  avoidPitch?: number,
): FrettedNote {
  if (cells.length === 0) throw new RangeError('There is no place on the neck to draw from.')
  const pitches = [...new Set(cells.map((cell) => cell.pitch))].sort((a, b) => a - b)
  const allowed = pitches.filter((pitch) => pitch !== avoidPitch)
  const pool = allowed.length > 0 ? allowed : pitches
  const pitch = pool[randomInt(random, pool.length)]
  const places = cells.filter((cell) => cell.pitch === pitch)
  return places[randomInt(random, places.length)] as FrettedNote
}
