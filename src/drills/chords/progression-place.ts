// Where a progression stopped, per progression, kept in this browser: the next session (free or a
// plan item's) continues from the next chord, so a short session still reaches every key in time.
import type { ChordsSettings } from '../../contract/drills'

const STORAGE_KEY = 'ambitus.chords.next.v1'

type Progression = Pick<
  ChordsSettings,
  'progression' | 'quality' | 'cycle' | 'startKey' | 'customChords'
>

const signature = (p: Progression) =>
  [p.progression, p.quality, p.cycle, p.startKey, p.customChords.trim()].join('|')

function readAll(): Record<string, number> {
  try {
    const parsed: unknown = JSON.parse(globalThis.localStorage?.getItem(STORAGE_KEY) ?? '{}')
    return parsed && typeof parsed === 'object' ? (parsed as Record<string, number>) : {}
  } catch {
    return {} // storage blocked or unreadable: start from the first chord
  }
}

/** The chord (index into the whole progression) the next session starts from. */
export function nextChordOf(progression: Progression): number {
  const value = readAll()[signature(progression)]
  return typeof value === 'number' && Number.isInteger(value) && value >= 0 ? value : 0
}

export function saveNextChord(progression: Progression, next: number): void {
  try {
    const all = { ...readAll(), [signature(progression)]: next }
    globalThis.localStorage?.setItem(STORAGE_KEY, JSON.stringify(all))
  } catch {
    // storage full or blocked: the next session starts from the first chord
  }
}
