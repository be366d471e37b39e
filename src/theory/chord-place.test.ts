import { describe, expect, it } from 'vitest'
import { chordArpeggio, chordTonesInRegion, chordTonesInWindow } from './chord-place'
import { noteAt } from './fretboard'
import { parsePitch } from './pitch'

const BASS = [28, 33, 38, 43] // E1 A1 D2 G2 (common practice)

describe('chord tones on the neck', () => {
  it('C7 in the window C2–C3: C2 E2 G2 Bb2 C3 (OMT v2 "Seventh Chords"; arithmetic)', () => {
    const placed = chordTonesInWindow('C7', { low: parsePitch('C2'), high: parsePitch('C3') })
    expect(placed.map((tone) => tone.name)).toEqual(['C2', 'E2', 'G2', 'Bb2', 'C3'])
    expect(placed.map((tone) => tone.degree)).toEqual(['1', '3', '5', 'b7', '1'])
    expect(placed.map((tone) => tone.pitch)).toEqual(
      ['C2', 'E2', 'G2', 'Bb2', 'C3'].map(parsePitch),
    )
  })

  it('spells by the chord, octave following the letter: Cb in Abm at B2 is Cb3 (PRODUCT.md)', () => {
    const placed = chordTonesInWindow('Abm', { low: 44, high: 47 })
    expect(placed.map((tone) => tone.name)).toEqual(['Ab2', 'Cb3'])
  })

  it('G7 in frets 2–5 of a 4-string bass, cell by cell (open string + fret, arithmetic)', () => {
    const cells = chordTonesInRegion('G7', { tuning: BASS, lowFret: 2, highFret: 5 })
    expect(cells.map((cell) => `${cell.string}:${cell.fret} ${cell.name} ${cell.degree}`)).toEqual([
      '0:3 G1 1',
      '1:2 B1 3',
      '1:5 D2 5',
      '2:3 F2 b7',
      '2:5 G2 1',
      '3:4 B2 3',
    ])
    for (const cell of cells) expect(noteAt(BASS, cell.string, cell.fret)).toBe(cell.pitch)
  })

  it('an arpeggio starts on the lowest bass tone of the inversion', () => {
    const window = { low: 36, high: 48 }
    expect(chordArpeggio('C', window).map((tone) => tone.name)).toEqual(['C2', 'E2', 'G2', 'C3'])
    expect(chordArpeggio('C/E', window).map((tone) => tone.name)).toEqual(['E2', 'G2', 'C3'])
    expect(() => chordArpeggio('F#/A#', { low: 36, high: 40 })).toThrow(/no A# to start/)
  })
})
