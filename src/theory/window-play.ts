// Playing keys inside a window: up from a root folding down, or down from a root folding up.
import { octaveChoices } from './displacement'
import { resolveScale, spellScaleTone, type ScaleInfo } from './scale'
import type { ScaleDirection } from './scale-spelling'
import type { PitchWindow } from './types'
import type { WindowCycleOptions, WindowKey } from './window'

/**
 * The other way: up ↔ down.
 *
 * @example
 * turned('up') // 'down'
 */
export const turned = (direction: ScaleDirection): ScaleDirection =>
  direction === 'up' ? 'down' : 'up'

function startingRoot(
  info: ScaleInfo,
  window: PitchWindow,
  direction: ScaleDirection,
  lastPlayed: number | undefined,
): number {
  const roots = octaveChoices(info.pitchClasses[0] ?? 0, window.low, window.high)
  const ordered = direction === 'up' ? roots : [...roots].reverse()
  const first = ordered[0] ?? window.low
  if (lastPlayed === undefined) return first
  // reduce keeps the earlier root on a tie: the lower going up, the higher going down
  return ordered.reduce(
    (best, root) => (Math.abs(root - lastPlayed) < Math.abs(best - lastPlayed) ? root : best),
    first,
  )
}

// The next note with a pitch class: nearest above (up) or below (down), folded back into the window.
function nextNote(previous: number, pitchClass: number, window: PitchWindow, up: boolean) {
  const distance = up
    ? (pitchClass - previous + 1200) % 12 || 12
    : -((previous - pitchClass + 1200) % 12 || 12)
  let pitch = previous + distance
  const displaced = up ? pitch > window.high : pitch < window.low
  while (pitch > window.high) pitch -= 12
  while (pitch < window.low) pitch += 12
  return { pitch, displaced }
}

/**
 * Plays one key root to root in a window, up or down, starting on the root nearest `lastPlayed`
 * (or the lowest root going up, the highest going down, when nothing was played before).
 *
 * @example
 * playKey(resolveScale('C', 'major'), { low: 36, high: 48 }, 'down', undefined).names // ['C3', 'B2', ..., 'C2']
 */
export function playKey(
  info: ScaleInfo,
  window: PitchWindow,
  direction: ScaleDirection,
  lastPlayed: number | undefined,
): WindowKey {
  const size = info.pitchClasses.length
  const degreeAt = (index: number) => (direction === 'up' ? index : size - index) % size
  const pitches = [startingRoot(info, window, direction, lastPlayed)]
  const displaced = [false]
  for (let index = 1; index <= size; index += 1) {
    const pitchClass = info.pitchClasses[degreeAt(index)] ?? 0
    const next = nextNote(pitches[index - 1] ?? window.low, pitchClass, window, direction === 'up')
    pitches.push(next.pitch)
    displaced.push(next.displaced)
  }
  return {
    tonic: info.tonic,
    pitches,
    names: pitches.map((pitch, index) => spellScaleTone(info, degreeAt(index), pitch)),
    displaced,
    octave: pitches.map((pitch, index) => index === size && pitch !== pitches[0]),
    direction,
  }
}

/**
 * Plays the keys in the order given, the first in direction `first`, each later one in the same
 * direction or, for `alternate`, in turn the other way; each starts near the last note played.
 *
 * @example
 * playKeys({ low: 28, high: 47, tonics: ['C', 'F'], scale: 'major', direction: 'alternate' }, 'up').map((key) => key.direction) // ['up', 'down']
 */
export function playKeys(options: WindowCycleOptions, first: ScaleDirection): WindowKey[] {
  const keys: WindowKey[] = []
  let direction = first
  for (const tonic of options.tonics) {
    const info = resolveScale(tonic, options.scale, direction)
    keys.push(playKey(info, options, direction, keys.at(-1)?.pitches.at(-1)))
    if (options.direction === 'alternate') direction = turned(direction)
  }
  return keys
}
