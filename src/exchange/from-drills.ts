// Turns today's generated drill exercises (Range Runs, Octave Scatter, Window Cycle) into the generic
// exercise the notation, MusicXML and MIDI exports read.
import {
  pitchName,
  scaleTypeName,
  type Fingering,
  type Instrument,
  type Scatter,
  type WindowKey,
} from '../theory'
import type { Exercise, ExerciseNote } from './exercise'
import { keyFifths, keyMode } from './key-signature'
import { placeOnNeck } from '../theory/neck-placement'
import { instrumentOfTuning } from './spelled-note'

/** The instrument an export is for: its tuning, fret count and (when known) its kind. */
export interface ExportNeck {
  tuning: readonly number[]
  frets: number
  instrument?: Instrument
}

/** Choices shared by the adapters: tempo (quarter notes per minute), note length, a title. */
export interface ExportOptions {
  tempo?: number
  durationBeats?: number
  title?: string
}

const DEFAULT_TEMPO = 72

function frame(
  neck: ExportNeck,
  tonic: string,
  scale: string,
  options: ExportOptions,
  title: string,
): Omit<Exercise, 'notes'> {
  return {
    title: options.title ?? title,
    tempo: options.tempo ?? DEFAULT_TEMPO,
    keyFifths: keyFifths(tonic, scale),
    mode: keyMode(tonic, scale),
    instrument: neck.instrument ?? instrumentOfTuning(neck.tuning),
    tuning: [...neck.tuning],
    beatsPerMeasure: 4,
  }
}

/** What a Range Run export needs from the drill: the run, its spelled names, one fingering. */
export interface RangeRunSource {
  run: readonly number[]
  names: readonly string[]
  fingering: Fingering
  tonic: string
  scale: string
  lowFret: number
  highFret: number
}

/**
 * A Range Run as played in the drill: up from the lowest note of the position to the highest and
 * back down (the top note once), each note where the fingering puts it.
 *
 * @example
 * exerciseFromRangeRun({ run, names, fingering, tonic: 'G', scale: 'major', lowFret: 2, highFret: 5 }, { tuning: [28, 33, 38, 43], frets: 20 })
 * // { title: 'G major range run, frets 2–5, fingering 2-3-3-…', notes: [{ pitch: 30, name: 'F#1', string: 0, fret: 2, … }, …] }
 */
export function exerciseFromRangeRun(
  source: RangeRunSource,
  neck: ExportNeck,
  options: ExportOptions = {},
): Exercise {
  const up = source.run.map((_, index) => index)
  const order = [...up, ...up.slice(0, -1).reverse()]
  const notes = order.map((index): ExerciseNote => {
    const pitch = source.run[index] ?? 0
    const place = source.fingering.positions[index]
    return {
      pitch,
      name: source.names[index] ?? pitchName(pitch),
      ...(place ? { string: place.string, fret: place.fret } : {}),
      durationBeats: options.durationBeats ?? 1,
    }
  })
  const title = `${source.tonic} ${scaleTypeName(source.scale)} range run, frets ${source.lowFret}–${source.highFret}, fingering ${source.fingering.pattern}`
  return { ...frame(neck, source.tonic, source.scale, options, title), notes }
}

function placedNotes(
  pitches: readonly number[],
  names: readonly string[],
  neck: ExportNeck,
  durationBeats: number,
): ExerciseNote[] {
  const places = placeOnNeck(pitches, neck.tuning, neck.frets)
  return pitches.map((pitch, index) => ({
    pitch,
    name: names[index] ?? pitchName(pitch),
    string: places[index]?.string ?? 0,
    fret: places[index]?.fret ?? 0,
    durationBeats,
  }))
}

/**
 * An Octave Scatter sequence (root to root, each note in its drawn octave), placed on the neck
 * where the hand moves least.
 *
 * @example
 * exerciseFromScatter(octaveScatter({ low: 28, high: 63, tonic: 'A', scale: 'minor', seed: 7 }), { tuning: [28, 33, 38, 43], frets: 20 })
 */
export function exerciseFromScatter(
  scatter: Scatter,
  neck: ExportNeck,
  options: ExportOptions = {},
): Exercise {
  const notes = placedNotes(scatter.pitches, scatter.names, neck, options.durationBeats ?? 1)
  const title = `${scatter.tonic} ${scatter.scale} octave scatter`
  return { ...frame(neck, scatter.tonic, scatter.scale, options, title), notes }
}

/** What a Window Cycle export needs: the keys as played, their scale and the window. */
export interface WindowCycleSource {
  keys: readonly WindowKey[]
  scale: string
  low: number
  high: number
}

/**
 * A Window Cycle: every key in order, root to octave, with the key signature changing at each key,
 * the key named above its first note and each folded note marked "fold".
 *
 * @example
 * const keys = keyCycleInWindow({ low: 28, high: 48, tonics: ['C', 'F'], scale: 'major' })
 * exerciseFromWindowCycle({ keys, scale: 'major', low: 28, high: 48 }, { tuning: [28, 33, 38, 43], frets: 20 })
 */
export function exerciseFromWindowCycle(
  source: WindowCycleSource,
  neck: ExportNeck,
  options: ExportOptions = {},
): Exercise {
  const { keys, scale } = source
  const first = keys[0]
  if (!first) throw new RangeError('A window cycle needs at least one key.')
  const pitches = keys.flatMap((key) => key.pitches)
  const names = keys.flatMap((key) => key.names)
  const notes = placedNotes(pitches, names, neck, options.durationBeats ?? 1)
  let at = 0
  keys.forEach((key, keyIndex) => {
    key.displaced.forEach((folded, index) => {
      const note = notes[at + index] as ExerciseNote
      if (index === 0) note.text = `${key.tonic} ${scale}`
      else if (folded) note.text = 'fold'
      if (index === 0 && keyIndex > 0) note.keyFifths = keyFifths(key.tonic, scale)
    })
    at += key.pitches.length
  })
  const window = `${pitchName(source.low)}–${pitchName(source.high)}`
  const title = `Window Cycle, ${scale}, window ${window}`
  return { ...frame(neck, first.tonic, scale, options, title), notes }
}
