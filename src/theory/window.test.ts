import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { Note, Scale, ScaleType } from 'tonal'
import { parsePitch } from './pitch'
import { TONICS } from './scale-data'
import { keyCycleInWindow, missingPitchClasses, widenWindow, windowFromFrets } from './window'

const FOURTHS = ['C', 'F', 'Bb', 'Eb', 'Ab', 'Db', 'Gb', 'B', 'E', 'A', 'D', 'G'] // PRODUCT.md

describe('keyCycleInWindow: the worked example C2–C3 in fourths, major', () => {
  // Window C2 (36) to C3 (48), inclusive: 13 semitones, so it holds all 12 pitch classes
  // (REFERENCES.md, arithmetic). Rules from PRODUCT.md ("Window cycle"); all numbers are arithmetic.
  // Each row: the key, the notes played, the index of the folded (displaced) note, and why.
  const WORKED: [string, string, number | null][] = [
    // First key: start on the lowest C in the window, C2. Every step stays at or under C3: no fold.
    ['C', 'C2 D2 E2 F2 G2 A2 B2 C3', null],
    // Last note C3. The only F in the window is F2 (F3 = 53 is above). F2 G2 A2 Bb2 C3; the next D
    // above C3 is D3 = 50 > 48, folded an octave down to D2 (38); then E2, F2 go up from there.
    ['F', 'F2 G2 A2 Bb2 C3 D2 E2 F2', 5],
    // Last F2 (41). Only Bb2 (46) is in the window. Bb2 C3, then D3 = 50 folds to D2.
    ['Bb', 'Bb2 C3 D2 Eb2 F2 G2 A2 Bb2', 2],
    // Last Bb2 (46). Only Eb2 (39). Up to C3, then D3 folds to D2; Eb2 is the nearest Eb above D2.
    ['Eb', 'Eb2 F2 G2 Ab2 Bb2 C3 D2 Eb2', 6],
    // Last Eb2 (39). Only Ab2 (44). Ab2 Bb2 C3, then Db3 = 49 folds to Db2 (37).
    ['Ab', 'Ab2 Bb2 C3 Db2 Eb2 F2 G2 Ab2', 3],
    // Last Ab2 (44). Only Db2 (37; Db3 = 49 is above). Up to C3; the top Db3 = 49 folds to Db2.
    ['Db', 'Db2 Eb2 F2 Gb2 Ab2 Bb2 C3 Db2', 7],
    // Last Db2 (37). Only Gb2 (42). Gb2 Ab2 Bb2 Cb3 (47, octave follows the letter), then Db3 = 49
    // folds to Db2.
    ['Gb', 'Gb2 Ab2 Bb2 Cb3 Db2 Eb2 F2 Gb2', 4],
    // Last Gb2 (42). Only B2 (47). The next C# above B2 is C#3 = 49, folded to C#2 (37).
    ['B', 'B2 C#2 D#2 E2 F#2 G#2 A#2 B2', 1],
    // Last B2 (47). Only E2 (40). E2 F#2 G#2 A2 B2, then C#3 = 49 folds to C#2.
    ['E', 'E2 F#2 G#2 A2 B2 C#2 D#2 E2', 5],
    // Last E2 (40). Only A2 (45). A2 B2, then C#3 = 49 folds to C#2.
    ['A', 'A2 B2 C#2 D2 E2 F#2 G#2 A2', 2],
    // Last A2 (45). Only D2 (38; D3 = 50 is above). Up to B2, then C#3 = 49 folds to C#2.
    ['D', 'D2 E2 F#2 G2 A2 B2 C#2 D2', 6],
    // Last D2 (38). Only G2 (43). G2 A2 B2 C3, then D3 = 50 folds to D2.
    ['G', 'G2 A2 B2 C3 D2 E2 F#2 G2', 4],
  ]

  const cycle = keyCycleInWindow({
    low: parsePitch('C2'),
    high: parsePitch('C3'),
    tonics: FOURTHS,
    scale: 'major',
  })

  it.each(WORKED.map((row, index) => [index, ...row] as const))(
    'key %i: %s major → %s',
    (index, tonic, notes, fold) => {
      const names = notes.split(' ')
      expect(cycle[index]).toEqual({
        tonic,
        pitches: names.map(parsePitch),
        names,
        displaced: names.map((_, note) => note === fold),
        // the closing root is the octave only an octave from the start: here C2 → C3 alone; the
        // others end on their starting pitch after a fold (issue 13)
        octave: names.map((_, note) => note === 7 && tonic === 'C'),
        direction: 'up',
      })
    },
  )

  it('plays exactly the 12 keys, 8 notes each (7-note scale, root to root)', () => {
    expect(cycle.map((key) => key.tonic)).toEqual(FOURTHS)
    cycle.forEach((key) => expect(key.pitches).toHaveLength(8))
  })
})

