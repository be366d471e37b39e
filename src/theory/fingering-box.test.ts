import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { countFingerings, fingeringsOf, type FingeringOptions } from './fingering'
import { noteAt } from './fretboard'
import { parsePitch } from './pitch'
import { rangeRun } from './range-run'
import { TUNING_PRESETS } from './tuning'

const BASS = [28, 33, 38, 43] // E1 A1 D2 G2 (common practice)
const at = (cells: string) =>
  cells.split(' ').map((cell) => {
    const [string, fret] = cell.split(':').map(Number)
    return { string: string ?? -1, fret: fret ?? -1 }
  })

describe('fingeringsOf in a hand position: G major, frets 5–8, 4-string bass (issue 13)', () => {
  // Run A1 … D3 (PRODUCT.md "Range run"). One shift allowed widens 5–8 to 4–9 (issue 13). Frets
  // by string (pitch − open string, arithmetic): A1 B1 C2 only on E (5 7 8); D2 E2 only on A (5 7);
  // F#2 on A 9 or D 4; G2 A2 only on D (5 7); B2 on D 9 or G 4; C3 D3 only on G (5 7).
  // So 2 × 2 fingerings; the hand stays at V (fingers 1-3-4 on frets 5-7-8) and reaches F#2 and
  // B2 by a stretch, fret 4 with finger 1 or fret 9 with finger 4: 0 shifts, 2 stretches each.
  const run = rangeRun({ tuning: BASS, lowFret: 5, highFret: 8, tonic: 'G', scale: 'major' })
  const options: FingeringOptions = { tuning: BASS, frets: 20, run, lowFret: 5, highFret: 8 }
  const WORKED: [string, string, string][] = [
    ['3-3-3-2', '0:5 0:7 0:8 1:5 1:7 1:9 2:5 2:7 2:9 3:5 3:7', '1 3 4 1 3 4 1 3 4 1 3'],
    ['3-3-2-3', '0:5 0:7 0:8 1:5 1:7 1:9 2:5 2:7 3:4 3:5 3:7', '1 3 4 1 3 4 1 3 1 1 3'],
    ['3-2-4-2', '0:5 0:7 0:8 1:5 1:7 2:4 2:5 2:7 2:9 3:5 3:7', '1 3 4 1 3 1 1 3 4 1 3'],
    ['3-2-3-3', '0:5 0:7 0:8 1:5 1:7 2:4 2:5 2:7 3:4 3:5 3:7', '1 3 4 1 3 1 1 3 1 1 3'],
  ]

  it('lists the 4 fingerings worked by hand, with fingers, stretches and position V', () => {
    const found = fingeringsOf(options)
    expect(found.map((fingering) => fingering.pattern)).toEqual(WORKED.map(([pattern]) => pattern))
    found.forEach((fingering, index) => {
      const [, cells = '', fingers = ''] = WORKED[index] ?? []
      expect(fingering.positions).toEqual(at(cells))
      expect(fingering.fingers).toEqual(fingers.split(' ').map(Number))
      expect(fingering).toMatchObject({ shifts: 0, stretches: 2, position: 5, positionName: 'V' })
      expect(fingering.moves?.filter((move) => move === 'stretch')).toHaveLength(2)
    })
    expect(countFingerings(options)).toBe(4)
  })

  it('with no shift allowed the box 5–8 cannot hold F#2 and B2: none', () => {
    expect(fingeringsOf({ ...options, shifts: 0 })).toEqual([])
    expect(countFingerings({ ...options, shifts: 0 })).toBe(0)
  })

  it('never leaves the position widened by the shifts allowed (0–3)', () => {
    for (const shifts of [1, 2, 3]) {
      const found = fingeringsOf({ ...options, shifts })
      expect(found.length).toBeGreaterThan(0)
      for (const fingering of found) {
        for (const { fret } of fingering.positions) {
          expect(fret).toBeGreaterThanOrEqual(5 - shifts)
          expect(fret).toBeLessThanOrEqual(8 + shifts)
        }
        expect(fingering.shifts).toBeLessThanOrEqual(shifts)
      }
    }
  })

  it('three-fret system: fingers 1-2-4 on 5-6-7, fret 8 by a stretch of finger 4', () => {
    const [first, ...rest] = fingeringsOf({ ...options, handSystem: 'three-fret' })
    expect(rest).toEqual([]) // every other string choice needs 2 shifts (arithmetic, by hand)
    expect(first?.pattern).toBe('3-2-3-3')
    expect(first?.fingers).toEqual([1, 4, 4, 1, 4, 1, 1, 4, 1, 1, 4])
    expect(first?.moves).toEqual([
      'hand',
      'hand',
      'stretch',
      'hand',
      'hand',
      'stretch',
      'hand',
      'hand',
      'stretch',
      'hand',
      'hand',
    ])
  })

  it('open strings count only when the widened position reaches fret 0', () => {
    // E major frets 1–4 (arithmetic): open E1 28 is below the box; with 1 shift the box reaches 0
    const e = rangeRun({ tuning: BASS, lowFret: 1, highFret: 4, tonic: 'E', scale: 'major' })
    expect(e[0]).toBe(parsePitch('F#1'))
    const found = fingeringsOf({ tuning: BASS, frets: 20, run: e, lowFret: 1, highFret: 4 })
    expect(found.some((f) => f.positions.some((p) => p.fret === 0))).toBe(true)
    const strict = fingeringsOf({
      tuning: BASS,
      frets: 20,
      run: e,
      lowFret: 1,
      highFret: 4,
      shifts: 0,
    })
    expect(strict.every((f) => f.positions.every((p) => p.fret >= 1))).toBe(true)
  })

  it.each([
    [{ lowFret: 5 }, /both its lowest and its highest fret/],
    [{ lowFret: 5, highFret: 4 }, /highest fret/],
    [{ lowFret: 5, highFret: 8, shifts: 4 }, /Shifts/],
    [{ lowFret: 5, highFret: 8, handSystem: 'two-finger' as never }, /hand system/],
  ])('throws a readable RangeError for %j', (override, message) => {
    const base = { tuning: BASS, frets: 20, run: [33, 35] }
    expect(() => fingeringsOf({ ...base, ...override })).toThrow(message)
    expect(() => countFingerings({ ...base, ...override })).toThrow(RangeError)
  })
})

