import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { Note, Range, Scale, ScaleType } from 'tonal'
import {
  countOctaveScatters,
  octaveChoices,
  octaveScatter,
  type ScatterOptions,
} from './displacement'
import { parsePitch } from './pitch'
import { TONICS } from './scale-data'

// Brute force (arithmetic): every combination of in-range pitches with the right pitch classes.
function allPlacements(options: ScatterOptions): number[][] {
  const chromas = Scale.get([options.tonic, options.scale]).notes.map(
    (name) => Note.chroma(name) ?? 0,
  ) // tonal (library)
  const inRange = (chroma: number) =>
    Array.from({ length: options.high - options.low + 1 }, (_, k) => options.low + k).filter(
      (p) => p % 12 === chroma,
    )
  const steps = [...chromas.map((chroma) => (chroma - (chromas[0] ?? 0) + 12) % 12), 12]
  const combos = [...chromas, chromas[0] ?? 0].reduce<number[][]>(
    (partial, chroma) =>
      partial.flatMap((prefix) => inRange(chroma).map((pitch) => [...prefix, pitch])),
    [[]],
  )
  return combos.filter((pitches) => {
    const first = pitches[0] ?? 0
    const displaced = pitches.filter((pitch, i) => pitch !== first + (steps[i] ?? 0)).length
    const leaps = pitches.slice(1).map((pitch, i) => Math.abs(pitch - (pitches[i] ?? 0)))
    // a plain step up: the next pitch is 1–12 semitones above the one before
    const plainSteps = pitches.slice(1).filter((pitch, i) => {
      const rise = pitch - (pitches[i] ?? 0)
      return rise > 0 && rise <= 12
    })
    return (
      displaced >= (options.minDisplaced ?? 0) &&
      leaps.every((leap) => leap <= (options.maxLeap ?? 24)) && // issue 13: two octaves by default
      (options.placement !== 'each-moved' || plainSteps.length === 0)
    )
  })
}

describe('octaveChoices', () => {
  it('every A on a 24-fret 4-string bass (28–67): A1 A2 A3 (arithmetic; tonal Range.chromatic)', () => {
    const tonal = Range.chromatic(['E1', 'G4'])
      .filter((name) => Note.chroma(name) === 9)
      .map((name) => Note.midi(name))
    expect(octaveChoices(parsePitch('A2'), 28, 67)).toEqual(tonal)
    expect(octaveChoices(parsePitch('A2'), 28, 67)).toEqual([33, 45, 57])
  })

  it.each([
    [60, 60, 60, [60]],
    [61, 60, 60, []],
    [0, 0, 127, [0, 12, 24, 36, 48, 60, 72, 84, 96, 108, 120]],
    [127, 0, 127, [7, 19, 31, 43, 55, 67, 79, 91, 103, 115, 127]],
  ])('octaveChoices(%i, %i, %i) = %j (arithmetic)', (pitch, low, high, expected) => {
    expect(octaveChoices(pitch, low, high)).toEqual(expected)
  })

  it('matches a brute-force filter of the range (property, arithmetic)', () => {
    fc.assert(
      fc.property(fc.nat(127), fc.nat(127), fc.nat(127), (pitch, a, b) => {
        const [low, high] = [Math.min(a, b), Math.max(a, b)]
        const expected = Array.from({ length: high - low + 1 }, (_, k) => low + k).filter(
          (p) => p % 12 === pitch % 12,
        )
        expect(octaveChoices(pitch, low, high)).toEqual(expected)
      }),
    )
  })

  it('throws a RangeError for an upside-down range or a non-MIDI pitch', () => {
    expect(() => octaveChoices(60, 50, 40)).toThrow(/above the high end/)
    expect(() => octaveChoices(128, 0, 127)).toThrow(RangeError)
  })
})

describe('countOctaveScatters', () => {
  it('two octaves C2–B3, C major: 2 choices for each of 8 notes = 2^8 (arithmetic)', () => {
    expect(countOctaveScatters({ low: 36, high: 59, tonic: 'C', scale: 'major' })).toBe(256)
  })

  it.each([
    { low: 28, high: 67, tonic: 'Eb', scale: 'minor' },
    { low: 28, high: 67, tonic: 'Eb', scale: 'minor', minDisplaced: 4 },
    { low: 28, high: 67, tonic: 'A', scale: 'major pentatonic', maxLeap: 7 },
    { low: 40, high: 64, tonic: 'F#', scale: 'minor blues', minDisplaced: 2, maxLeap: 9 },
    { low: 36, high: 60, tonic: 'Db', scale: 'dorian', minDisplaced: 7 },
    { low: 36, high: 41, tonic: 'C', scale: 'major' },
    { low: 28, high: 67, tonic: 'A', scale: 'minor', placement: 'each-moved' as const },
    { low: 28, high: 55, tonic: 'E', scale: 'minor pentatonic', placement: 'each-moved' as const },
    {
      low: 28,
      high: 67,
      tonic: 'G',
      scale: 'major',
      placement: 'each-moved' as const,
      maxLeap: 30,
    },
  ])('equals a brute-force count for %j (arithmetic)', (options) => {
    expect(countOctaveScatters(options)).toBe(allPlacements(options).length)
  })

  it('limits leaps to two octaves by default (issue 13): fewer placements than with 38', () => {
    // E1–G4 (28–67), Eb minor: a 38-semitone leap (e.g. F1 → G4 area) is allowed only when asked
    const base = { low: 28, high: 67, tonic: 'Eb', scale: 'minor' }
    expect(countOctaveScatters(base)).toBe(countOctaveScatters({ ...base, maxLeap: 24 }))
    expect(countOctaveScatters(base)).toBeLessThan(countOctaveScatters({ ...base, maxLeap: 38 }))
  })

  it('throws a RangeError for impossible options', () => {
    const base = { low: 28, high: 67, tonic: 'C', scale: 'major' }
    expect(() => countOctaveScatters({ ...base, minDisplaced: 8 })).toThrow(RangeError) // 8 notes, first never displaced
    expect(() => countOctaveScatters({ ...base, maxLeap: 0 })).toThrow(RangeError)
  })
})

