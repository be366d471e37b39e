// The fretting hand: hand systems, finger numbers, stretches versus shifts, position names.
import { assertWhole } from './guard'
import { MAX_FRETS } from './tuning'

/**
 * How the fretting hand covers the frets: one finger per fret over four frets, or the
 * low-register three-fret system common on bass (fingers 1, 2 and 4 over three frets).
 *
 * @example
 * const system: HandSystem = 'three-fret'
 */
export type HandSystem = 'one-finger-per-fret' | 'three-fret'

/**
 * How a note is reached: an open string (no finger), inside the hand, by a stretch (one fret
 * beyond the hand without moving it) or by a shift (the hand moves).
 *
 * @example
 * const move: HandMove = 'stretch'
 */
export type HandMove = 'open' | 'hand' | 'stretch' | 'shift'

/**
 * The fingers each hand system puts on consecutive frets from the first finger's fret (common
 * practice).
 *
 * @example
 * HAND_FINGERS['three-fret'] // [1, 2, 4]
 */
export const HAND_FINGERS: Readonly<Record<HandSystem, readonly number[]>> = {
  'one-finger-per-fret': [1, 2, 3, 4],
  'three-fret': [1, 2, 4],
}

/**
 * One note as the hand plays it: the finger (0 for an open string), the move, and the fret under
 * the first finger afterwards.
 *
 * @example
 * const step: HandStep = { finger: 4, move: 'stretch', handAt: 5 }
 */
export interface HandStep {
  finger: number
  move: HandMove
  handAt: number
}

/**
 * Throws a RangeError unless `system` is a known hand system.
 *
 * @example
 * assertHandSystem('three-fret') // passes
 */
export function assertHandSystem(system: string): asserts system is HandSystem {
  if (!(system in HAND_FINGERS)) {
    throw new RangeError(`"${system}" is not a hand system; use one-finger-per-fret or three-fret.`)
  }
}

/**
 * Plays a fret with the hand whose first finger is at `handAt`: inside the hand with that fret's
 * finger; one fret below or above the hand as a stretch (finger 1 or 4, the hand stays); farther
 * as a shift that moves the hand just far enough (the note under finger 4 going up, 1 going down).
 *
 * @example
 * handStep(5, 9, 'one-finger-per-fret') // { finger: 4, move: 'stretch', handAt: 5 }
 * handStep(5, 10, 'one-finger-per-fret') // { finger: 4, move: 'shift', handAt: 7 }
 * handStep(5, 7, 'three-fret') // { finger: 4, move: 'hand', handAt: 5 }
 */
export function handStep(handAt: number, fret: number, system: HandSystem): HandStep {
  if (fret === 0) return { finger: 0, move: 'open', handAt }
  const fingers = HAND_FINGERS[system]
  const offset = fret - handAt
  if (offset >= 0 && offset < fingers.length) {
    return { finger: fingers[offset] ?? 1, move: 'hand', handAt }
  }
  if (offset === -1) return { finger: 1, move: 'stretch', handAt }
  if (offset === fingers.length) return { finger: 4, move: 'stretch', handAt }
  return offset > 0
    ? { finger: 4, move: 'shift', handAt: fret - fingers.length + 1 }
    : { finger: 1, move: 'shift', handAt: fret }
}

const ROMAN: readonly [number, string][] = [
  [10, 'X'],
  [9, 'IX'],
  [5, 'V'],
  [4, 'IV'],
  [1, 'I'],
]

/**
 * Names a hand position by the fret under the first finger, as a Roman numeral (common practice).
 *
 * @example
 * positionName(5) // 'V'
 * positionName(12) // 'XII'
 */
export function positionName(fret: number): string {
  assertWhole(fret, 'The first finger’s fret', 1, MAX_FRETS)
  let rest = fret
  let name = ''
  for (const [value, numeral] of ROMAN) {
    for (; rest >= value; rest -= value) name += numeral
  }
  return name
}
