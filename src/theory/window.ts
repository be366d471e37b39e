// Window cycles: every key of a cycle played root to root inside a low/high pitch window.
import { assertWindow } from './displacement'
import { assertFretRegion } from './fretboard'
import { assertWhole, MIDI_MAX } from './guard'
import { pitchClassOf, pitchName } from './pitch'
import { resolveScale } from './scale'
import type { ScaleDirection } from './scale-spelling'
import { customCycle } from './cycle'
import type { PitchWindow } from './types'
import { playKeys } from './window-play'

/**
 * Which way the keys of a window cycle are played: all up, all down (root, 7th, 6th … root), or
 * alternating up, down, up … starting up.
 *
 * @example
 * const direction: CycleDirection = 'alternate'
 */
export type CycleDirection = 'up' | 'down' | 'alternate'

/**
 * What a window cycle needs: the window, the keys in order, the scale played in each, the
 * direction (default `up`) and the key to begin on (default the first of `tonics`).
 *
 * @example
 * const options: WindowCycleOptions = { low: 36, high: 48, tonics: ['C', 'F'], scale: 'major', direction: 'alternate' }
 */
export interface WindowCycleOptions extends PitchWindow {
  tonics: readonly string[]
  scale: string
  direction?: CycleDirection
  startTonic?: string
}

/**
 * One key of a window cycle as played: pitches, spelled names, which notes were folded back into
 * the window, which note is the octave (the closing root an octave from the first; after a fold it
 * often lands on the starting pitch itself, and is then not the octave), and the way it went.
 *
 * @example
 * keyCycleInWindow({ low: 36, high: 48, tonics: ['C'], scale: 'major' })[0]?.names // ['C2', ..., 'C3']
 */
export interface WindowKey {
  tonic: string
  pitches: number[]
  names: string[]
  displaced: boolean[]
  octave: boolean[]
  direction: ScaleDirection
}

/**
 * The pitch classes the keys' scales use that the window [low, high] lacks, from C upwards, named
 * as the keys spell them ("F#/Gb" when spelled both ways); empty when the window is wide enough.
 *
 * @example
 * missingPitchClasses({ low: 40, high: 47, tonics: ['C'], scale: 'major' }) // ['C', 'D']
 */
export function missingPitchClasses(options: WindowCycleOptions): string[] {
  const { low, high } = options
  assertWindow(low, high)
  const keys = customCycle(options.tonics).map((tonic) => resolveScale(tonic, options.scale))
  const spellings = new Map<number, Set<string>>()
  for (const info of keys) {
    info.pitchClasses.forEach((pitchClass, degree) => {
      if ((pitchClass - low + 120) % 12 <= high - low) return
      const names = spellings.get(pitchClass) ?? new Set<string>()
      spellings.set(pitchClass, names.add(info.names[degree] ?? ''))
    })
  }
  return [...spellings.entries()].sort(([a], [b]) => a - b).map(([, names]) => [...names].join('/'))
}

/**
 * Throws a RangeError unless the window holds every pitch class the keys' scales use (naming the
 * missing ones) and the direction is known.
 *
 * @example
 * assertCycleWindow({ low: 36, high: 48, tonics: ['C'], scale: 'major' }) // passes
 */
export function assertCycleWindow(options: WindowCycleOptions): void {
  const missing = missingPitchClasses(options)
  if (missing.length > 0) {
    const named = `${pitchName(options.low)}–${pitchName(options.high)}`
    throw new RangeError(
      `The window ${named} is missing ${missing.join(', ')}; widen it to play every key.`,
    )
  }
  const direction = options.direction ?? 'up'
  if (!['up', 'down', 'alternate'].includes(direction)) {
    throw new RangeError(`"${String(direction)}" is not a direction; use up, down or alternate.`)
  }
}

/**
 * The index in `tonics` of the start key (matched by pitch class, so Db finds C#), 0 without one;
 * a start key not in the cycle throws a RangeError.
 *
 * @example
 * startIndexOf({ tonics: ['C', 'F', 'Bb'], startTonic: 'A#' }) // 2
 */
