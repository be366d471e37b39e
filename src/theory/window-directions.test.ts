import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { ScaleType } from 'tonal'
import { parsePitch } from './pitch'
import { TONICS } from './scale-data'
import { keyCycleInWindow } from './window'

const FOURTHS = ['C', 'F', 'Bb', 'Eb', 'Ab', 'Db', 'Gb', 'B', 'E', 'A', 'D', 'G'] // PRODUCT.md

describe('keyCycleInWindow: down, alternate and a start key (PRODUCT.md "Window cycle")', () => {
  const E1_B2 = { low: parsePitch('E1'), high: parsePitch('B2') }

  it('down is the mirror image: highest root first, nearest below, folded up into the window', () => {
    // C2–C3, F major down (arithmetic): the only F is F2; F2 E2 D2 C2, then Bb1 (34) is below C2,
    // folded up an octave to Bb2 (46); then A2 G2 F2 go down from there.
    const [key] = keyCycleInWindow({
      low: 36,
      high: 48,
      tonics: ['F'],
      scale: 'major',
      direction: 'down',
    })
    expect(key?.names).toEqual(['F2', 'E2', 'D2', 'C2', 'Bb2', 'A2', 'G2', 'F2'])
    expect(key?.displaced).toEqual([false, false, false, false, true, false, false, false])
    expect(key?.direction).toBe('down')
    const [c] = keyCycleInWindow({
      low: 36,
      high: 48,
      tonics: ['C'],
      scale: 'major',
      direction: 'down',
    })
    expect(c?.names).toEqual(['C3', 'B2', 'A2', 'G2', 'F2', 'E2', 'D2', 'C2']) // highest root first
    expect(c?.octave.at(-1)).toBe(true)
  })

  // Worked by hand (arithmetic, rules from PRODUCT.md): E1–B2 = 28–47, fourths, major, alternate
  const ALTERNATE: [string, 'up' | 'down', string, string][] = [
    // no C1 in the window: start on C2; C3 (48) is above B2, folded to C2 — a fold onto the
    // start pitch, not the octave
    ['C', 'up', 'C2 D2 E2 F2 G2 A2 B2 C2', '00000001'],
    // last C2 (36): F1 (29) is 7 away, F2 (41) 5 away → F2, then down to F1
    ['F', 'down', 'F2 E2 D2 C2 Bb1 A1 G1 F1', '00000000'],
    // last F1 (29): Bb1 (34) 5 away, Bb2 (46) 17 → Bb1, up to Bb2
    ['Bb', 'up', 'Bb1 C2 D2 Eb2 F2 G2 A2 Bb2', '00000000'],
    // last Bb2 (46): only Eb2 (39) (Eb1 = 27 is below E1); Eb1 folds up to Eb2
    ['Eb', 'down', 'Eb2 D2 C2 Bb1 Ab1 G1 F1 Eb2', '00000001'],
  ]
  const cycle = keyCycleInWindow({
    ...E1_B2,
    tonics: FOURTHS,
    scale: 'major',
    direction: 'alternate',
  })

  it.each(ALTERNATE.map((row, index) => [index, ...row] as const))(
    'alternate, key %i: %s major %s → %s',
    (index, tonic, direction, notes, folds) => {
      const key = cycle[index]
      expect(key?.tonic).toBe(tonic)
      expect(key?.direction).toBe(direction)
      expect(key?.names).toEqual(notes.split(' '))
      expect(key?.displaced).toEqual([...folds].map((fold) => fold === '1'))
      expect(key?.octave.at(-1)).toBe(folds.endsWith('0'))
    },
  )

  it('alternate uses the whole E1–B2 window, its lowest and its highest octave (issue 13)', () => {
    const played = cycle.flatMap((key) => key.pitches)
    expect(played).toHaveLength(96)
    expect(Math.min(...played)).toBe(parsePitch('F1')) // up-only stays in C2–B2 (below)
    expect(Math.max(...played)).toBe(parsePitch('B2'))
    expect(played.filter((pitch) => pitch < parsePitch('C2')).length).toBeGreaterThan(10)
    const up = keyCycleInWindow({ ...E1_B2, tonics: FOURTHS, scale: 'major' }).flatMap(
      (key) => key.pitches,
    )
    expect(Math.min(...up)).toBe(parsePitch('C2'))
  })

  it('starts at the start key, matched by pitch class, and refuses one outside the cycle', () => {
    const keys = keyCycleInWindow({
      low: 36,
      high: 48,
      tonics: FOURTHS,
      scale: 'major',
      startTonic: 'A#',
    })
    expect(keys.map((key) => key.tonic)).toEqual([...FOURTHS.slice(2), ...FOURTHS.slice(0, 2)])
    expect(keys[0]?.pitches[0]).toBe(parsePitch('Bb2')) // the lowest Bb in C2–C3
    expect(() =>
      keyCycleInWindow({ low: 36, high: 48, tonics: ['C', 'F'], scale: 'major', startTonic: 'G' }),
    ).toThrow('The start key G is not in the cycle (C F).')
    expect(() =>
      keyCycleInWindow({
        low: 36,
        high: 48,
        tonics: ['C'],
        scale: 'major',
        direction: 'sideways' as never,
      }),
    ).toThrow(/not a direction/)
  })

  it('spells a chromatic key with sharps going up and flats coming down (common practice)', () => {
    const [up, down] = keyCycleInWindow({
      low: 36,
      high: 48,
      tonics: ['C', 'C'],
      scale: 'chromatic',
      direction: 'alternate',
    })
    expect(up?.names.slice(0, 3)).toEqual(['C2', 'C#2', 'D2'])
    // the up key ends on C3 (48); the down key starts on the nearest C, C3 itself
    expect(down?.names.slice(0, 4)).toEqual(['C3', 'B2', 'Bb2', 'A2'])
    expect(down?.names.every((name) => !name.includes('#'))).toBe(true)
  })
})

describe('keyCycleInWindow: every direction (fast-check)', () => {
  const cases = fc.record({
    low: fc.integer({ min: 0, max: 100 }),
    width: fc.integer({ min: 11, max: 27 }),
    tonics: fc.array(fc.constantFrom(...TONICS), { minLength: 1, maxLength: 13 }),
    scale: fc.constantFrom(...ScaleType.all().map((type) => type.name)),
    direction: fc.constantFrom('up' as const, 'down' as const, 'alternate' as const),
  })

  it('keeps every note in the window; unfolded steps go 1–12 semitones the key’s way (PRODUCT.md)', () => {
    fc.assert(
      fc.property(cases, ({ low, width, ...rest }) => {
        const high = low + width
        const keys = keyCycleInWindow({ low, high, ...rest })
        keys.forEach((key, index) => {
          const expected =
            rest.direction === 'alternate' ? (index % 2 ? 'down' : 'up') : rest.direction
          expect(key.direction).toBe(expected)
          const sign = key.direction === 'up' ? 1 : -1
          key.pitches.slice(1).forEach((pitch, note) => {
            const step = sign * (pitch - (key.pitches[note] ?? 0))
            expect(pitch >= low && pitch <= high).toBe(true)
            if (!key.displaced[note + 1]) expect(step > 0 && step <= 12).toBe(true)
            else expect(step).toBeLessThanOrEqual(0) // folded back against the way of play
          })
          expect(key.pitches.at(-1)! % 12).toBe(key.pitches[0]! % 12) // root to root
        })
      }),
    )
  })
})
