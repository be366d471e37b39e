// Key cycles for drills: built-in orders (fourths, fifths, chromatic, whole steps) or custom lists.
import { CYCLES, type CycleData, type CycleId } from './cycle-data'
import { keyAlteration } from './key'
import { pitchClassOf } from './pitch'
import { tonicName } from './scale'
import { TONICS } from './scale-data'

function accidentalCount(tonic: string, scale: string): number {
  return Math.abs(keyAlteration(tonic, scale))
}

/**
 * Picks the tonic spelling for a pitch class whose key signature for the scale has the fewest
 * accidentals (so C# minor rather than Db minor, Db major rather than C# major); every minor
 * variant goes by the natural minor's signature (G# melodic minor, not Ab). On a tie, `onTie` when
 * it fits, else the first in TONICS order.
 *
 * @example
 * preferredTonic(1, 'minor') // 'C#'
 * preferredTonic(1, 'major') // 'Db'
 * preferredTonic(8, 'melodic minor') // 'G#'
 */
export function preferredTonic(pitchClass: number, scale: string, onTie?: string): string {
  const candidates = TONICS.filter((tonic) => pitchClassOf(tonic) === ((pitchClass % 12) + 12) % 12)
  const scored = candidates.map((tonic) => ({ tonic, count: accidentalCount(tonic, scale) }))
  const fewest = Math.min(...scored.map((candidate) => candidate.count))
  const best = scored.filter((candidate) => candidate.count === fewest).map((item) => item.tonic)
  return best.find((tonic) => tonic === onTie) ?? best[0] ?? 'C'
}

function cycleData(cycle: string): CycleData {
  const data = CYCLES.find((candidate) => candidate.id === cycle)
  if (!data) {
    const ids = CYCLES.map((candidate) => candidate.id).join(', ')
    throw new RangeError(`"${cycle}" is not a known key cycle; choose one of ${ids}.`)
  }
  return data
}

/**
 * The 12 tonics of a built-in cycle from a starting key (C by default). With a scale, each tonic
 * after the first is spelled to give that scale the fewest accidentals (G# minor, not Ab minor).
 *
 * @example
 * cycleTonics('fourths') // ['C', 'F', 'Bb', 'Eb', 'Ab', 'Db', 'Gb', 'B', 'E', 'A', 'D', 'G']
 * cycleTonics('fifths', { start: 'A', scale: 'minor' }) // ['A', 'E', 'B', 'F#', 'C#', 'G#', 'Eb', 'Bb', 'F', 'C', 'G', 'D']
 */
export function cycleTonics(
  cycle: CycleId,
  options: { start?: string; scale?: string } = {},
): string[] {
  const data = cycleData(cycle)
  const start = tonicName(options.start ?? 'C')
  const startClass = pitchClassOf(start)
  return data.offsets.map((offset, index) => {
    if (index === 0) return start
    const pitchClass = (startClass + offset) % 12
    const base = data.tonics.find((tonic) => pitchClassOf(tonic) === pitchClass) ?? start
    return options.scale === undefined ? base : preferredTonic(pitchClass, options.scale, base)
  })
}

/**
 * Checks a teacher's own list of keys and returns it with canonical tonic names; throws a
 * RangeError for an empty list or a name that is not one of the 18 key tonics.
 *
 * @example
 * customCycle(['e', 'a', 'd', 'g']) // ['E', 'A', 'D', 'G']
 */
export function customCycle(tonics: readonly string[]): string[] {
  if (tonics.length === 0) throw new RangeError('A key cycle needs at least one key.')
  return tonics.map(tonicName)
}
