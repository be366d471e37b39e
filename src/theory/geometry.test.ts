import { describe, expect, it } from 'vitest'
import { evenFretDistances, fretDistances, fretMidpoints, inlayFrets } from './geometry'

const TOLERANCE = 1e-3

describe('fretDistances (Mottola, "Was the Rule of 18 Good Enough?", American Lutherie #130)', () => {
  // published 34-inch worked example (handbook) + arithmetic, tolerance 1e-3 in
  it.each([
    [1, 1.9083],
    [2, 3.7094],
    [3, 5.4095],
    [5, 8.5288],
    [7, 11.3077],
    [12, 17.0],
    [24, 25.5],
  ])('34 in scale: fret %i at %f in', (fret, inches) => {
    expect(Math.abs((fretDistances(34, 24)[fret] ?? 0) - inches)).toBeLessThan(TOLERANCE)
  })

  // the old rule of 18 (Mottola 2017): 34 in gives d1 1.8889, d12 16.876 — must NOT match
  it.each([
    [1, 1.8889],
    [12, 16.876],
  ])('34 in scale: fret %i is not the rule-of-18 value %f in', (fret, ruleOf18) => {
    expect(Math.abs((fretDistances(34, 24)[fret] ?? 0) - ruleOf18)).toBeGreaterThan(0.01)
  })

  it('uses the divisor 17.817154 for the first fret (Guild of American Luthiers)', () => {
    expect((fretDistances(34, 1)[1] ?? 0) * 17.817154).toBeCloseTo(34, 5)
  })

  // arithmetic from d(n) = L · (1 − 2^(−n/12))
  it.each([
    [25.5, 1, 1.4312],
    [25.5, 12, 12.75],
    [864, 1, 48.493],
    [864, 12, 432],
    [648, 1, 36.369],
    [648, 12, 324],
  ])('scale %f: fret %i at %f', (scaleLength, fret, expected) => {
    expect(Math.abs((fretDistances(scaleLength, 24)[fret] ?? 0) - expected)).toBeLessThan(TOLERANCE)
  })

  it('halves the string at 12 and leaves a quarter at 24 (Mottola: d(12) = L/2, d(24) = 3L/4)', () => {
    for (const scaleLength of [30, 34, 35, 25.5, 864]) {
      const distances = fretDistances(scaleLength, 24)
      expect(distances).toHaveLength(25)
      expect(distances[0]).toBe(0)
      expect(distances[12]).toBeCloseTo(scaleLength / 2, 9)
      expect(distances[24]).toBeCloseTo((3 * scaleLength) / 4, 9)
    }
  })

  it.each([
    [0, 24],
    [-34, 24],
    [34, 0],
    [34, 31],
    [34, 2.5],
  ])('throws a RangeError for scale length %f and %f frets', (scaleLength, frets) => {
    expect(() => fretDistances(scaleLength, frets)).toThrow(RangeError)
  })
})

describe('even spacing and drawing helpers', () => {
  it('spaces frets evenly over the true length to the last fret (arithmetic: 25.5 / 24 per fret)', () => {
    const distances = evenFretDistances(34, 24)
    expect(distances).toHaveLength(25)
    distances.forEach((distance, fret) => expect(distance).toBeCloseTo((25.5 * fret) / 24, 9))
  })

  it('puts each note marker halfway between its fret and the one before (arithmetic)', () => {
    expect(fretMidpoints([0, 2, 4, 5])).toEqual([0, 1, 3, 4.5])
  })

  it('marks 3 5 7 9, double 12, 15 17 19 21, double 24 (common practice)', () => {
    expect(inlayFrets(24)).toEqual([
      ...[3, 5, 7, 9].map((fret) => ({ fret, double: false })),
      { fret: 12, double: true },
      ...[15, 17, 19, 21].map((fret) => ({ fret, double: false })),
      { fret: 24, double: true },
    ])
    expect(inlayFrets(4).map((inlay) => inlay.fret)).toEqual([3])
  })
})
