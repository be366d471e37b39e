// The range a detector listens to and the analysis sizes that follow. Periods from 12-TET with
// A4 = 440 Hz (ISO 16): E1 = 41.203 Hz (24.3 ms), B0 = 30.868 Hz (32.4 ms).
import { describe, expect, it } from 'vitest'
import { analysisWindow, hopSize, resolveRange } from './index'

describe('resolveRange', () => {
  it('reads names and MIDI numbers; without a highest it covers four octaves', () => {
    expect(resolveRange({ lowest: 'E1' })).toEqual({ lowest: 28, highest: 76, referenceHz: 440 })
    expect(resolveRange({ lowest: 23, highest: 'G4', referenceHz: 442 })).toEqual({
      lowest: 23,
      highest: 67,
      referenceHz: 442,
    })
  })

  it('rejects a reference pitch outside 400–480 Hz', () => {
    expect(() => resolveRange({ lowest: 'E1', referenceHz: 300 })).toThrow(RangeError)
  })
})

describe('analysis sizes', () => {
  it.each([
    // [lowest, sample rate, window]: ≥ 2 periods of the lowest note a quarter tone flat
    [28, 48_000, 2816], // E1: 58.7 ms ≥ 2 × 25.2 ms
    [23, 48_000, 3840], // B0: 80 ms ≥ 2 × 33.5 ms
    [28, 44_100, 2560], // E1 at 44.1 kHz
    [40, 48_000, 1536], // E2, a guitar: 32 ms
  ])('lowest %i at %i Hz → a window of %i samples', (lowest, rate, window) => {
    const size = analysisWindow(resolveRange({ lowest }), rate)
    expect(size).toBe(window)
    const period = rate / (440 * 2 ** ((lowest - 0.5 - 69) / 12))
    expect(size).toBeGreaterThanOrEqual(2 * period)
  })

  it('analyses about every 5 ms, in whole 128-sample render quanta', () => {
    expect([hopSize(48_000), hopSize(44_100), hopSize(96_000), hopSize(16_000)]).toEqual([
      256, 256, 512, 128,
    ])
  })
})