describe('keyCycleInWindow: rules one at a time (PRODUCT.md)', () => {
  it('breaks a tie towards the lower root', () => {
    // F# major in C2–C3 ends on F#2 (42). C2 (36) and C3 (48) are both 6 semitones away → C2.
    const [, cMajor] = keyCycleInWindow({ low: 36, high: 48, tonics: ['F#', 'C'], scale: 'major' })
    expect(cMajor?.pitches[0]).toBe(36)
  })

  it('starts the first key on the lowest root even when a higher one is nearer the middle', () => {
    // window A1 (33) – A3 (57): roots of A are 33, 45, 57 → the first key starts on A1
    expect(
      keyCycleInWindow({ low: 33, high: 57, tonics: ['A'], scale: 'minor' })[0]?.pitches[0],
    ).toBe(33)
  })

  it('plays a chromatic key root to root: 13 notes, each a semitone up unless folded', () => {
    const [key] = keyCycleInWindow({ low: 40, high: 52, tonics: ['E'], scale: 'chromatic' })
    expect(key?.pitches).toEqual(Array.from({ length: 13 }, (_, k) => 40 + k)) // arithmetic
    expect(key?.displaced.some(Boolean)).toBe(false)
  })

  it('refuses a narrow window, naming the missing pitch classes as the keys spell them', () => {
    // arithmetic: E2–B2 (40–47) lacks pitch classes 0–3; Db major uses C Db Eb, C# major B# C# D#
    const narrow = { low: 40, high: 47, tonics: ['Db', 'C#'], scale: 'major' }
    expect(missingPitchClasses(narrow)).toEqual(['C/B#', 'Db/C#', 'Eb/D#'])
    expect(() => keyCycleInWindow(narrow)).toThrow(RangeError)
    expect(() => keyCycleInWindow(narrow)).toThrow('The window E2–B2 is missing C/B#, Db/C#, Eb/D#')
  })

  it('accepts a narrow window that holds every pitch class the scale uses', () => {
    // arithmetic: C major pentatonic is C D E G A; C2–A2 (36–45) holds them all
    const [key] = keyCycleInWindow({ low: 36, high: 45, tonics: ['C'], scale: 'major pentatonic' })
    expect(key?.names).toEqual(['C2', 'D2', 'E2', 'G2', 'A2', 'C2'])
    expect(key?.displaced).toEqual([false, false, false, false, false, true])
  })

  it.each([
    [{ low: 48, high: 36, tonics: ['C'], scale: 'major' }, /above the high end/],
    [{ low: 36, high: 128, tonics: ['C'], scale: 'major' }, /MIDI note number/],
    [{ low: 36, high: 48, tonics: [], scale: 'major' }, /at least one key/],
    [{ low: 36, high: 48, tonics: ['Fb'], scale: 'major' }, /not a key tonic/],
    [{ low: 36, high: 48, tonics: ['C'], scale: 'majr' }, /not a known scale/],
  ])('throws a readable RangeError for %j', (options, message) => {
    expect(() => keyCycleInWindow(options)).toThrow(message)
  })
})

