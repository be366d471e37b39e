// Where to play a sequence of pitches when a drill gives none (TAB needs a string and fret per note).
import { positionsOf } from './fretboard'
import { pitchName } from './pitch'
import type { Position } from './types'

/** Frets one hand position covers (one finger per fret). */
const HAND_SPAN = 4

/** How far a fret lies outside the hand's frets (0 inside; open strings are always in reach). */
function reach(fret: number, handLow: number | null): number {
  if (fret === 0 || handLow === null) return 0
  if (fret < handLow) return handLow - fret
  return Math.max(0, fret - (handLow + HAND_SPAN - 1))
}

/**
 * A string and fret for every pitch, in one hand position where it can: the first fretted note
 * sets the position (under the second finger), each later note takes a place inside it — the lower
 * fret first, then the lower string — else the nearest place outside, and the hand shifts there.
 * Throws a RangeError naming a pitch the instrument cannot play.
 *
 * @example
 * placeOnNeck([28, 33, 45], [28, 33, 38, 43], 20) // [{ string: 0, fret: 0 }, { string: 1, fret: 0 }, { string: 3, fret: 2 }]
 */
export function placeOnNeck(
  pitches: readonly number[],
  tuning: readonly number[],
  frets: number,
): Position[] {
  let handLow: number | null = null
  return pitches.map((pitch) => {
    const candidates = positionsOf(tuning, frets, pitch)
    if (candidates.length === 0) {
      throw new RangeError(`${pitchName(pitch)} is out of reach on this instrument.`)
    }
    const hand = handLow
    const best = candidates.reduce((chosen, place) => {
      const difference =
        reach(place.fret, hand) - reach(chosen.fret, hand) || place.fret - chosen.fret
      return difference < 0 ? place : chosen
    })
    if (best.fret > 0 && (handLow === null || reach(best.fret, handLow) > 0)) {
      handLow = Math.max(1, best.fret - 1)
    }
    return best
  })
}
