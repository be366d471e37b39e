import { describe, expect, it } from 'vitest'
import { createRandom, randomInt, seedFromText, shuffled } from './random'

const draw = (seed: number, count: number) => Array.from({ length: count }, createRandom(seed))

describe('createRandom', () => {
  it('repeats the same sequence for the same seed and differs between seeds', () => {
    expect(draw(42, 20)).toEqual(draw(42, 20))
    expect(draw(42, 20)).not.toEqual(draw(43, 20))
  })

  it('stays in [0, 1) and spreads evenly (each tenth within ±15% of 1000 over 10 000 draws)', () => {
    const values = draw(7, 10_000)
    values.forEach((value) => {
      expect(value).toBeGreaterThanOrEqual(0)
      expect(value).toBeLessThan(1)
    })
    const buckets = Array<number>(10).fill(0)
    values.forEach(
      (value) => (buckets[Math.floor(value * 10)] = (buckets[Math.floor(value * 10)] ?? 0) + 1),
    )
    buckets.forEach((bucket) => expect(Math.abs(bucket - 1000)).toBeLessThan(150))
  })

  it('throws a RangeError for a seed that is not a whole number', () => {
    expect(() => createRandom(1.5)).toThrow(RangeError)
  })
})

describe('helpers', () => {
  it('seedFromText is stable and tells texts apart (FNV spec: 32-bit offset basis 2166136261 for "")', () => {
    expect(seedFromText('')).toBe(2166136261)
    expect(seedFromText('marta')).toBe(seedFromText('marta'))
    expect(seedFromText('marta')).not.toBe(seedFromText('marte'))
  })

  it('randomInt draws every value from 0 to count − 1 and nothing else', () => {
    const random = createRandom(3)
    const seen = new Set(Array.from({ length: 600 }, () => randomInt(random, 6)))
    expect([...seen].sort()).toEqual([0, 1, 2, 3, 4, 5])
    expect(() => randomInt(random, 0)).toThrow(RangeError)
  })

  it('shuffled returns a permutation and leaves the input alone', () => {
    const keys = ['C', 'F', 'Bb', 'Eb', 'Ab', 'Db']
    const copy = [...keys]
    const result = shuffled(keys, createRandom(11))
    expect(keys).toEqual(copy)
    expect([...result].sort()).toEqual([...keys].sort())
    expect(shuffled(keys, createRandom(11))).toEqual(result)
  })
})
