// Calibration arithmetic: the noise gate from a quiet room and the output→input latency.
import { describe, expect, it } from 'vitest'
import { measureLatency, noiseGate } from './index'

describe('noiseGate', () => {
  it('sits 6 dB above the loudest noise (95th percentile) of the quiet room', () => {
    // 2 s of readings every 50 ms; one bump in 40 readings is ignored
    const peaks = [...Array(39).fill(-62), -50]
    expect(noiseGate(peaks)).toEqual({ gateDb: -56, tooLoud: false })
  })

  it('never goes below −70 dBFS (a silent input still needs a gate)', () => {
    expect(noiseGate([-120, -120]).gateDb).toBe(-70)
  })

  it('says when the room is too loud to play in, and caps the gate', () => {
    expect(noiseGate([-10, -12])).toEqual({ gateDb: -20, tooLoud: true })
  })

  it('refuses an empty reading with a message', () => {
    expect(() => noiseGate([])).toThrow(/No level was read/)
  })
})

describe('measureLatency', () => {
  const clicks = [0, 500, 1000, 1500, 2000, 2500]

  it('is the median distance from each click to the onset heard after it', () => {
    expect(measureLatency(clicks, [41, 540, 1043, 1538, 2040, 2539])).toEqual({
      latencyMs: 40,
      matched: 6,
      spreadMs: 5,
    })
  })

  it('ignores onsets that answer no click (a cough between clicks)', () => {
    expect(measureLatency(clicks, [40, 250, 540, 1040, 1540, 2040])?.latencyMs).toBe(40)
  })

  it('takes taps a little before the click, and never gives a negative latency', () => {
    expect(measureLatency(clicks, [-20, 485, 990, 1480, 1995])?.latencyMs).toBe(0)
  })

  it('gives no figure when fewer than four clicks were heard', () => {
    expect(measureLatency(clicks, [40, 540, 1040])).toBeNull()
  })
})
