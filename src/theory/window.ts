// Window cycles: every key of a cycle played root to root inside a low/high pitch window.
import { assertWindow, octaveChoices } from './displacement'
import { assertFretRegion } from './fretboard'
import { assertWhole, MIDI_MAX } from './guard'
import { pitchName } from './pitch'
import { resolveScale, spellScaleTone, type ScaleInfo } from './scale'
import { customCycle } from './cycle'
import type { PitchWindow } from './types'

/**
 * What a window cycle needs: the window, the keys in order and the scale played in each.
 *
 * @example
 * const options: WindowCycleOptions = { low: 36, high: 48, tonics: ['C', 'F'], scale: 'major' }
 */
export interface WindowCycleOptions extends PitchWindow {
  tonics: readonly string[]
  scale: string
}

/**
 * One key of a window cycle as played: pitches, spelled names, and which notes were folded down.
 *
 * @example
 * keyCycleInWindow({ low: 36, high: 48, tonics: ['C'], scale: 'major' })[0]?.names // ['C2', ..., 'C3']
 */
export interface WindowKey {
  tonic: string
  pitches: number[]
  names: string[]
  displaced: boolean[]
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

function startingRoot(
  info: ScaleInfo,
  window: PitchWindow,
  lastPlayed: number | undefined,
): number {
  const roots = octaveChoices(info.pitchClasses[0] ?? 0, window.low, window.high)
  const lowest = roots[0] ?? window.low
  if (lastPlayed === undefined) return lowest
  // reduce keeps the earlier (lower) root on a tie
  return roots.reduce(
    (best, root) => (Math.abs(root - lastPlayed) < Math.abs(best - lastPlayed) ? root : best),
    lowest,
  )
}

function playKey(info: ScaleInfo, window: PitchWindow, lastPlayed: number | undefined): WindowKey {
  const size = info.pitchClasses.length
  const pitches = [startingRoot(info, window, lastPlayed)]
  const displaced = [false]
  for (let degree = 1; degree <= size; degree += 1) {
    const previous = pitches[degree - 1] ?? window.low
    const pitchClass = info.pitchClasses[degree % size] ?? 0
    let pitch = previous + ((pitchClass - (previous % 12) + 12) % 12 || 12)
    displaced.push(pitch > window.high)
    while (pitch > window.high) pitch -= 12
    pitches.push(pitch)
  }
  const names = pitches.map((pitch, index) => spellScaleTone(info, index, pitch))
  return { tonic: info.tonic, pitches, names, displaced }
}

/**
 * Plays every key of a cycle from its root up to the root an octave above inside the window [low,
 * high]: the first key starts on the lowest root in the window, each later key on the root nearest
 * the last note played (the lower on a tie); each next note is the nearest pitch above the previous
 * one with the next degree's pitch class, folded down by octaves (and marked displaced) when above
 * the window. Throws a RangeError naming the missing notes when the window lacks any of them.
 *
 * @example
 * keyCycleInWindow({ low: 36, high: 48, tonics: ['F'], scale: 'major' })
 * // [{ tonic: 'F', pitches: [41, 43, 45, 46, 48, 38, 40, 41], names: ['F2', 'G2', 'A2', 'Bb2', 'C3', 'D2', 'E2', 'F2'], displaced: [false, false, false, false, false, true, false, false] }]
 */
export function keyCycleInWindow(options: WindowCycleOptions): WindowKey[] {
  const missing = missingPitchClasses(options)
  if (missing.length > 0) {
    const named = `${pitchName(options.low)}–${pitchName(options.high)}`
    throw new RangeError(
      `The window ${named} is missing ${missing.join(', ')}; widen it to play every key.`,
    )
  }
  const keys: WindowKey[] = []
  for (const tonic of options.tonics) {
    keys.push(playKey(resolveScale(tonic, options.scale), options, keys.at(-1)?.pitches.at(-1)))
  }
  return keys
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
