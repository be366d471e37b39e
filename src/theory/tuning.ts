// Tunings: presets, validation of custom tunings, and the names players give the strings.
import { MIDI_MAX } from './guard'
import { parsePitch, pitchClassName } from './pitch'
import { TUNING_PRESET_DATA, type TuningPresetData } from './tuning-data'
import type { AccidentalPreference } from './types'

/** Fewest strings a tuning may have. @example MIN_STRINGS // 1 */
export const MIN_STRINGS = 1
/** Most strings a tuning may have. @example MAX_STRINGS // 10 */
export const MAX_STRINGS = 10
/** Fewest frets an instrument may have. @example MIN_FRETS // 1 */
export const MIN_FRETS = 1
/** Most frets an instrument may have. @example MAX_FRETS // 30 */
export const MAX_FRETS = 30

/**
 * A tuning preset with its open strings as MIDI pitches, lowest-pitched string first.
 *
 * @example
 * tuningPreset('bass-5').pitches // [23, 28, 33, 38, 43]
 */
export interface TuningPreset extends TuningPresetData {
  pitches: readonly number[]
}

/**
 * Every tuning preset, with MIDI pitches worked out from the note names.
 *
 * @example
 * TUNING_PRESETS[0] // { id: 'bass-4', label: '4-string bass (E A D G)', pitches: [28, 33, 38, 43], ... }
 */
export const TUNING_PRESETS: readonly TuningPreset[] = TUNING_PRESET_DATA.map((preset) => ({
  ...preset,
  pitches: preset.notes.map(parsePitch),
}))

/**
 * Looks up a tuning preset by id; throws a RangeError naming the known ids when there is none.
 *
 * @example
 * tuningPreset('guitar-6').pitches // [40, 45, 50, 55, 59, 64]
 */
export function tuningPreset(id: string): TuningPreset {
  const preset = TUNING_PRESETS.find((candidate) => candidate.id === id)
  if (!preset) {
    const ids = TUNING_PRESETS.map((candidate) => candidate.id).join(', ')
    throw new RangeError(`"${id}" is not a known tuning; choose one of ${ids}.`)
  }
  return preset
}

function stringErrors(tuning: readonly number[]): string[] {
  const errors: string[] = []
  if (tuning.length < MIN_STRINGS || tuning.length > MAX_STRINGS) {
    errors.push(`A tuning needs ${MIN_STRINGS} to ${MAX_STRINGS} strings; got ${tuning.length}.`)
  }
  if (tuning.some((pitch) => !Number.isInteger(pitch) || pitch < 0 || pitch > MIDI_MAX)) {
    errors.push(`Every open string must be a MIDI note number from 0 to ${MIDI_MAX}.`)
  } else if (tuning.some((pitch, index) => index > 0 && pitch < (tuning[index - 1] ?? pitch))) {
    errors.push('List the open strings lowest-pitched first.')
  }
  return errors
}

/**
 * Lists what is wrong with a custom tuning (1–10 strings, lowest-pitched first, open strings and
 * every fretted note within MIDI 0–127, 1–30 frets), as sentences for a form; empty when valid.
 *
 * @example
 * tuningErrors([28, 33, 38, 43], 24) // []
 * tuningErrors([43, 38], 40) // ['List the open strings lowest-pitched first.', 'An instrument needs 1 to 30 frets; got 40.']
 */
export function tuningErrors(tuning: readonly number[], frets: number): string[] {
  const errors = stringErrors(tuning)
  if (!Number.isInteger(frets) || frets < MIN_FRETS || frets > MAX_FRETS) {
    errors.push(`An instrument needs ${MIN_FRETS} to ${MAX_FRETS} frets; got ${String(frets)}.`)
  } else if (errors.length === 0 && Math.max(...tuning) + frets > MIDI_MAX) {
    errors.push(`The highest string's top fret goes above MIDI note ${MIDI_MAX}.`)
  }
  return errors
}

// A quick check without building messages: positionsOf and friends run it on every call.
function stringsAreValid(tuning: readonly number[]): boolean {
  if (tuning.length < MIN_STRINGS || tuning.length > MAX_STRINGS) return false
  let previous = 0
  for (const pitch of tuning) {
    if (!Number.isInteger(pitch) || pitch < previous || pitch > MIDI_MAX) return false
    previous = pitch
  }
  return true
}

/**
 * Throws a RangeError listing every problem `tuningErrors` finds; returns quietly for a valid
 * tuning and fret count.
 *
 * @example
 * assertValidTuning([28, 33, 38, 43], 20) // passes
 * assertValidTuning([], 20) // RangeError: A tuning needs 1 to 10 strings; got 0.
 */
export function assertValidTuning(tuning: readonly number[], frets: number): void {
  const top = tuning[tuning.length - 1] ?? MIDI_MAX
  const fretsFit = Number.isInteger(frets) && frets >= MIN_FRETS && frets <= MAX_FRETS
  if (fretsFit && top + frets <= MIDI_MAX && stringsAreValid(tuning)) return
  const errors = tuningErrors(tuning, frets)
  if (errors.length > 0) throw new RangeError(errors.join(' '))
}

/**
 * Throws a RangeError when the open strings alone are not a valid tuning (used where no fret count
 * is known).
 *
 * @example
 * assertValidStrings([28, 33, 38, 43]) // passes
 */
export function assertValidStrings(tuning: readonly number[]): void {
  if (stringsAreValid(tuning)) return
  const errors = stringErrors(tuning)
  if (errors.length > 0) throw new RangeError(errors.join(' '))
}

/**
 * Reads a custom tuning typed as note names separated by spaces or commas, lowest string first.
 * Throws a RangeError for a bad name or an invalid tuning.
 *
 * @example
 * parseTuning('B0 E1 A1 D2 G2') // [23, 28, 33, 38, 43]
 */
export function parseTuning(text: string): number[] {
  const tuning = text
    .split(/[\s,]+/)
    .filter((name) => name !== '')
    .map(parsePitch)
  assertValidStrings(tuning)
  return tuning
}

/**
 * Names the strings of a tuning as players do: the open note's letter; when a name occurs on more
 * than one string, the lowest of them is "low …" and, if it is the top string, the highest "high …"
 * (guitar: low E … high E; 7-string: low B, low E, A, D, G, B, high E).
 *
 * @example
 * stringNames([28, 33, 38, 43]) // ['E', 'A', 'D', 'G']
 * stringNames([35, 40, 45, 50, 55, 59, 64]) // ['low B', 'low E', 'A', 'D', 'G', 'B', 'high E']
 */
export function stringNames(
  tuning: readonly number[],
  prefer: AccidentalPreference = 'sharp',
): string[] {
  assertValidStrings(tuning)
  const names = tuning.map((pitch) => pitchClassName(pitch, prefer))
  return names.map((name, index) => {
    if (names.indexOf(name) === names.lastIndexOf(name)) return name
    if (names.indexOf(name) === index) return `low ${name}`
    return index === names.length - 1 ? `high ${name}` : name
  })
}

/**
 * The number players give a string: 1 is the highest-pitched string, counting down to the lowest
 * (common practice in method books and TAB). `index` is the tuning's index (0 = lowest string).
 * Throws a RangeError when the index is not a string of the tuning.
 *
 * @example
 * stringNumber(0, 4) // 4 (the low E of a 4-string bass)
 * stringNumber(5, 6) // 1 (the high E of a guitar)
 */
export function stringNumber(index: number, stringCount: number): number {
  if (!Number.isInteger(index) || index < 0 || index >= stringCount)
    throw new RangeError(`There is no string ${index} on a ${stringCount}-string instrument.`)
  return stringCount - index
}
