// What a hand position or a whole instrument offers of a scale: range runs and awkward-key lowest tones.
import { assertFretRegion, instrumentRange } from './fretboard'
import { spellPitch } from './pitch'
import { resolveScale } from './scale'

/**
 * What a range run needs: the tuning, the fret region of the hand position, and the key.
 *
 * @example
 * const secondPosition: RangeRunOptions = { tuning: [28, 33, 38, 43], lowFret: 2, highFret: 5, tonic: 'G', scale: 'major' }
 */
export interface RangeRunOptions {
  tuning: readonly number[]
  lowFret: number
  highFret: number
  tonic: string
  scale: string
}

/**
 * A scale tone on the instrument: MIDI pitch, name spelled in the key, 1-based scale degree.
 *
 * @example
 * const lowest: ScaleTone = { pitch: 29, name: 'F1', degree: 2 } // Eb minor on a 4-string bass
 */
export interface ScaleTone {
  pitch: number
  name: string
  degree: number
}

/**
 * Every distinct scale pitch playable inside the fret region [lowFret, highFret] on any string
 * (open strings count when lowFret is 0), ascending: the notes of a range run in that position.
 *
 * @example
 * rangeRun({ tuning: [28, 33, 38, 43], lowFret: 2, highFret: 5, tonic: 'G', scale: 'major' })
 * // [30, 31, 33, 35, 36, 38, 40, 42, 43, 45, 47, 48]
 */
export function rangeRun(options: RangeRunOptions): number[] {
  const { tuning, lowFret, highFret } = options
  assertFretRegion(tuning, lowFret, highFret)
  const { pitchClasses } = resolveScale(options.tonic, options.scale)
  const playable = new Set<number>()
  for (const open of tuning) {
    for (let pitch = open + lowFret; pitch <= open + highFret; pitch += 1) {
      if (pitchClasses.includes(pitch % 12)) playable.add(pitch)
    }
  }
  return [...playable].sort((a, b) => a - b)
}

/**
 * The lowest pitch in the instrument's range whose pitch class is in the scale, with its spelled
 * name and degree: where a scale has to start on a limited-range instrument (awkward keys). Throws
 * a RangeError when the range holds none of the scale.
 *
 * @example
 * lowestScaleTone([28, 33, 38, 43], 20, 'Eb', 'minor') // { pitch: 29, name: 'F1', degree: 2 }
 */
export function lowestScaleTone(
  tuning: readonly number[],
  frets: number,
  tonic: string,
  scale: string,
): ScaleTone {
  const { low, high } = instrumentRange(tuning, frets)
  const { names, pitchClasses } = resolveScale(tonic, scale)
  for (let pitch = low; pitch <= high; pitch += 1) {
    const index = pitchClasses.indexOf(pitch % 12)
    const name = names[index]
    if (name !== undefined) return { pitch, name: spellPitch(pitch, name), degree: index + 1 }
  }
  throw new RangeError(`This instrument's range holds no note of ${tonic} ${scale}.`)
}
