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
 * The notes of a range run in a hand position: the scale pitches playable inside the fret region
 * [lowFret, highFret] on any string (open strings count when lowFret is 0) give the lowest and the
 * highest note, and the run is every scale pitch from that lowest to that highest note, ascending —
 * also those the box itself lacks (a 4-fret box in fourths cannot hold them all; the fingering
 * then stretches or shifts for them). Empty when the region holds no scale note.
 *
 * @example
 * rangeRun({ tuning: [28, 33, 38, 43], lowFret: 5, highFret: 8, tonic: 'G', scale: 'major' })
 * // [33, 35, 36, 38, 40, 42, 43, 45, 47, 48, 50] (A1 to D3, with F#2 and B2)
 */
export function rangeRun(options: RangeRunOptions): number[] {
  const { tuning, lowFret, highFret } = options
  assertFretRegion(tuning, lowFret, highFret)
  const { pitchClasses } = resolveScale(options.tonic, options.scale)
  const inScale = (pitch: number) => pitchClasses.includes(pitch % 12)
  const playable = tuning.flatMap((open) =>
    Array.from({ length: highFret - lowFret + 1 }, (_, k) => open + lowFret + k).filter(inScale),
  )
  if (playable.length === 0) return []
  const lowest = Math.min(...playable)
  const highest = Math.max(...playable)
  return Array.from({ length: highest - lowest + 1 }, (_, k) => lowest + k).filter(inScale)
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