describe('octaveScatter', () => {
  const scaleNames = ScaleType.all().map((type) => type.name)
  const cases = fc.record({
    low: fc.integer({ min: 0, max: 80 }),
    width: fc.integer({ min: 11, max: 47 }),
    tonic: fc.constantFrom(...TONICS),
    scale: fc.constantFrom(...scaleNames),
    minDisplaced: fc.integer({ min: 0, max: 4 }),
    maxLeap: fc.integer({ min: 12, max: 40 }),
    seed: fc.integer({ min: 0, max: 2 ** 31 }),
  })

  it('places each note in range with the scale’s pitch class and honours the options (property)', () => {
    fc.assert(
      fc.property(cases, ({ low, width, ...rest }) => {
        const options = { low, high: low + width, ...rest }
        const chromas = Scale.get([rest.tonic, rest.scale]).notes.map(
          (name) => Note.chroma(name) ?? 0,
        ) // tonal
        const steps = [...chromas.map((chroma) => (chroma - (chromas[0] ?? 0) + 12) % 12), 12]
        if (countOctaveScatters(options) === 0) {
          expect(() => octaveScatter(options)).toThrow(RangeError)
          return
        }
        const scatter = octaveScatter(options)
        const first = scatter.pitches[0] ?? 0
        expect(scatter.pitches.map((pitch) => pitch % 12)).toEqual([...chromas, chromas[0]])
        scatter.pitches.forEach((pitch, i) => {
          expect(pitch).toBeGreaterThanOrEqual(options.low)
          expect(pitch).toBeLessThanOrEqual(options.high)
          expect(Note.midi(scatter.names[i] ?? '')).toBe(pitch)
          if (i > 0)
            expect(Math.abs(pitch - (scatter.pitches[i - 1] ?? 0))).toBeLessThanOrEqual(
              options.maxLeap,
            )
          // displaced = not where a plain ascending scale from the first note puts it
          expect(scatter.displaced[i]).toBe(pitch !== first + (steps[i] ?? 0))
        })
        expect(scatter.displaced.filter(Boolean).length).toBeGreaterThanOrEqual(
          options.minDisplaced,
        )
        expect(octaveScatter(options)).toEqual(scatter) // same seed, same exercise
      }),
    )
  })

  it('can produce every valid placement (all 2^6 … filtered ones appear over 3000 seeds)', () => {
    const options = { low: 36, high: 59, tonic: 'C', scale: 'major pentatonic', minDisplaced: 2 }
    const seen = new Set(
      Array.from({ length: 3000 }, (_, seed) =>
        octaveScatter({ ...options, seed }).pitches.join(' '),
      ),
    )
    expect(seen.size).toBe(countOctaveScatters(options))
    expect(seen).toEqual(new Set(allPlacements(options).map((pitches) => pitches.join(' '))))
  })

  it('each-moved: no note is a plain step up from the one before; moved marks it (issue 13)', () => {
    const options = {
      low: 28,
      high: 67,
      tonic: 'A',
      scale: 'minor',
      placement: 'each-moved' as const,
    }
    for (let seed = 0; seed < 200; seed += 1) {
      const { pitches, moved } = octaveScatter({ ...options, seed })
      expect(moved).toEqual(pitches.map((_, i) => i > 0))
      pitches.slice(1).forEach((pitch, i) => {
        const rise = pitch - (pitches[i] ?? 0) // arithmetic: a plain step up rises 1–12 semitones
        expect(rise <= 0 || rise > 12).toBe(true)
        expect(Math.abs(rise)).toBeLessThanOrEqual(24)
      })
    }
    expect(() => countOctaveScatters({ ...options, placement: 'every' as never })).toThrow(
      /not a placement/,
    )
  })

  it('differs between seeds', () => {
    const options = { low: 28, high: 67, tonic: 'C', scale: 'chromatic' }
    const exercises = new Set(
      [1, 2, 3, 4, 5].map((seed) => octaveScatter({ ...options, seed }).pitches.join(' ')),
    )
    expect(exercises.size).toBeGreaterThan(1)
  })

  it('explains why no placement exists', () => {
    // arithmetic: E2–B2 (40–47) has no C or D for C major
    expect(() => octaveScatter({ low: 40, high: 47, tonic: 'C', scale: 'major', seed: 1 })).toThrow(
      'The range E2–B2 has no C, D for C major.',
    )
    // C2–C3 with leaps of at most 1 semitone cannot go C → D
    expect(() =>
      octaveScatter({ low: 36, high: 48, tonic: 'C', scale: 'major', seed: 1, maxLeap: 1 }),
    ).toThrow(/No placement/)
  })
})
