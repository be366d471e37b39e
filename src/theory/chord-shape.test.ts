import { describe, expect, it } from 'vitest'
import { Chord } from 'tonal'
import { parseChord } from './chord'
import { chordArpeggioInRegion, chordOfSize } from './chord-shape'

const BASS = [28, 33, 38, 43] // E1 A1 D2 G2, 4-string bass in standard tuning (common practice)

describe('chordOfSize', () => {
  // Open Music Theory v2, "Triads" and "Seventh Chords": the triad is root, third and fifth;
  // tonal Chord.get (library) spells the same notes
  it.each([
    ['Dm7', 'Dm', ['D', 'F', 'A']],
    ['G7', 'G', ['G', 'B', 'D']],
    ['Bm7b5', 'Bdim', ['B', 'D', 'F']],
    ['Cdim7', 'Cdim', ['C', 'Eb', 'Gb']],
    ['G7sus4', 'Gsus4', ['G', 'C', 'D']],
  ])('the triad of %s is %s = %j', (symbol, triad, notes) => {
    const shaped = chordOfSize(parseChord(symbol), 'triad')
    expect(shaped.symbol).toBe(triad)
    expect(shaped.tones.map((t) => t.name)).toEqual(notes)
    expect(Chord.get(triad).notes).toEqual(notes)
  })

  // Sixth chords (added sixth): major triad + M6, minor triad + M6 (common practice); tonal agrees
  it.each([
    ['Cmaj7', 'C6', ['C', 'E', 'G', 'A']],
    ['Dm7', 'Dm6', ['D', 'F', 'A', 'B']],
    ['G7', 'G7', ['G', 'B', 'D', 'F']],
  ])('as a sixth chord %s is %s = %j', (symbol, sixth, notes) => {
    const shaped = chordOfSize(parseChord(symbol), 'sixth')
    expect(shaped.symbol).toBe(sixth)
    expect(shaped.tones.map((t) => t.name)).toEqual(notes)
    expect(Chord.get(sixth).notes).toEqual(notes)
  })
})

describe('chordArpeggioInRegion (open string + fret, arithmetic)', () => {
  it('Dm7 in frets 2–6: D2 F2 A2 C3, degrees 1 b3 5 b7 (OMT v2 "Seventh Chords")', () => {
    const tones = chordArpeggioInRegion(parseChord('Dm7'), {
      tuning: BASS,
      lowFret: 2,
      highFret: 6,
    })
    expect(tones.map((t) => t.name)).toEqual(['D2', 'F2', 'A2', 'C3'])
    expect(tones.map((t) => t.degree)).toEqual(['1', 'b3', '5', 'b7'])
  })

  it('a position without the bass tone is a readable RangeError', () => {
    expect(() =>
      chordArpeggioInRegion(parseChord('Cmaj7'), { tuning: BASS, lowFret: 0, highFret: 1 }),
    ).toThrow(RangeError)
  })
})
