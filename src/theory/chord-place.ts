// Chord tones on the neck: inside a pitch window, inside a fret position, and as an arpeggio.
import { parseChord, type ChordInfo, type ChordTone } from './chord'
import { assertWindow } from './displacement'
import { positionsInRegion, type FrettedNote } from './fretboard'
import { spellPitch } from './pitch'
import type { PitchWindow } from './types'

/**
 * A chord tone at a pitch: the MIDI pitch, its name with octave (spelled as the chord spells it),
 * and the tone (degree, interval).
 *
 * @example
 * const fifth: PlacedChordTone = { pitch: 43, name: 'G2', degree: '5', tone: { name: 'G', degree: '5', interval: '5P', pitchClass: 7 } }
 */
export interface PlacedChordTone {
  pitch: number
  name: string
  degree: string
  tone: ChordTone
}

const chordOf = (chord: string | ChordInfo) =>
  typeof chord === 'string' ? parseChord(chord) : chord

function place(pitch: number, tones: readonly ChordTone[]): PlacedChordTone | undefined {
  const tone = tones.find((candidate) => candidate.pitchClass === pitch % 12)
  return tone && { pitch, name: spellPitch(pitch, tone.name), degree: tone.degree, tone }
}

/**
 * Every pitch of a chord's tones inside the window [low, high], ascending, each with its spelled
 * name and degree.
 *
 * @example
 * chordTonesInWindow('C7', { low: 36, high: 48 }).map((tone) => tone.name) // ['C2', 'E2', 'G2', 'Bb2', 'C3']
 */
export function chordTonesInWindow(
  chord: string | ChordInfo,
  window: PitchWindow,
): PlacedChordTone[] {
  assertWindow(window.low, window.high)
  const { tones } = chordOf(chord)
  const placed: PlacedChordTone[] = []
  for (let pitch = window.low; pitch <= window.high; pitch += 1) {
    const found = place(pitch, tones)
    if (found) placed.push(found)
  }
  return placed
}

/**
 * The chord's arpeggio inside a window: from the lowest pitch of its bass tone (the root, or the
 * inverted bass) up through every chord tone to the top of the window. Throws a RangeError when
 * the window holds no bass tone.
 *
 * @example
 * chordArpeggio('C/E', { low: 36, high: 48 }).map((tone) => tone.name) // ['E2', 'G2', 'C3']
 */
export function chordArpeggio(chord: string | ChordInfo, window: PitchWindow): PlacedChordTone[] {
  const info = chordOf(chord)
  const placed = chordTonesInWindow(info, window)
  const start = placed.findIndex((tone) => tone.tone.pitchClass === info.bass.pitchClass)
  if (start === -1) {
    throw new RangeError(`The window holds no ${info.bass.name} to start ${info.symbol} from.`)
  }
  return placed.slice(start)
}

/**
 * Every place of a chord's tones in a fret position [lowFret, highFret] (open strings when
 * lowFret is 0), string by string from the lowest, with the spelled name and degree.
 *
 * @example
 * chordTonesInRegion('G7', { tuning: [28, 33, 38, 43], lowFret: 2, highFret: 5 })[0] // { string: 0, fret: 3, pitch: 31, name: 'G1', degree: '1' }
 */
export function chordTonesInRegion(
  chord: string | ChordInfo,
  region: { tuning: readonly number[]; lowFret: number; highFret: number },
): (FrettedNote & { name: string; degree: string })[] {
  const { tones } = chordOf(chord)
  return positionsInRegion(region.tuning, region.lowFret, region.highFret).flatMap((cell) => {
    const found = place(cell.pitch, tones)
    return found ? [{ ...cell, name: found.name, degree: found.degree }] : []
  })
}
