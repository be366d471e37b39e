import { describe, expect, it } from 'vitest'
import { Key } from 'tonal'
import {
  ChordsSettingsSchema,
  invertAsAsked,
  progressionChords,
  type ChordsSettings,
} from '../../contract/drills'
import { parseChord, pitchName } from '../../theory'
import { arpeggioIn, chordsSession } from './chords-generator'

const BASS = [28, 33, 38, 43] // E1 A1 D2 G2, 4-string bass in standard tuning (common practice)
const settingsOf = (s: Partial<ChordsSettings> = {}) => ChordsSettingsSchema.parse(s)
const symbols = (list: { chord: { symbol: string } }[]) => list.map((p) => p.chord.symbol)
const names = (tones: { pitch: number; name: string }[]) => tones.map((t) => t.name)

describe('the progression (Levine, The Jazz Theory Book, 1995, the II–V–I chapter, from memory; tonal Key)', () => {
  it('ii–V–I in every key of the cycle of fourths from C: Dm7 G7 Cmaj7, Gm7 C7 Fmaj7 …', () => {
    const chords = progressionChords(settingsOf())
    expect(chords).toHaveLength(36)
    expect(symbols(chords).slice(0, 6)).toEqual(['Dm7', 'G7', 'Cmaj7', 'Gm7', 'C7', 'Fmaj7'])
    // tonal Key.majorKey (library): ii7 V7 Imaj7 of Db
    const db = Key.majorKey('Db').chords
    expect(symbols(chords).slice(15, 18)).toEqual([db[1], db[4], db[0]])
    expect(chords[15]?.key).toEqual({ tonic: 'Db', scale: 'major' })
  })

  it('minor ii–V–i from A around the fifths: Bm7b5 E7 Am7 (common practice)', () => {
    const chords = progressionChords(
      settingsOf({ quality: 'minor', startKey: 'A', cycle: 'fifths' }),
    )
    expect(symbols(chords).slice(0, 3)).toEqual(['Bm7b5', 'E7', 'Am7'])
    expect(chords[3]?.key?.tonic).toBe('E') // the next key a fifth up
  })

  it('the 12-bar blues in every key: F7 ×4 | Bb7 Bb7 F7 F7 | C7 Bb7 F7 C7, then Bb (common practice)', () => {
    const chords = progressionChords(settingsOf({ progression: 'blues', startKey: 'F' }))
    expect(chords).toHaveLength(144)
    expect(symbols(chords).slice(0, 12).join(' ')).toBe('F7 F7 F7 F7 Bb7 Bb7 F7 F7 C7 Bb7 F7 C7')
    expect(chords[12]?.chord.symbol).toBe('Bb7')
  })

  it('an own list keeps its slash chords and has no key', () => {
    const chords = progressionChords(
      settingsOf({ progression: 'custom', customChords: 'Am7 | D7/F# | Gmaj7' }),
    )
    expect(symbols(chords)).toEqual(['Am7', 'D7/F#', 'Gmaj7'])
    expect(chords[1]?.chord.inversion).toBe(1)
    expect(chords[0]?.key).toBeNull()
  })
})

describe('inversion', () => {
  it('inversions put the 3rd, 5th or 7th in the bass; a triad has no 3rd inversion (common practice)', () => {
    const g7 = parseChord('G7')
    expect(invertAsAsked(g7, 'first', 0).symbol).toBe('G7/B')
    expect(invertAsAsked(g7, 'third', 0).symbol).toBe('G7/F')
    expect(invertAsAsked(parseChord('C'), 'third', 0).symbol).toBe('C')
    expect([0, 1, 2, 3, 4].map((i) => invertAsAsked(g7, 'rotate', i).bass.name)).toEqual([
      'G',
      'B',
      'D',
      'F',
      'G',
    ])
    expect(invertAsAsked(parseChord('C/E'), 'root', 0).symbol).toBe('C/E')
  })
})

describe('arpeggios in a position or a window (open string + fret, arithmetic)', () => {
  const position = settingsOf({ area: 'position', lowFret: 2, highFret: 6 })

  it.each([
    // frets 2–6 hold F#1–A#1, B1–D#2, E2–G#2, A2–C#3: from the lowest bass tone up
    ['Dm7', ['D2', 'F2', 'A2', 'C3']],
    ['G7', ['G1', 'B1', 'D2', 'F2', 'G2', 'B2']],
    ['Cmaj7', ['C2', 'E2', 'G2', 'B2', 'C3']],
    ['Cmaj7/E', ['E2', 'G2', 'B2', 'C3']],
  ])('%s in frets 2–6 of a 4-string bass: %j', (symbol, expected) => {
    const tones = arpeggioIn(parseChord(symbol), position, BASS)
    expect(names(tones)).toEqual(expected)
    expect(tones.map((t) => pitchName(t.pitch, 'flat'))).toEqual(expected)
  })

  it('skips chord tones the position does not hold: frets 5–8 have no C#2 … (fourths, 4 frets)', () => {
    // frets 5–8: A1–C2, D2–F2, G2–Bb2, C3–Eb3; A7 = A C# E G: C#2 (37) is not there
    const tones = arpeggioIn(parseChord('A7'), settingsOf({ lowFret: 5, highFret: 8 }), BASS)
    expect(names(tones)).toEqual(['A1', 'E2', 'G2', 'A2', 'C#3'])
  })

  it('in a window: C7 in C2–C3 is C2 E2 G2 Bb2 C3 (OMT v2 "Seventh Chords")', () => {
    const window = settingsOf({ area: 'window', low: 36, high: 48 })
    expect(names(arpeggioIn(parseChord('C7'), window, BASS))).toEqual([
      'C2',
      'E2',
      'G2',
      'Bb2',
      'C3',
    ])
  })

  it('a position without the bass tone is a readable RangeError', () => {
    const open = settingsOf({ lowFret: 0, highFret: 1 })
    expect(() => arpeggioIn(parseChord('Cmaj7'), open, BASS)).toThrow(
      'Frets 0–1 hold no C to start Cmaj7 from; move or widen the position.',
    )
  })
})

describe('a session', () => {
  it('plays whole chords until the count, and says where the next session starts', () => {
    const settings = settingsOf({ lowFret: 2, highFret: 6, questionCount: 8 })
    const { questions, next } = chordsSession(settings, BASS)
    expect(questions.map((q) => `${q.chord} ${q.degree}`)).toEqual([
      'Dm7 1',
      'Dm7 b3',
      'Dm7 5',
      'Dm7 b7',
      'G7 1',
      'G7 3',
      'G7 5',
      'G7 b7',
      'G7 1',
      'G7 3',
    ])
    expect(next).toBe(2)
    expect(questions[1]?.detail).toEqual({
      chord: 'Dm7',
      chordType: 'minor seventh',
      degree: 'b3',
      inversion: 0,
      key: 'C',
    })
    const later = chordsSession(settings, BASS, next)
    expect(later.questions[0]?.chord).toBe('Cmaj7')
  })

  it('wraps round the end of the progression', () => {
    const settings = settingsOf({ progression: 'custom', customChords: 'C F', questionCount: 1 })
    expect(chordsSession(settings, BASS, 1).next).toBe(0)
    expect(chordsSession(settings, BASS, 1).questions[0]?.chord).toBe('F')
  })
})
