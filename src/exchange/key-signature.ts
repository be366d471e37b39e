// Key signatures for exports: how many sharps (+) or flats (−) a key's staff carries.
import { scalePitchClasses, scalePitchNames } from '../theory'

const MAJOR_STEPS = [0, 2, 4, 5, 7, 9, 11]

function alterationsOf(names: readonly string[]): number {
  return names.reduce(
    (sum, name) => sum + (name.match(/#/g)?.length ?? 0) - (name.match(/b/g)?.length ?? 0),
    0,
  )
}

// A seven-note scale whose notes are those of some major scale (the church modes).
function isDiatonic(pitchClasses: readonly number[]): boolean {
  if (pitchClasses.length !== 7) return false
  const set = new Set(pitchClasses)
  return Array.from({ length: 12 }, (_, root) => root).some((root) =>
    MAJOR_STEPS.every((step) => set.has((root + step) % 12)),
  )
}

/**
 * The key signature (fifths: sharps positive, flats negative) for a key: a mode of the major scale
 * uses its own spelling's accidentals (D dorian 0, Eb minor −6); other scales use the natural minor
 * when they have a minor and no major third (A harmonic minor 0), else the major key. Keys beyond
 * seven accidentals fold to their enharmonic (G# major → −4, as Ab major).
 *
 * @example
 * keyFifths('Eb', 'minor') // -6
 * keyFifths('D', 'dorian') // 0
 * keyFifths('A', 'harmonic minor') // 0
 */
export function keyFifths(tonic: string, scale: string): number {
  const pitchClasses = scalePitchClasses(tonic, scale)
  let fifths: number
  if (isDiatonic(pitchClasses)) fifths = alterationsOf(scalePitchNames(tonic, scale))
  else {
    const root = pitchClasses[0] ?? 0
    const steps = new Set(pitchClasses.map((pc) => (pc - root + 12) % 12))
    const minor = steps.has(3) && !steps.has(4)
    fifths = alterationsOf(scalePitchNames(tonic, minor ? 'minor' : 'major'))
  }
  if (fifths > 7) return fifths - 12
  if (fifths < -7) return fifths + 12
  return fifths
}

/**
 * The mode word a score's key carries: minor when the scale has a minor third and no major third.
 *
 * @example
 * keyMode('A', 'harmonic minor') // 'minor'
 * keyMode('G', 'mixolydian') // 'major'
 */
export function keyMode(tonic: string, scale: string): 'major' | 'minor' {
  const pitchClasses = scalePitchClasses(tonic, scale)
  const root = pitchClasses[0] ?? 0
  const steps = new Set(pitchClasses.map((pc) => (pc - root + 12) % 12))
  return steps.has(3) && !steps.has(4) ? 'minor' : 'major'
}
