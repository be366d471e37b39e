import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { instrumentRange, noteAt, positionsInRegion, positionsOf } from './fretboard'
import { parsePitch } from './pitch'

const BASS = [28, 33, 38, 43] // E1 A1 D2 G2 (common practice)
const GUITAR = [40, 45, 50, 55, 59, 64] // E2 A2 D3 G3 B3 E4 (common practice)

// A random valid tuning: 1–10 strings, lowest first, and a fret count keeping notes in MIDI.
const tuningAndFrets = fc
  .tuple(
    fc.array(fc.integer({ min: 0, max: 90 }), { minLength: 1, maxLength: 10 }),
    fc.integer({ min: 1, max: 30 }),
  )
  .map(([pitches, frets]) => ({
    tuning: [...pitches].sort((a, b) => a - b),
    frets: Math.min(frets, 127 - Math.max(...pitches)),
  }))

describe('noteAt (PRODUCT.md: note at string s, fret f = open[s] + f)', () => {
  it.each([
    [BASS, 0, 0, 'E1'],
    [BASS, 1, 12, 'A2'],
    [BASS, 3, 20, 'Eb4'],
    [GUITAR, 5, 0, 'E4'],
    [GUITAR, 4, 1, 'C4'],
  ])('%j string %i fret %i = %s (arithmetic)', (tuning, string, fret, name) => {
    expect(noteAt(tuning, string, fret)).toBe(parsePitch(name))
  })

  it.each([
    [4, 0],
    [-1, 0],
    [0, -1],
    [0, 31],
    [0, 1.5],
  ])('throws a RangeError for string %f, fret %f on a 4-string bass', (string, fret) => {
    expect(() => noteAt(BASS, string, fret)).toThrow(RangeError)
  })
})

describe('positionsOf', () => {
  it('A2 on a 24-fret 4-string bass: E 17, A 12, D 7, G 2 (arithmetic, REFERENCES.md)', () => {
    expect(positionsOf(BASS, 24, parsePitch('A2'))).toEqual([
      { string: 0, fret: 17 },
      { string: 1, fret: 12 },
      { string: 2, fret: 7 },
      { string: 3, fret: 2 },
    ])
  })

  it('E4 on a 24-fret guitar: E 24, A 19, D 14, G 9, B 5, E 0 (arithmetic, REFERENCES.md)', () => {
    expect(positionsOf(GUITAR, 24, parsePitch('E4'))).toEqual(
      [24, 19, 14, 9, 5, 0].map((fret, string) => ({ string, fret })),
    )
  })

  it('is empty out of reach and throws for a bad pitch or tuning', () => {
    expect(positionsOf(BASS, 20, 27)).toEqual([]) // arithmetic: Eb1 is below the open E1
    expect(positionsOf(BASS, 20, 64)).toEqual([]) // arithmetic: G2 + 20 = Eb4 = 63
    expect(() => positionsOf(BASS, 20, 128)).toThrow(RangeError)
    expect(() => positionsOf([43, 28], 20, 40)).toThrow(/lowest-pitched first/)
  })

  it('round-trips through noteAt (property)', () => {
    fc.assert(
      fc.property(tuningAndFrets, fc.integer({ min: 0, max: 127 }), ({ tuning, frets }, pitch) => {
        const positions = positionsOf(tuning, frets, pitch)
        positions.forEach((position) =>
          expect(noteAt(tuning, position.string, position.fret)).toBe(pitch),
        )
        const strings = positions.map((position) => position.string)
        expect(strings).toEqual([...new Set(strings)].sort((a, b) => a - b))
      }),
    )
  })

  it('finds every fretboard cell that sounds the pitch (property: noteAt → positionsOf)', () => {
    fc.assert(
      fc.property(tuningAndFrets, fc.nat(), fc.nat(), ({ tuning, frets }, s, f) => {
        const string = s % tuning.length
        const fret = f % (frets + 1)
        expect(positionsOf(tuning, frets, noteAt(tuning, string, fret))).toContainEqual({
          string,
          fret,
        })
      }),
    )
  })
})

describe('instrumentRange (PRODUCT.md: lowest open string to highest open string + frets)', () => {
  it.each([
    [BASS, 24, 'E1', 'G4'],
    [BASS, 20, 'E1', 'Eb4'],
    [GUITAR, 22, 'E2', 'D6'],
    [[23, 28, 33, 38, 43], 24, 'B0', 'G4'],
  ])('%j with %i frets spans %s–%s (arithmetic)', (tuning, frets, low, high) => {
    expect(instrumentRange(tuning, frets)).toEqual({ low: parsePitch(low), high: parsePitch(high) })
  })

  it('throws a RangeError for a bad fret count', () => {
    expect(() => instrumentRange(BASS, 0)).toThrow(RangeError)
  })
})

describe('positionsInRegion', () => {
  it('lists every cell of a region with its pitch, by string then fret (arithmetic)', () => {
    const region = positionsInRegion(BASS, 5, 7)
    expect(region).toHaveLength(12)
    expect(region[0]).toEqual({ string: 0, fret: 5, pitch: 33 })
    expect(region.at(-1)).toEqual({ string: 3, fret: 7, pitch: 50 })
    region.forEach((cell) => expect(noteAt(BASS, cell.string, cell.fret)).toBe(cell.pitch))
  })

  it('throws a RangeError for an upside-down region', () => {
    expect(() => positionsInRegion(BASS, 7, 5)).toThrow(RangeError)
  })
})
