import { describe, expect, it } from 'vitest'
import { passQuestions, rotation, runOverview, runsQuestions, type RunKey } from './runs-generator'

const NECK = { tuning: [28, 33, 38, 43], frets: 20 } // E1 A1 D2 G2 (common practice)
// C major (C D E F G A B, handbook) in frets 2–5. By string (arithmetic): E 30–33 → G1 A1;
// A 35–38 → B1 C2 D2; D 40–43 → E2 F2 G2; G 45–48 → A2 B2 C3.
const KEY: RunKey = {
  tonic: 'C',
  scale: 'major',
  lowFret: 2,
  highFret: 5,
  maxPerString: 4,
  shifts: 2,
}
const RUN = [31, 33, 35, 36, 38, 40, 41, 43, 45, 47, 48]

describe('Range Runs overview', () => {
  const overview = runOverview(NECK, KEY)

  it('runs from the lowest to the highest scale note of frets 2–5: G1 to C3 (arithmetic)', () => {
    expect(overview.run).toEqual(RUN)
    expect(overview.names[0]).toBe('G1')
    expect(overview.names.at(-1)).toBe('C3')
  })

  it('lists 2-3-3-3 from the E string first: frets 3 5 | 2 3 5 | 2 3 5 | 2 4 5, no shift in a 4-fret hand', () => {
    const first = overview.fingerings[0]
    expect(first?.pattern).toBe('2-3-3-3')
    expect(first?.shifts).toBe(0)
    expect(first?.positions.map((cell) => cell.fret)).toEqual([3, 5, 2, 3, 5, 2, 3, 5, 2, 4, 5])
    expect(overview.total).toBe(overview.fingerings.length)
    expect(overview.tooMany).toBe(false)
  })

  it('explains a region with no scale note', () => {
    // fret 1 on E A D G sounds F, Bb, Eb, Ab (arithmetic); C major pentatonic is C D E G A (handbook)
    expect(() =>
      runOverview(NECK, { ...KEY, scale: 'major pentatonic', lowFret: 1, highFret: 1 }),
    ).toThrow(/no note of the scale/)
  })
})

describe('Range Runs in a hand position (issue 13, PRODUCT.md "Range run")', () => {
  // G major (G A B C D E F#, handbook) in frets 5–8 on E1 A1 D2 G2: the box holds A1 … D3 but not
  // F#2 (D string fret 4) or B2 (G string fret 4 / D string fret 9) — arithmetic: open string + fret.
  const G_FIVE: RunKey = { tonic: 'G', scale: 'major', lowFret: 5, highFret: 8, maxPerString: 4 }

  it('plays the complete scale A1 to D3, F#2 and B2 included', () => {
    const overview = runOverview(NECK, G_FIVE)
    expect(overview.names).toEqual([
      'A1',
      'B1',
      'C2',
      'D2',
      'E2',
      'F#2',
      'G2',
      'A2',
      'B2',
      'C3',
      'D3',
    ])
  })

  it('keeps every fingering inside frets 4–9 with the default one shift, fingered from position V', () => {
    const overview = runOverview(NECK, G_FIVE)
    const frets = overview.fingerings.flatMap((f) => f.positions.map((cell) => cell.fret))
    expect(overview.total).toBeGreaterThan(0)
    expect(Math.min(...frets)).toBeGreaterThanOrEqual(4)
    expect(Math.max(...frets)).toBeLessThanOrEqual(9)
    expect(overview.fingerings.every((f) => f.positionName === 'V')).toBe(true) // common practice
    expect(overview.fingerings[0]?.moves).toContain('stretch')
  })

  it('without shifts stays in frets 5–8 or finds no fingering; more shifts never offer fewer', () => {
    const none = runOverview(NECK, { ...G_FIVE, shifts: 0 })
    const frets = none.fingerings.flatMap((f) => f.positions.map((cell) => cell.fret))
    expect(frets.every((fret) => fret >= 5 && fret <= 8)).toBe(true)
    expect(runOverview(NECK, { ...G_FIVE, shifts: 3 }).total).toBeGreaterThanOrEqual(
      runOverview(NECK, G_FIVE).total,
    )
  })

  it('gives each question its finger and move from the fingering', () => {
    const overview = runOverview(NECK, G_FIVE)
    const fingering = overview.fingerings[0]!
    const questions = passQuestions(overview, fingering, G_FIVE, 0)
    expect(questions.slice(0, 11).map((q) => q.finger)).toEqual(fingering.fingers)
    expect(questions[0]?.finger).toBe(1) // A1 at fret 5 under the first finger in position V
    expect(questions.slice(0, 11).map((q) => q.move)).toEqual(fingering.moves)
  })
})

describe('Range Runs questions', () => {
  const overview = runOverview(NECK, KEY)
  const [first, second] = overview.fingerings

  it('one pass goes up the 11 notes and back down without repeating the top: 21 notes', () => {
    const questions = passQuestions(overview, first!, KEY, 0)
    expect(questions.map((question) => question.expectedPitch)).toEqual([
      ...RUN,
      ...RUN.slice(0, -1).reverse(),
    ])
    expect(questions.filter((question) => question.direction === 'down')).toHaveLength(10)
    expect(questions[0]).toMatchObject({
      cell: { string: 0, fret: 3 },
      pattern: '0:2-3-3-3',
      name: 'G1',
    })
    expect(questions[0]?.detail).toEqual({
      tonic: 'C',
      scale: 'major',
      lowFret: 2,
      highFret: 5,
      pattern: '0:2-3-3-3',
      direction: 'up',
    })
  })

  it('a session plays whole passes until the count, moving on to the next fingering', () => {
    const questions = runsQuestions(overview, [first!, second!], KEY, 24)
    expect(questions).toHaveLength(42)
    expect(questions[21]?.pattern).not.toBe(questions[0]?.pattern)
    expect(runsQuestions(overview, [first!], KEY, null)).toHaveLength(21)
  })

  it('rotation offers the fingering practised least, then the one practised longest ago', () => {
    const [a, b, c] = overview.fingerings
    const practice = [
      { pattern: '0:2-3-3-3', sessions: 3, lastPractisedAt: '2026-11-20T10:00:00Z' },
      {
        pattern: `${b!.positions[0]!.string}:${b!.pattern}`,
        sessions: 1,
        lastPractisedAt: '2026-11-28T10:00:00Z',
      },
      {
        pattern: `${c!.positions[0]!.string}:${c!.pattern}`,
        sessions: 1,
        lastPractisedAt: '2026-11-21T10:00:00Z',
      },
    ]
    const order = rotation([a!, b!, c!], practice)
    expect(order).toEqual([c, b, a])
    expect(rotation([a!, b!, c!], [])).toEqual([a, b, c])
  })
})
