import { describe, expect, it } from 'vitest'
import { lowestScaleTone, rangeRun } from './range-run'
import { noteAt } from './fretboard'
import { parsePitch } from './pitch'
import { scalePitchClasses } from './scale'

const BASS = [28, 33, 38, 43] // E1 A1 D2 G2 (common practice)
const FIVE_STRING = [23, 28, 33, 38, 43] // B0 E1 A1 D2 G2 (common practice)

describe('lowestScaleTone (awkward keys)', () => {
  it('4-string bass, E-flat minor → F1, degree 2 (a teacher’s rule of thumb + arithmetic)', () => {
    expect(lowestScaleTone(BASS, 20, 'Eb', 'minor')).toEqual({ pitch: 29, name: 'F1', degree: 2 })
  })

  // arithmetic: the lowest note is E1 (28); walk up until the first pitch class in the scale
  it.each([
    ['Eb', 'major', 'F1', 2], // Eb F G Ab Bb C D: E1 no, F1 yes
    ['Ab', 'major', 'F1', 6], // Ab Bb C Db Eb F G
    ['Db', 'major', 'F1', 3], // Db Eb F Gb Ab Bb C
    ['Gb', 'major', 'F1', 7], // Gb Ab Bb Cb Db Eb F
    ['F', 'major', 'E1', 7], // F G A Bb C D E
    ['B', 'major', 'E1', 4], // B C# D# E F# G# A#
    ['Cb', 'major', 'Fb1', 4], // Cb Db Eb Fb …: E1 spelled Fb1 (octave follows the letter)
    ['E', 'major', 'E1', 1],
  ])('4-string bass, %s %s → %s, degree %i', (tonic, scale, name, degree) => {
    expect(lowestScaleTone(BASS, 20, tonic, scale)).toEqual({
      pitch: parsePitch(name),
      name,
      degree,
    })
  })

  it('5-string bass (B0), C major → B0, degree 7 (arithmetic)', () => {
    expect(lowestScaleTone(FIVE_STRING, 24, 'C', 'major')).toEqual({
      pitch: 23,
      name: 'B0',
      degree: 7,
    })
  })

  it('throws a RangeError when the range holds none of the scale', () => {
    // arithmetic: one string E1 with 1 fret offers E1 and F1 only; C major pentatonic is C D E G A
    expect(lowestScaleTone([28], 1, 'C', 'major pentatonic').name).toBe('E1')
    expect(() => lowestScaleTone([29], 1, 'C', 'major pentatonic')).toThrow(/holds no note/) // F1, F#1
    expect(() => lowestScaleTone(BASS, 20, 'Fb', 'major')).toThrow(RangeError)
  })
})

describe('rangeRun', () => {
  it('G major, frets 2–5 on a 4-string bass (worked by hand: open string + fret, keep G A B C D E F#)', () => {
    // E string 30 31 (32) 33 · A string 35 36 (37) 38 · D string 40 (41) 42 43 · G string 45 (46) 47 48
    const expected = ['F#1', 'G1', 'A1', 'B1', 'C2', 'D2', 'E2', 'F#2', 'G2', 'A2', 'B2', 'C3']
    expect(rangeRun({ tuning: BASS, lowFret: 2, highFret: 5, tonic: 'G', scale: 'major' })).toEqual(
      expected.map(parsePitch),
    )
  })

  it('counts open strings when lowFret is 0 and drops duplicates (E major, frets 0–4, by hand)', () => {
    // E string 28 (29) 30 (31) 32 · A 33 (34) 35 (36) 37 · D (38) 39 40 (41) 42 · G (43) 44 45 (46) 47
    expect(rangeRun({ tuning: BASS, lowFret: 0, highFret: 4, tonic: 'E', scale: 'major' })).toEqual(
      [28, 30, 32, 33, 35, 37, 39, 40, 42, 44, 45, 47],
    )
    // arithmetic: fret 5 of E equals the open A, so frets 0–5 add only notes above 47 once
    const wider = rangeRun({
      tuning: BASS,
      lowFret: 0,
      highFret: 5,
      tonic: 'C',
      scale: 'chromatic',
    })
    expect(wider).toEqual(Array.from({ length: 48 - 28 + 1 }, (_, k) => 28 + k))
  })

  it('G major, frets 5–8: the complete run A1 to D3, F#2 and B2 included (PRODUCT.md "Range run")', () => {
    // By string (open string + fret, arithmetic): E 33–36 → A1 B1 C2; A 38–41 → D2 E2; D 43–46 →
    // G2 A2; G 48–51 → C3 D3. The box lacks F#2 (D fret 4 / A fret 9) and B2 (G fret 4 / D fret 9);
    // the run is every G major note (G A B C D E F#, Gardner) from A1 to D3.
    const run = rangeRun({ tuning: BASS, lowFret: 5, highFret: 8, tonic: 'G', scale: 'major' })
    expect(run).toEqual(
      ['A1', 'B1', 'C2', 'D2', 'E2', 'F#2', 'G2', 'A2', 'B2', 'C3', 'D3'].map(parsePitch),
    )
  })

  it('holds every scale pitch between the lowest and highest scale note of the region (cell by cell)', () => {
    const options = {
      tuning: [40, 45, 50, 55, 59, 64],
      lowFret: 7,
      highFret: 10,
      tonic: 'Bb',
      scale: 'dorian',
    }
    const run = rangeRun(options)
    const classes = scalePitchClasses('Bb', 'dorian')
    const cells = options.tuning.flatMap((_, string) =>
      [7, 8, 9, 10].map((fret) => noteAt(options.tuning, string, fret)),
    )
    const inRegion = cells.filter((pitch) => classes.includes(pitch % 12))
    const [lowest, highest] = [Math.min(...inRegion), Math.max(...inRegion)]
    expect(run).toEqual(
      Array.from({ length: highest - lowest + 1 }, (_, k) => lowest + k).filter((pitch) =>
        classes.includes(pitch % 12),
      ),
    )
    expect(run.length).toBeGreaterThan(new Set(inRegion).size) // the guitar box has holes too
  })

  it.each([
    [5, 2],
    [-1, 3],
    [0, 31],
  ])('throws a RangeError for frets %i–%i', (lowFret, highFret) => {
    expect(() => rangeRun({ tuning: BASS, lowFret, highFret, tonic: 'C', scale: 'major' })).toThrow(
      RangeError,
    )
  })
})
