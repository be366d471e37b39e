import { describe, expect, it } from 'vitest'
import { noteAt } from '../theory'
import {
  BASS,
  cycleExercise,
  GUITAR,
  rangeRunExercise,
  scatterExercise,
} from '../../tests/helpers/exercises'
import { assertExercise } from './exercise'
import { placeOnNeck } from '../theory/neck-placement'

describe('exerciseFromRangeRun', () => {
  const { overview, fingering, exercise } = rangeRunExercise()

  it('plays the run up and back down, the top note once (PRODUCT.md, range run)', () => {
    const up = overview.run
    expect(exercise.notes.map((n) => n.pitch)).toEqual([...up, ...up.slice(0, -1).reverse()])
    expect(exercise.notes).toHaveLength(2 * up.length - 1)
  })

  it('places every note where the fingering does: open string + fret (arithmetic)', () => {
    exercise.notes.slice(0, overview.run.length).forEach((note, index) => {
      expect({ string: note.string, fret: note.fret }).toEqual(fingering.positions[index])
      expect(noteAt(BASS.tuning, note.string!, note.fret!)).toBe(note.pitch)
    })
    expect(() => assertExercise(exercise)).not.toThrow()
  })

  it('carries G major: one sharp (Schmidt-Jones, circle of fifths), bass, 4/4', () => {
    expect(exercise).toMatchObject({
      keyFifths: 1,
      mode: 'major',
      instrument: 'bass',
      beatsPerMeasure: 4,
    })
    expect(exercise.title).toContain('G major range run, frets 2–5')
  })
})

describe('exerciseFromScatter', () => {
  it('keeps the sequence and its spelling, each note on a string and fret that sound it', () => {
    const { scatter, exercise } = scatterExercise()
    expect(exercise.notes.map((n) => n.name)).toEqual(scatter.names)
    for (const note of exercise.notes)
      expect(BASS.tuning[note.string!]! + note.fret!).toBe(note.pitch)
    // Eb minor: six flats (Schmidt-Jones)
    expect(exercise.keyFifths).toBe(-6)
    expect(exercise.mode).toBe('minor')
  })
})

describe('exerciseFromWindowCycle', () => {
  const { keys, exercise } = cycleExercise()

  it('holds every key root to octave in order, names above each key and "fold" on folded notes', () => {
    expect(exercise.notes.map((n) => n.pitch)).toEqual(keys.flatMap((k) => k.pitches))
    const starts = keys.map((_, i) => i * 8)
    expect(starts.map((i) => exercise.notes[i]!.text)).toEqual(keys.map((k) => `${k.tonic} major`))
    const folded = keys.flatMap((k) => k.displaced.map((d, i) => d && i > 0))
    exercise.notes.forEach((note, i) => expect(note.text === 'fold').toBe(folded[i]))
  })

  it('changes the key signature at each later key: C F Bb Eb = 0, −1, −2, −3 (Schmidt-Jones)', () => {
    expect(exercise.keyFifths).toBe(0)
    expect([8, 16, 24].map((i) => exercise.notes[i]!.keyFifths)).toEqual([-1, -2, -3])
  })

  it('names the window in the title', () => {
    expect(exercise.title).toBe('Window Cycle, major, window E1–C3')
  })
})

describe('placeOnNeck', () => {
  it('starts on the lowest fret and then stays near the hand (arithmetic: open string + fret)', () => {
    // A2 (45) on a bass: E 17, A 12, D 7, G 2 (REFERENCES.md) → G string, fret 2 first.
    expect(placeOnNeck([45, 47], BASS.tuning, 20)).toEqual([
      { string: 3, fret: 2 },
      { string: 3, fret: 4 },
    ])
  })

  it('crosses strings inside one hand position instead of climbing a string', () => {
    // C major from C2 (A string, fret 3): the hand covers frets 2–5 and open strings are free, so
    // D2 and G2 are open strings, E2 D 2, F2 D 3, A2 G 2, B2 G 4 (open string + fret, arithmetic).
    const run = [36, 38, 40, 41, 43, 45, 47]
    expect(placeOnNeck(run, BASS.tuning, 20).map((p) => `${p.string}:${p.fret}`)).toEqual([
      '1:3',
      '2:0',
      '2:2',
      '2:3',
      '3:0',
      '3:2',
      '3:4',
    ])
  })

  it('refuses a pitch out of reach, naming it', () => {
    // The guitar's lowest note is E2 (40): D2 (38) is out of reach.
    expect(() => placeOnNeck([38], GUITAR.tuning, 22)).toThrow('D2 is out of reach')
  })
})
