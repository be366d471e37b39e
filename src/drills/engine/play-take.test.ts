// The take of the "play" mode: alignment of notes heard with notes asked, evenness, beat offsets
// and the tempo ladder (arithmetic checks, no outside source needed beyond the numbers shown).
import { describe, expect, it } from 'vitest'
import {
  alignTake,
  beatOffsets,
  isCleanTake,
  nextTempo,
  takeEvenness,
  type TakeNote,
} from './play-take'

// E1 F#1 G#1 A1 (a major-scale fragment, 12-TET MIDI numbers: E1 = 28, from memory)
const ASKED = [28, 30, 32, 33]
const exact = (index: number, heard: TakeNote) => heard.pitch === ASKED[index]
const take = (pitches: number[]) => pitches.map((pitch, k) => ({ pitch, onsetMs: k * 500 }))
const kinds = (pitches: number[]) =>
  alignTake(ASKED.length, take(pitches), exact).map((e) => e.kind)

describe('alignTake', () => {
  it('a take played as asked is right note by note', () => {
    expect(kinds([28, 30, 32, 33])).toEqual(['right', 'right', 'right', 'right'])
  })
  it('one wrong note in place of a right one is exactly that note wrong', () => {
    const entries = alignTake(ASKED.length, take([28, 31, 32, 33]), exact)
    expect(entries.map((e) => e.kind)).toEqual(['right', 'wrong', 'right', 'right'])
    expect(entries[1]).toMatchObject({ index: 1, heard: { pitch: 31 } })
  })
  it('a note left out is missing; a note added is extra', () => {
    expect(kinds([28, 32, 33])).toEqual(['right', 'missing', 'right', 'right'])
    expect(kinds([28, 30, 29, 32, 33])).toEqual(['right', 'right', 'extra', 'right', 'right'])
  })
  it('nothing heard: every asked note is missing', () => {
    expect(kinds([])).toEqual(['missing', 'missing', 'missing', 'missing'])
  })
  it('a match may look at the note before (every note in another octave than the last)', () => {
    const classes = [0, 2, 4]
    const free = (i: number, heard: TakeNote, previous: TakeNote | null) =>
      heard.pitch % 12 === classes[i] &&
      (!previous || Math.floor(previous.pitch / 12) !== Math.floor(heard.pitch / 12))
    // C3 D4 E4: E stays in the octave of D → wrong (C3 = 48, D4 = 62, E4 = 64)
    const entries = alignTake(3, take([48, 62, 64]), free)
    expect(entries.map((e) => e.kind)).toEqual(['right', 'right', 'wrong'])
  })
})

describe('takeEvenness', () => {
  it('gives the mean gap and the spread of the gaps', () => {
    expect(takeEvenness([0, 500, 1000, 1500])).toEqual({ meanGapMs: 500, spreadMs: 0 })
    expect(takeEvenness([0, 400, 1000])).toEqual({ meanGapMs: 500, spreadMs: 100 })
    expect(takeEvenness([0, 500])).toBeNull()
  })
})

describe('beatOffsets', () => {
  it('measures each onset against the nearest beat, early negative, with a tolerance', () => {
    const grid = { firstBeatMs: 1000, intervalMs: 500 }
    expect(beatOffsets([990, 1540, 2260], grid, 30)).toEqual([
      { offsetMs: -10, onBeat: true },
      { offsetMs: 40, onBeat: false },
      { offsetMs: -240, onBeat: false },
    ])
  })
})

describe('tempo ladder', () => {
  it('climbs a step after a clean take and falls back after a sloppy one, within bounds', () => {
    expect(nextTempo(80, true)).toBe(84)
    expect(nextTempo(80, false)).toBe(76)
    expect(nextTempo(240, true)).toBe(240)
    expect(nextTempo(40, false)).toBe(40)
  })
  it('a take is clean only when every note is right, nothing extra, all on the beat', () => {
    const right = alignTake(4, take([28, 30, 32, 33]), exact)
    expect(isCleanTake(right, null)).toBe(true)
    expect(isCleanTake(right, [{ offsetMs: 50, onBeat: false }])).toBe(false)
    expect(isCleanTake(alignTake(4, take([28, 30, 29, 32, 33]), exact), null)).toBe(false)
  })
})