describe('keyCycleInWindow: properties (fast-check)', () => {
  const scaleNames = ScaleType.all().map((type) => type.name)
  const cases = fc.record({
    low: fc.integer({ min: 0, max: 116 }),
    width: fc.integer({ min: 11, max: 30 }),
    tonics: fc.array(fc.constantFrom(...TONICS), { minLength: 1, maxLength: 14 }),
    scale: fc.constantFrom(...scaleNames),
  })

  it('every note lies in the window, has the scale’s pitch class and a name tonal reads as it', () => {
    fc.assert(
      fc.property(cases, ({ low, width, tonics, scale }) => {
        const high = Math.min(127, low + width)
        const keys = keyCycleInWindow({ low, high, tonics, scale })
        expect(keys.map((key) => key.tonic)).toEqual(tonics)
        keys.forEach((key) => {
          const chromas = Scale.get([key.tonic, scale]).notes.map((name) => Note.chroma(name)) // tonal (library)
          expect(key.pitches.map((pitch) => pitch % 12)).toEqual([...chromas, chromas[0]])
          key.pitches.forEach((pitch, index) => {
            expect(pitch).toBeGreaterThanOrEqual(low)
            expect(pitch).toBeLessThanOrEqual(high)
            expect(Note.midi(key.names[index] ?? '')).toBe(pitch)
          })
        })
      }),
    )
  })

  it('each note is the nearest above its predecessor, or folded to the highest in the window', () => {
    fc.assert(
      fc.property(cases, ({ low, width, tonics, scale }) => {
        const high = Math.min(127, low + width)
        let last: number | undefined
        for (const key of keyCycleInWindow({ low, high, tonics, scale })) {
          const start = key.pitches[0] ?? -1
          const roots = Array.from({ length: high - low + 1 }, (_, k) => low + k).filter(
            (p) => p % 12 === start % 12,
          )
          const from = last
          if (from === undefined) expect(start).toBe(roots[0])
          else
            roots.forEach((root) =>
              expect(Math.abs(start - from)).toBeLessThanOrEqual(Math.abs(root - from)),
            )
          key.pitches.slice(1).forEach((pitch, index) => {
            const previous = key.pitches[index] ?? 0
            if (key.displaced[index + 1]) {
              expect(pitch).toBeLessThan(previous)
              expect(pitch + 12).toBeGreaterThan(high)
            } else {
              expect(pitch - previous).toBeGreaterThan(0)
              expect(pitch - previous).toBeLessThanOrEqual(12)
            }
          })
          last = key.pitches.at(-1)
        }
      }),
    )
  })
})

describe('window helpers', () => {
  it('windowFromFrets: lowest string at lowFret to highest string at highFret (arithmetic)', () => {
    expect(windowFromFrets({ tuning: [28, 33, 38, 43], lowFret: 0, highFret: 5 })).toEqual({
      low: 28,
      high: 48,
    })
    expect(windowFromFrets({ tuning: [40, 45, 50, 55, 59, 64], lowFret: 5, highFret: 8 })).toEqual({
      low: 45,
      high: 72,
    })
    expect(() => windowFromFrets({ tuning: [28], lowFret: 5, highFret: 4 })).toThrow(RangeError)
  })

  it('widenWindow: one step above or below, clamped to the range, null at the edge', () => {
    const range = { low: 28, high: 67 }
    expect(widenWindow({ low: 36, high: 48, direction: 'above', range })).toEqual({
      low: 36,
      high: 49,
    })
    expect(widenWindow({ low: 36, high: 48, direction: 'below', range })).toEqual({
      low: 35,
      high: 48,
    })
    expect(widenWindow({ low: 30, high: 48, direction: 'below', range, step: 5 })).toEqual({
      low: 28,
      high: 48,
    })
    expect(widenWindow({ low: 28, high: 48, direction: 'below', range })).toBeNull()
    expect(widenWindow({ low: 36, high: 67, direction: 'above', range })).toBeNull()
  })

  it('widenWindow throws a RangeError for a window outside the range or a bad step', () => {
    const range = { low: 28, high: 67 }
    expect(() => widenWindow({ low: 20, high: 48, direction: 'above', range })).toThrow(
      /inside the instrument/,
    )
    expect(() => widenWindow({ low: 36, high: 48, direction: 'above', range, step: 0 })).toThrow(
      RangeError,
    )
  })
})
