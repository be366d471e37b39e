// What each cell says: its label (a note name spelled in the key, a scale degree, or nothing) and
// the accessible name a screen reader announces ("A string, fret 5").
import {
  pitchName,
  scaleDegreeOf,
  spellInKey,
  stringNames,
  stringNumber,
  toUnicode,
  type AccidentalPreference,
} from '@/theory'
import type { LabelMode, MarkKind } from './fretboard-types'

export interface LabelOptions {
  mode: LabelMode
  keyTonic?: string
  keyScale?: string
  accidentals: AccidentalPreference
}

// A key needs both parts, and a bad one must not break the board: fall back to plain names.
function keyOf(options: LabelOptions): { tonic: string; scale: string } | null {
  if (!options.keyTonic || !options.keyScale) return null
  try {
    spellInKey(60, options.keyTonic, options.keyScale)
    return { tonic: options.keyTonic, scale: options.keyScale }
  } catch {
    return null
  }
}

/** Drops the octave number: the board shows pitch classes ("E♭", not "E♭2"). */
const withoutOctave = (name: string) => name.replace(/-?\d+$/, '')

/**
 * Makes the label function for one set of options: note names with ♯/♭ glyphs spelled in the key
 * (or by the sharps/flats preference), scale degrees (blank off the scale), or nothing.
 */
export function labelMaker(options: LabelOptions): (pitch: number) => string {
  const key = keyOf(options)
  if (options.mode === 'none' || (options.mode === 'degrees' && !key)) return () => ''
  if (options.mode === 'degrees' && key) {
    return (pitch) => String(scaleDegreeOf(pitch, key.tonic, key.scale) ?? '')
  }
  return (pitch) =>
    toUnicode(
      withoutOctave(
        key ? spellInKey(pitch, key.tonic, key.scale) : pitchName(pitch, options.accidentals),
      ),
    )
}

/** "A string", "low E string", "high E string": names from the tuning, duplicates told apart. */
export function stringLabels(tuning: number[], accidentals: AccidentalPreference): string[] {
  try {
    return stringNames(tuning, accidentals).map((name) => `${toUnicode(name)} string`)
  } catch {
    return tuning.map((_, index) => `String ${stringNumber(index, tuning.length)}`)
  }
}

const MARK_WORDS: Record<MarkKind, string> = {
  correct: 'correct',
  wrong: 'wrong',
  target: 'target',
  highlight: 'highlighted',
  selected: 'selected',
  hint: 'hint',
  root: 'root',
}

/** The accessible name of a cell: place first, then what it shows ("A string, fret 5, D, correct"). */
export function cellName(place: string, label: string, kinds: MarkKind[]): string {
  return [place, label, ...kinds.map((kind) => MARK_WORDS[kind])].filter(Boolean).join(', ')
}
