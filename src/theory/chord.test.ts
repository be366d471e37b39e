import { describe, expect, it } from 'vitest'
import { Chord } from 'tonal'
import { chordDegree, chordFromBass, invertChord, parseChord } from './chord'
import { CHORD_TYPES } from './chord-data'

const names = (symbol: string) => parseChord(symbol).tones.map((tone) => tone.name)
const degrees = (symbol: string) => parseChord(symbol).tones.map((tone) => tone.degree)

describe('parseChord: spellings against a harmony text', () => {
  // Open Music Theory, version 2 (Gotham et al.), Fundamentals, "Triads": major = M3 + P5,
  // minor = m3 + P5, diminished = m3 + d5, augmented = M3 + A5 above the root (from memory)
  it.each([
    ['C', ['C', 'E', 'G'], ['1', '3', '5']],
    ['Cm', ['C', 'Eb', 'G'], ['1', 'b3', '5']],
    ['Cdim', ['C', 'Eb', 'Gb'], ['1', 'b3', 'b5']],
    ['Caug', ['C', 'E', 'G#'], ['1', '3', '#5']],
  ])('triad %s = %j, degrees %j', (symbol, tones, chordDegrees) => {
    expect(names(symbol)).toEqual(tones)
    expect(degrees(symbol)).toEqual(chordDegrees)
  })

  // Open Music Theory, version 2 (Gotham et al.), Fundamentals, "Seventh Chords": major seventh
  // M3 P5 M7; dominant seventh M3 P5 m7; minor seventh m3 P5 m7; diminished seventh m3 d5 d7;
  // half-diminished seventh m3 d5 m7; lead-sheet symbols maj7 or △7, 7, m7, dim7 or °7, ⦰7
  it.each([
    ['Gmaj7', ['G', 'B', 'D', 'F#'], ['1', '3', '5', '7']],
    ['G△7', ['G', 'B', 'D', 'F#'], ['1', '3', '5', '7']],
    ['B7', ['B', 'D#', 'F#', 'A'], ['1', '3', '5', 'b7']],
    ['F#m7', ['F#', 'A', 'C#', 'E'], ['1', 'b3', '5', 'b7']],
    ['Ddim7', ['D', 'F', 'Ab', 'Cb'], ['1', 'b3', 'b5', 'bb7']],
    ['D°7', ['D', 'F', 'Ab', 'Cb'], ['1', 'b3', 'b5', 'bb7']],
    ['A⦰7', ['A', 'C', 'Eb', 'G'], ['1', 'b3', 'b5', 'b7']],
    ['Am7b5', ['A', 'C', 'Eb', 'G'], ['1', 'b3', 'b5', 'b7']],
  ])('seventh chord %s = %j, degrees %j', (symbol, tones, chordDegrees) => {
    expect(names(symbol)).toEqual(tones)
    expect(degrees(symbol)).toEqual(chordDegrees)
  })

  it.each([
    ['Bbm7b5', ['Bb', 'Db', 'Fb', 'Ab']], // the fifth of Bb diminished is Fb, not E (OMT: d5)
    ['Cdim7', ['C', 'Eb', 'Gb', 'Bbb']], // the diminished seventh is Bbb, not A (OMT: d7)
    ['C#7', ['C#', 'E#', 'G#', 'B']], // the major third of C# is E# (OMT: M3)
    ['Ebm6', ['Eb', 'Gb', 'Bb', 'C']], // minor sixth chord: m3 P5 M6 (common practice)
    ['CmMaj7', ['C', 'Eb', 'G', 'B']], // minor triad with a major seventh (common practice)
    ['Asus4', ['A', 'D', 'E']],
    ['G7sus4', ['G', 'C', 'D', 'F']],
  ])('%s is spelled %j', (symbol, tones) => {
    expect(names(symbol)).toEqual(tones)
  })
})

describe('parseChord: agrees with tonal Chord.get (library)', () => {
  const roots = ['C', 'F#', 'Bb', 'Db', 'E', 'G#', 'Ab', 'B']
  it.each(CHORD_TYPES.map((type) => [type.suffix, type.tonal] as const))(
    'suffix %j (tonal %s) on eight roots',
    (suffix, tonalName) => {
      for (const root of roots) {
        const ours = parseChord(`${root}${suffix}`)
        const theirs = Chord.get(`${root}${suffix}`)
        expect(ours.type).toBe(tonalName)
        expect(theirs.type).toBe(tonalName)
        expect(ours.tones.map((tone) => tone.name)).toEqual(theirs.notes)
        expect(ours.symbol).toBe(`${root}${suffix}`)
      }
    },
  )

  it('reads other spellings of the same suffix as tonal does', () => {
    expect(parseChord('C-7').symbol).toBe('Cm7')
    expect(parseChord('CM7').symbol).toBe('Cmaj7')
    expect(parseChord('Cø').symbol).toBe('Cm7b5')
    expect(parseChord('c♯m7').symbol).toBe('C#m7')
  })
})

describe('inversions (common practice: 1st puts the third in the bass, 2nd the fifth, 3rd the seventh)', () => {
  it.each([
    ['C/E', 1, 'E', ['E', 'G', 'C']],
    ['C/G', 2, 'G', ['G', 'C', 'E']],
    ['Am7/G', 3, 'G', ['G', 'A', 'C', 'E']],
    ['Dm7', 0, 'D', ['D', 'F', 'A', 'C']],
  ])('%s: inversion %i, bass %s, from the bass %j', (symbol, inversion, bass, fromBass) => {
    const chord = parseChord(symbol)
    expect(chord.inversion).toBe(inversion)
    expect(chord.bass.name).toBe(bass)
    expect(chordFromBass(chord).map((tone) => tone.name)).toEqual(fromBass)
    // tonal Chord.get reads the slash chord with the same bass and notes (library)
    expect(Chord.get(symbol).notes[0] ?? Chord.get(symbol).tonic).toBe(bass)
  })

  it('invertChord names the slash chord and refuses an inversion the chord does not have', () => {
    expect(invertChord('G7', 3).symbol).toBe('G7/F')
    expect(invertChord('G7/B', 0).symbol).toBe('G7')
    expect(() => invertChord('C', 3)).toThrow('C has inversions 0 to 2; got 3.')
  })
})

describe('chordDegree (interval number, flats below major/perfect, sharps above)', () => {
  it.each([
    ['1P', '1'],
    ['3m', 'b3'],
    ['5d', 'b5'],
    ['5A', '#5'],
    ['7d', 'bb7'],
    ['6M', '6'],
    ['9m', 'b9'],
    ['11A', '#11'],
    ['8P', '1'],
  ])('%s → %s', (interval, degree) => {
    expect(chordDegree(interval)).toBe(degree)
  })
})

describe('parseChord: readable errors', () => {
  it.each([
    ['H7', /not a chord symbol/],
    ['', /not a chord symbol/],
    ['Cxyz', /not a chord symbol/],
    ['C##7', /not a chord symbol/], // roots take at most one accidental
    ['C/D', 'In C/D the bass D is not a chord tone (C E G).'],
    ['Cbdim7', 'Cbdim7 would need Bbbb, more than a double accidental; write it on B instead.'],
  ])('%j → %s', (symbol, message) => {
    expect(() => parseChord(symbol)).toThrow(RangeError)
    expect(() => parseChord(symbol)).toThrow(message)
  })
})
