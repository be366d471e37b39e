// Where to play a sequence of pitches when a drill gives none (TAB needs a string and fret per note).
import { pitchName, positionsOf, type Position } from '../theory'

/**
 * A string and fret for every pitch, keeping the hand still where it can: the first note takes its
 * lowest-fret place, each later one the place nearest the previous fret (the lower fret on a tie,
 * then the lower string). Throws a RangeError naming a pitch the instrument cannot play.
 *
 * @example
 * placeOnNeck([28, 33, 45], [28, 33, 38, 43], 20) // [{ string: 0, fret: 0 }, { string: 1, fret: 0 }, { string: 3, fret: 2 }]
 */
export function placeOnNeck(
  pitches: readonly number[],
  tuning: readonly number[],
  frets: number,
): Position[] {
  const placed: Position[] = []
  for (const pitch of pitches) {
    const candidates = positionsOf(tuning, frets, pitch)
    if (candidates.length === 0) {
      throw new RangeError(`${pitchName(pitch)} is out of reach on this instrument.`)
    }
    const anchor = placed.at(-1)?.fret
    const cost = (place: Position) =>
      anchor === undefined ? place.fret : Math.abs(place.fret - anchor)
    const best = candidates.reduce((chosen, place) => {
      const difference = cost(place) - cost(chosen) || place.fret - chosen.fret
      return difference < 0 ? place : chosen
    })
    placed.push(best)
  }
  return placed
}
