import { describe, expect, it } from 'vitest'
import { cellName, cellNote, formatClock, formatPercent, formatSeconds } from './drill-format'

const BASS = [28, 33, 38, 43] // E1 A1 D2 G2 (common practice)

describe('drill formatting (arithmetic)', () => {
  it.each([
    [null, '—'],
    [840, '0.8 s'],
    [12_449, '12.4 s'],
  ])('formatSeconds(%s) = %s', (ms, text) => expect(formatSeconds(ms)).toBe(text))

  it.each([
    [7_900, '0:07'],
    [185_000, '3:05'],
    [-5, '0:00'],
  ])('formatClock(%i) = %s', (ms, text) => expect(formatClock(ms)).toBe(text))

  it('formats a ratio as a whole percent', () => {
    expect(formatPercent(11 / 12)).toBe('92 %')
    expect(formatPercent(null)).toBe('—')
  })

  it('names cells the way players do', () => {
    expect(cellName(BASS, { string: 1, fret: 5 }, 'flat')).toBe('A string, fret 5')
    expect(cellName(BASS, { string: 0, fret: 0 }, 'flat')).toBe('open E string')
    expect(cellNote(BASS, { string: 1, fret: 6 }, 'flat')).toBe('E♭2') // A1 + 6 = 39 (arithmetic)
  })
})
