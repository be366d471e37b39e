import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { countFingerings, countShifts, fingeringsOf } from './fingering'
import { noteAt } from './fretboard'
import { parsePitch } from './pitch'
import { TUNING_PRESETS } from './tuning'

const BASS = [28, 33, 38, 43] // E1 A1 D2 G2 (common practice)
const at = (frets: string) =>
  frets.split(' ').map((cell) => {
    const [string, fret] = cell.split(':').map(Number)
    return { string: string ?? -1, fret: fret ?? -1 }
  })

describe('countShifts (hand span in frets; open strings need no finger)', () => {
  // arithmetic: a span of 4 frets covers f..f+3; a note outside starts a new hand position
  it.each([
    ['0:3 0:5 0:7', 4, 1], // 3..7 needs 5 frets: last finger on 5, first finger on 7
    ['0:3 0:5 0:7', 5, 0], // a 5-fret stretch covers 3..7
    ['0:5 0:6 0:7 0:8', 4, 0],
    ['0:5 0:6 0:7 0:8', 3, 1],
    ['0:0 0:5 1:0 1:9', 4, 1], // open strings ignored: 5 then 9 is a shift
    ['0:8 1:5', 4, 0], // down a string, 5..8 still fits
    ['0:9 1:5', 4, 1],
    ['0:3 0:5 0:7 1:3 1:5 1:7 2:4 2:5', 4, 3], // 3 5 | 7 | 3 5 | 7 4 5
  ])('%s with span %i → %i shifts', (cells, span, shifts) => {
    expect(countShifts(at(cells), span)).toBe(shifts)
  })
})

describe('fingeringsOf: worked example, G major one octave on a 4-string bass', () => {
  // Run G1 A1 B1 C2 D2 E2 F#2 G2 = 31 33 35 36 38 40 42 43; at most 3 notes per string; span 4.
  // Frets (open string + fret = pitch): on E 3 5 7 8 10 12 14 15; on A – 0 2 3 5 7 9 10;
  // on D only from D2: 0 2 4 5; on G only G2: 0. G1 is only on E, so every fingering starts there.
  // Three strings: 8 = 3+3+2, 3+2+3, 2+3+3; four strings with G carrying only G2: 3+3+1, 3+1+3,
  // 1+3+3, 3+2+2, 2+3+2, 2+2+3 before the final 1 (D must start at D2 or later: always true here).
  // Sorted: fewest shifts, then more notes on lower strings. Shifts worked as in countShifts.
  const run = ['G1', 'A1', 'B1', 'C2', 'D2', 'E2', 'F#2', 'G2'].map(parsePitch)
  const WORKED: [string, string, number][] = [
    ['2-3-3', '0:3 0:5 1:2 1:3 1:5 2:2 2:4 2:5', 0], // frets 2..5 only: second position
    ['2-3-2-1', '0:3 0:5 1:2 1:3 1:5 2:2 2:4 3:0', 0],
    ['2-2-3-1', '0:3 0:5 1:2 1:3 2:0 2:2 2:4 3:0', 0],
    ['1-3-3-1', '0:3 1:0 1:2 1:3 2:0 2:2 2:4 3:0', 0], // fretted 3 2 3 2 4: 2..4
    ['3-2-3', '0:3 0:5 0:7 1:3 1:5 2:2 2:4 2:5', 2], // 3 5 | 7 | 3 5 2 4 5
    ['3-2-2-1', '0:3 0:5 0:7 1:3 1:5 2:2 2:4 3:0', 2], // 3 5 | 7 | 3 5 2 4
    ['3-1-3-1', '0:3 0:5 0:7 1:3 2:0 2:2 2:4 3:0', 2], // 3 5 | 7 | 3 2 4
    ['3-3-2', '0:3 0:5 0:7 1:3 1:5 1:7 2:4 2:5', 3], // 3 5 | 7 | 3 5 | 7 4 5
    ['3-3-1-1', '0:3 0:5 0:7 1:3 1:5 1:7 2:4 3:0', 3], // 3 5 | 7 | 3 5 | 7 4
  ]
  const options = { tuning: BASS, frets: 20, run, maxPerString: 3, handSpan: 4 }

  it('lists exactly the 9 fingerings worked by hand, in order', () => {
    expect(fingeringsOf(options)).toEqual(
      WORKED.map(([pattern, cells, shifts]) => ({ pattern, positions: at(cells), shifts })),
    )
    expect(countFingerings(options)).toBe(9)
  })

  it('with a 5-fret stretch, three notes a whole tone apart fit: 3-3-2 needs no shift', () => {
    const wide = fingeringsOf({ ...options, handSpan: 5 })
    expect(wide.find((fingering) => fingering.pattern === '3-3-2')?.shifts).toBe(0)
  })
})