export function startIndexOf(options: Pick<WindowCycleOptions, 'tonics' | 'startTonic'>): number {
  if (options.startTonic === undefined) return 0
  const wanted = pitchClassOf(options.startTonic)
  const index = options.tonics.findIndex((tonic) => pitchClassOf(tonic) === wanted)
  if (index === -1) {
    throw new RangeError(
      `The start key ${options.startTonic} is not in the cycle (${options.tonics.join(' ')}).`,
    )
  }
  return index
}

/**
 * The direction of a cycle's first key: down for `down`, else up.
 *
 * @example
 * firstDirection('alternate') // 'up'
 */
export function firstDirection(direction: CycleDirection = 'up'): ScaleDirection {
  return direction === 'down' ? 'down' : 'up'
}

/**
 * Plays every key of a cycle root to root inside the window [low, high] (PRODUCT.md "Window
 * cycle"). Up: the first key starts on the lowest root in the window, each next note is the nearest
 * pitch above with the next degree's pitch class, folded down by octaves (marked displaced) when
 * above the window. Down is the mirror image (highest root; nearest below; folded up). Alternate
 * plays up, down, up …; every later key starts on the root nearest the last note played (a tie
 * goes to the lower root going up, the higher going down). A folded closing root is not the
 * octave unless it lies an octave from the first root. The cycle begins at `startTonic` when given. Throws a RangeError naming the missing
 * notes when the window lacks any of them.
 *
 * @example
 * keyCycleInWindow({ low: 36, high: 48, tonics: ['F'], scale: 'major' })
 * // [{ tonic: 'F', pitches: [41, 43, 45, 46, 48, 38, 40, 41], names: ['F2', 'G2', 'A2', 'Bb2', 'C3', 'D2', 'E2', 'F2'], displaced: [false, false, false, false, false, true, false, false], octave: [false, …, false] (F2 again, not F3), direction: 'up' }]
 * keyCycleInWindow({ low: 28, high: 47, tonics: ['C', 'F'], scale: 'major', direction: 'alternate' })[1]?.names
 * // ['F2', 'E2', 'D2', 'C2', 'Bb1', 'A1', 'G1', 'F1']
 */
export function keyCycleInWindow(options: WindowCycleOptions): WindowKey[] {
  assertCycleWindow(options)
  const start = startIndexOf(options)
  const tonics = [...options.tonics.slice(start), ...options.tonics.slice(0, start)]
  return playKeys({ ...options, tonics }, firstDirection(options.direction))
}

/**
 * The pitch window a fret region covers: from the lowest string at `lowFret` to the highest string
 * at `highFret`.
 *
 * @example
 * windowFromFrets({ tuning: [28, 33, 38, 43], lowFret: 0, highFret: 5 }) // { low: 28, high: 48 } (E1 to C3)
 */
export function windowFromFrets(options: {
  tuning: readonly number[]
  lowFret: number
  highFret: number
}): PitchWindow {
  assertFretRegion(options.tuning, options.lowFret, options.highFret)
  return {
    low: Math.min(...options.tuning) + options.lowFret,
    high: Math.max(...options.tuning) + options.highFret,
  }
}

/**
 * The next widening step of a window: `step` semitones (1 by default) further above or below,
 * never past the range; null when the window already reaches that end of the range.
 *
 * @example
 * widenWindow({ low: 36, high: 48, direction: 'above', range: { low: 28, high: 67 } }) // { low: 36, high: 49 }
 */
export function widenWindow(
  options: PitchWindow & { direction: 'above' | 'below'; range: PitchWindow; step?: number },
): PitchWindow | null {
  const { low, high, range, step = 1 } = options
  assertWindow(range.low, range.high)
  assertWindow(low, high)
  assertWhole(step, 'The widening step', 1, MIDI_MAX)
  if (low < range.low || high > range.high) {
    throw new RangeError(
      `The window ${pitchName(low)}–${pitchName(high)} must lie inside the instrument's range.`,
    )
  }
  if (options.direction === 'above') {
    return high === range.high ? null : { low, high: Math.min(range.high, high + step) }
  }
  return low === range.low ? null : { low: Math.max(range.low, low - step), high }
}