// Brute force (arithmetic): every string choice per note that never goes back, checked against
// the rules of issue 13 with the hand simulated note by note from position lowFret.
function bruteForce(options: Required<Omit<FingeringOptions, 'handSpan'>>): number {
  const { tuning, frets, run, lowFret, highFret, shifts, maxPerString } = options
  const cover = options.handSystem === 'three-fret' ? 3 : 4
  const fits = (strings: number[]) => {
    const fretted = strings.map((s, i) => (run[i] ?? 0) - (tuning[s] ?? 0))
    if (
      fretted.some(
        (f) => f < Math.max(0, lowFret - shifts) || f > Math.min(frets, highFret + shifts),
      )
    )
      return false
    const used = [...new Set(strings)]
    if (used.some((s, i) => i > 0 && s !== (used[i - 1] ?? 0) + 1)) return false
    if (used.some((s) => strings.filter((t) => t === s).length > maxPerString)) return false
    let hand = Math.max(1, lowFret)
    let moved = 0
    for (const f of fretted) {
      if (f === 0 || (f >= hand - 1 && f <= hand + cover)) continue // open, in hand or a stretch
      hand = f > hand ? f - cover + 1 : f
      moved += 1
    }
    return moved <= shifts
  }
  const choose = (strings: number[]): number => {
    if (strings.length === run.length) return fits(strings) ? 1 : 0
    let total = 0
    for (let s = strings.at(-1) ?? 0; s < tuning.length; s += 1) total += choose([...strings, s])
    return total
  }
  return choose([])
}

describe('fingeringsOf in a hand position: properties (fast-check)', () => {
  const cases = fc
    .record({
      preset: fc.constantFrom(...TUNING_PRESETS.filter((preset) => preset.pitches.length <= 6)),
      lowFret: fc.integer({ min: 0, max: 12 }),
      width: fc.integer({ min: 2, max: 4 }),
      scale: fc.constantFrom(
        'major',
        'minor pentatonic',
        'dorian',
        'harmonic minor',
        'minor blues',
      ),
      tonic: fc.constantFrom('C', 'Eb', 'F#', 'A', 'Bb'),
      shifts: fc.integer({ min: 0, max: 3 }),
      handSystem: fc.constantFrom('one-finger-per-fret' as const, 'three-fret' as const),
      maxPerString: fc.integer({ min: 2, max: 4 }),
    })
    .map(({ preset, lowFret, width, scale, tonic, ...rest }) => {
      const region = { lowFret, highFret: lowFret + width }
      const run = rangeRun({ tuning: preset.pitches, ...region, tonic, scale })
      return { tuning: [...preset.pitches], frets: preset.frets, run, ...region, ...rest }
    })
    .filter((options) => options.run.length > 0 && options.run.length <= 14)

  it('plays the run in the widened position, within the shifts, as a brute force counts it', () => {
    fc.assert(
      fc.property(cases, (options) => {
        const found = fingeringsOf(options)
        for (const fingering of found) {
          const pitches = fingering.positions.map((p) => noteAt(options.tuning, p.string, p.fret))
          expect(pitches).toEqual(options.run)
          for (const { fret } of fingering.positions) {
            expect(fret).toBeGreaterThanOrEqual(Math.max(0, options.lowFret - options.shifts))
            expect(fret).toBeLessThanOrEqual(options.highFret + options.shifts)
          }
          expect(fingering.shifts).toBeLessThanOrEqual(options.shifts)
          expect(fingering.moves?.filter((move) => move === 'shift')).toHaveLength(fingering.shifts)
          fingering.positions.forEach((p, i) =>
            expect(fingering.fingers?.[i] === 0).toBe(p.fret === 0),
          )
        }
        expect(countFingerings(options)).toBe(found.length)
        expect(found.length).toBe(bruteForce(options))
      }),
      { numRuns: 60 },
    )
  })
})