describe('fingeringsOf: small cases by hand', () => {
  it('two strings E2 A2, run A2 B2: "2" on E, "1-1", then "2" on A (arithmetic)', () => {
    expect(fingeringsOf({ tuning: [40, 45], frets: 12, run: [45, 47] })).toEqual([
      { pattern: '2', positions: at('0:5 0:7'), shifts: 0 },
      { pattern: '1-1', positions: at('0:5 1:2'), shifts: 0 },
      { pattern: '2', positions: at('1:0 1:2'), shifts: 0 },
    ])
  })

  it('one string: four notes fit only when 4 per string are allowed', () => {
    const options = { tuning: [40], frets: 12, run: [40, 42, 44, 45] }
    expect(fingeringsOf(options)).toEqual([
      { pattern: '4', positions: at('0:0 0:2 0:4 0:5'), shifts: 0 },
    ])
    expect(fingeringsOf({ ...options, maxPerString: 3 })).toEqual([])
    expect(countFingerings({ ...options, maxPerString: 3 })).toBe(0)
  })

  it.each([
    [{ run: [] }, /at least one note/],
    [{ run: [40, 40] }, /strictly upwards/],
    [{ run: [45, 40] }, /strictly upwards/],
    [{ run: [40, 128] }, /MIDI note number/],
    [{ run: [40], maxPerString: 0 }, /Notes per string/],
    [{ run: [40], handSpan: 0 }, /hand span/],
    [{ run: [40], frets: 0 }, /frets/],
  ])('throws a readable RangeError for %j', (override, message) => {
    expect(() => fingeringsOf({ tuning: [40, 45], frets: 12, ...override })).toThrow(message)
    expect(() => countFingerings({ tuning: [40, 45], frets: 12, ...override })).toThrow(RangeError)
  })
})

// Brute force (arithmetic): every string choice per note that never goes back, then the rules.
function bruteForceCount(tuning: number[], frets: number, run: number[], max: number): number {
  const choose = (strings: number[]): number => {
    if (strings.length === run.length) {
      const playable = strings.every(
        (s, i) =>
          (run[i] ?? 0) - (tuning[s] ?? 0) >= 0 && (run[i] ?? 0) - (tuning[s] ?? 0) <= frets,
      )
      const used = [...new Set(strings)]
      const consecutive = used.every((s, i) => i === 0 || s === (used[i - 1] ?? 0) + 1)
      const fits = used.every((s) => strings.filter((t) => t === s).length <= max)
      return playable && consecutive && fits ? 1 : 0
    }
    let total = 0
    for (let s = strings.at(-1) ?? 0; s < tuning.length; s += 1) total += choose([...strings, s])
    return total
  }
  return choose([])
}

describe('fingeringsOf: properties (fast-check)', () => {
  const cases = fc
    .record({
      preset: fc.constantFrom(...TUNING_PRESETS),
      start: fc.nat(30),
      gaps: fc.array(fc.integer({ min: 1, max: 4 }), { minLength: 0, maxLength: 9 }),
      maxPerString: fc.integer({ min: 1, max: 5 }),
      handSpan: fc.integer({ min: 3, max: 6 }),
    })
    .map(({ preset, start, gaps, maxPerString, handSpan }) => {
      const first = (preset.pitches[0] ?? 0) + start
      const run = gaps.reduce((notes, gap) => [...notes, (notes.at(-1) ?? first) + gap], [first])
      return { tuning: [...preset.pitches], frets: preset.frets, run, maxPerString, handSpan }
    })

  it('every fingering plays exactly the run, in order, by the rules', () => {
    fc.assert(
      fc.property(cases, (options) => {
        const fingerings = fingeringsOf(options)
        for (const { positions, pattern, shifts } of fingerings) {
          expect(positions.map((p) => noteAt(options.tuning, p.string, p.fret))).toEqual(
            options.run,
          )
          positions.forEach((p) => expect(p.fret).toBeLessThanOrEqual(options.frets))
          const strings = positions.map((p) => p.string)
          strings.slice(1).forEach((s, i) => expect(s - (strings[i] ?? 0)).toBeOneOf([0, 1]))
          const counts = pattern.split('-').map(Number)
          expect(counts.reduce((a, b) => a + b, 0)).toBe(options.run.length)
          counts.forEach((count) => expect(count).toBeLessThanOrEqual(options.maxPerString))
          expect(counts).toEqual(
            [...new Set(strings)].map((s) => strings.filter((t) => t === s).length),
          )
          expect(shifts).toBe(countShifts(positions, options.handSpan))
        }
        fingerings
          .slice(1)
          .forEach((f, i) => expect(f.shifts).toBeGreaterThanOrEqual(fingerings[i]?.shifts ?? 0))
        expect(new Set(fingerings.map((f) => JSON.stringify(f.positions))).size).toBe(
          fingerings.length,
        )
        expect(countFingerings(options)).toBe(fingerings.length)
      }),
      { numRuns: 60 },
    )
  }, 30_000) // listing every fingering of long runs is heavy on a loaded machine

  it('finds as many as a brute force over every string choice (arithmetic)', () => {
    fc.assert(
      fc.property(cases, (options) => {
        const expected = bruteForceCount(
          options.tuning,
          options.frets,
          options.run,
          options.maxPerString,
        )
        expect(fingeringsOf(options)).toHaveLength(expected)
      }),
      { numRuns: 40 },
    )
  })

  it('is deterministic', () => {
    const options = {
      tuning: [40, 45, 50, 55, 59, 64],
      frets: 22,
      run: [43, 45, 47, 48, 50, 52, 54, 55, 57, 59, 60, 62, 64, 66, 67],
    }
    expect(fingeringsOf(options)).toEqual(fingeringsOf(options))
  })
})
