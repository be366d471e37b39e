import { describe, expect, it } from 'vitest'
import { parsePitch, pitchName } from './pitch'
import { writtenPitch } from './written'

// Bass and guitar are written an octave above sounding (common practice; orchestration handbooks)
describe('writtenPitch', () => {
  it.each([
    ['E1', 'bass', 'E2'], // the open low E of a 4-string bass
    ['B0', 'bass', 'B1'],
    ['E2', 'guitar', 'E3'], // the guitar's low E
    ['E4', 'guitar', 'E5'],
  ] as const)('%s sounding on a %s is written %s', (sounding, instrument, written) => {
    expect(pitchName(writtenPitch(parsePitch(sounding), instrument))).toBe(written)
  })

  it('throws a RangeError for an unknown instrument or a written pitch past MIDI 127', () => {
    expect(() => writtenPitch(40, 'cello' as never)).toThrow(/not an instrument kind/)
    expect(() => writtenPitch(120, 'guitar')).toThrow(/written pitch/)
  })
})
