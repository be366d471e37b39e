// Seeded random numbers, so generated exercises can be replayed and tested.

/**
 * A source of random numbers in [0, 1), like Math.random but seeded.
 *
 * @example
 * const random: Random = createRandom(42)
 */
export type Random = () => number

/**
 * Creates a seeded random source (mulberry32: fast, 32-bit state, good enough for exercises; not
 * for secrets). The same seed always gives the same sequence.
 *
 * @example
 * const random = createRandom(42)
 * random() // 0.6011037519201636, the same on every run
 */
export function createRandom(seed: number): Random {
  if (!Number.isInteger(seed)) {
    throw new RangeError(`A random seed must be a whole number; got ${String(seed)}.`)
  }
  let state = seed >>> 0
  return () => {
    state = (state + 0x6d2b79f5) >>> 0
    let mixed = Math.imul(state ^ (state >>> 15), state | 1)
    mixed ^= mixed + Math.imul(mixed ^ (mixed >>> 7), mixed | 61)
    return ((mixed ^ (mixed >>> 14)) >>> 0) / 4294967296
  }
}

/**
 * Turns a text (a session id, a student and a date …) into a 32-bit seed with FNV-1a, so the same
 * text always seeds the same exercises.
 *
 * @example
 * seedFromText('marta-2024-05-01') // a whole number from 0 to 4294967295, always the same
 */
export function seedFromText(text: string): number {
  let hash = 0x811c9dc5
  for (let index = 0; index < text.length; index += 1) {
    hash = Math.imul(hash ^ text.charCodeAt(index), 0x01000193) >>> 0
  }
  return hash
}

/**
 * A whole number from 0 to count − 1 drawn from a random source.
 *
 * @example
 * randomInt(createRandom(7), 6) // a die roll minus one, the same for seed 7 every time
 */
export function randomInt(random: Random, count: number): number {
  if (!Number.isInteger(count) || count < 1) {
    throw new RangeError(`Can only draw from a whole number of choices (1 or more); got ${count}.`)
  }
  return Math.min(count - 1, Math.floor(random() * count))
}

/**
 * Returns a shuffled copy of a list (Fisher–Yates); the input is left untouched.
 *
 * @example
 * shuffled(['C', 'F', 'Bb'], createRandom(3)) // the three keys in an order fixed by seed 3
 */
export function shuffled<T>(items: readonly T[], random: Random): T[] {
  const copy = [...items]
  for (let index = copy.length - 1; index > 0; index -= 1) {
    const other = randomInt(random, index + 1)
    const held = copy[index] as T
    copy[index] = copy[other] as T
    copy[other] = held
  }
  return copy
}
