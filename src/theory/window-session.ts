// Window cycles across sessions: where a session stopped, and the notes that continue from there.
import { assertWhole } from './guard'
import type { ScaleDirection } from './scale-spelling'
import {
  assertCycleWindow,
  firstDirection,
  startIndexOf,
  type WindowCycleOptions,
  type WindowKey,
} from './window'
import { playKeys, turned } from './window-play'

/**
 * Where a window cycle stands: the key (index in `tonics` as given), the note within it (0 = its
 * first root) and the way that key is played. Independent of the window, so widening the window
 * keeps the place in the cycle.
 *
 * @example
 * const position: CyclePosition = { keyIndex: 3, noteIndex: 0, phase: 'down' }
 */
export interface CyclePosition {
  keyIndex: number
  noteIndex: number
  phase: ScaleDirection
}

/**
 * One note of a window cycle session: where it is in the cycle, its pitch and name, its degree
 * (1-based), whether it was folded back into the window, and whether it is the octave (the closing
 * root an octave from the key's first note — a closing root that folds onto the starting pitch is
 * a fold, not the octave).
 *
 * @example
 * cycleNotes({ low: 36, high: 48, tonics: ['C'], scale: 'major' }, { count: 1 }).notes[0]
 * // { keyIndex: 0, noteIndex: 0, tonic: 'C', pitch: 36, name: 'C2', degree: 1, displaced: false, octave: false, direction: 'up' }
 */
export interface CycleNote {
  keyIndex: number
  noteIndex: number
  tonic: string
  pitch: number
  name: string
  degree: number
  displaced: boolean
  octave: boolean
  direction: ScaleDirection
}

function noteOf(key: WindowKey, keyIndex: number, noteIndex: number): CycleNote {
  const size = key.pitches.length - 1
  const step = noteIndex % size
  return {
    keyIndex,
    noteIndex,
    tonic: key.tonic,
    pitch: key.pitches[noteIndex] ?? 0,
    name: key.names[noteIndex] ?? '',
    degree: (key.direction === 'up' ? step : (size - step) % size) + 1,
    displaced: key.displaced[noteIndex] ?? false,
    octave: key.octave[noteIndex] ?? false,
    direction: key.direction,
  }
}

function assertPosition(position: CyclePosition, options: WindowCycleOptions): void {
  assertWhole(position.keyIndex, 'The key index', 0, options.tonics.length - 1)
  assertWhole(position.noteIndex, 'The note index', 0, 12)
  if (position.phase !== 'up' && position.phase !== 'down') {
    throw new RangeError(`"${String(position.phase)}" is not a phase; use up or down.`)
  }
}

// The keys of one round from the start key, played so that key `keyIndex` goes `phase`.
function roundFor(options: WindowCycleOptions, start: number, position: CyclePosition) {
  const count = options.tonics.length
  const offset = (position.keyIndex - start + count) % count
  const alternate = options.direction === 'alternate'
  const atStart = alternate && offset % 2 === 1 ? turned(position.phase) : position.phase
  const tonics = [...options.tonics.slice(start), ...options.tonics.slice(0, start)]
  const phase = alternate ? atStart : firstDirection(options.direction)
  return { keys: playKeys({ ...options, tonics }, phase), offset }
}

/**
 * The notes of a window-cycle session of `count` notes, continuing from `fromPosition` (else from
 * the start key, first note), and the position the next session continues from. Rounds repeat the
 * cycle; each round is played from the start key exactly as `keyCycleInWindow` plays it, so a
 * session that stops mid-key resumes on the same pitches. With `wholeKeys`, the session finishes
 * its last key. Pure: the same settings and position always give the same notes.
 *
 * @example
 * const first = cycleNotes({ low: 36, high: 48, tonics: ['C', 'F', 'Bb'], scale: 'major' }, { count: 8 })
 * first.nextPosition // { keyIndex: 1, noteIndex: 0, phase: 'up' }
 * cycleNotes({ low: 36, high: 48, tonics: ['C', 'F', 'Bb'], scale: 'major' }, { fromPosition: first.nextPosition, count: 8 }).notes[0]?.tonic // 'F'
 */
export function cycleNotes(
  options: WindowCycleOptions,
  session: { fromPosition?: CyclePosition | null; count: number; wholeKeys?: boolean },
): { notes: CycleNote[]; nextPosition: CyclePosition } {
  assertCycleWindow(options)
  assertWhole(session.count, 'The note count', 0, 100_000)
  const start = startIndexOf(options)
  const count = options.tonics.length
  let position = session.fromPosition ?? {
    keyIndex: start,
    noteIndex: 0,
    phase: firstDirection(options.direction),
  }
  assertPosition(position, options)
  const notes: CycleNote[] = []
  const wanted = () => notes.length < session.count || (session.wholeKeys && position.noteIndex > 0)
  while (wanted()) {
    const { keys, offset } = roundFor(options, start, position)
    for (let k = offset; k < keys.length && wanted(); k += 1) {
      const key = keys[k] as WindowKey
      const keyIndex = (start + k) % count
      for (let n = position.noteIndex; n < key.pitches.length && wanted(); n += 1) {
        notes.push(noteOf(key, keyIndex, n))
        position = { keyIndex, noteIndex: n + 1, phase: key.direction }
      }
      if (position.noteIndex >= key.pitches.length) position = nextKey(position, options, count)
    }
  }
  return { notes, nextPosition: position }
}

function nextKey(
  position: CyclePosition,
  options: WindowCycleOptions,
  count: number,
): CyclePosition {
  const phase = options.direction === 'alternate' ? turned(position.phase) : position.phase
  return { keyIndex: (position.keyIndex + 1) % count, noteIndex: 0, phase }
}
