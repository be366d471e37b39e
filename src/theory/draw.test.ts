import { describe, expect, it } from 'vitest'
import { drawByPitch } from './draw'
import { positionsInRegion } from './fretboard'
import { createRandom } from './random'

describe('drawByPitch (issue 13: a pitch first, then a place)', () => {
  // frets 0–5 on E1 A1 D2 G2 (arithmetic): A1 … C2 and D2 … F2 have two places each, the rest one
  const cells = positionsInRegion([28, 33, 38, 43], 0, 5)

  it('draws every distinct pitch about equally often, however many places it has', () => {
    const random = createRandom(7)
    const counts = new Map<number, number>()
    const draws = 21_000
    for (let i = 0; i < draws; i += 1) {
      const cell = drawByPitch(cells, random)
      counts.set(cell.pitch, (counts.get(cell.pitch) ?? 0) + 1)
    }
    const pitches = new Set(cells.map((cell) => cell.pitch))
    expect(counts.size).toBe(pitches.size) // 21 pitches, E1 to C3
    const expected = draws / pitches.size
    // binomial spread (arithmetic): sd = √(n·p·(1−p)) ≈ 31; allow 6 sd
    for (const count of counts.values()) expect(Math.abs(count - expected)).toBeLessThan(190)
  })

  it('spreads the draws of one pitch over its places, and can avoid the last pitch', () => {
    const random = createRandom(3)
    const a1 = cells.filter((cell) => cell.pitch === 33) // E string fret 5, A string open
    expect(a1).toHaveLength(2)
    const places = new Set(
      Array.from({ length: 200 }, () => drawByPitch(a1, random)).map((cell) => cell.string),
    )
    expect(places).toEqual(new Set([0, 1]))
    for (let i = 0; i < 100; i += 1) expect(drawByPitch(cells, random, 33).pitch).not.toBe(33)
    expect(drawByPitch(a1, random, 33).pitch).toBe(33) // nothing else to draw
  })

  it('throws a RangeError for no cells', () => {
    expect(() => drawByPitch([], createRandom(1))).toThrow(RangeError)
  })
})
