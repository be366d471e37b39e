import { describe, expect, it } from 'vitest'
import { instrumentOfTuning, spelledNote } from './spelled-note'

describe('spelledNote', () => {
  // Scientific pitch notation (ASA 1939): the octave number follows the letter, so Cb3 = 47.
  it.each([
    ['Eb2', { step: 'E', alter: -1, octave: 2 }],
    ['Cb3', { step: 'C', alter: -1, octave: 3 }],
    ['B#3', { step: 'B', alter: 1, octave: 3 }],
    ['F##2', { step: 'F', alter: 2, octave: 2 }],
    ['E♭1', { step: 'E', alter: -1, octave: 1 }],
  ])('%s → %j', (name, parts) => {
    expect(spelledNote(name)).toEqual(parts)
  })

  it('refuses a name without an octave with a readable RangeError', () => {
    expect(() => spelledNote('Eb')).toThrow(/not a note name with an octave/)
  })
})

describe('instrumentOfTuning', () => {
  // Common practice: basses E1–G2 / B0–C3; guitars E2–E4, 7-string B1–E4 (REFERENCES.md).
  it.each([
    [[28, 33, 38, 43], 'bass'],
    [[23, 28, 33, 38, 43, 48], 'bass'],
    [[40, 45, 50, 55, 59, 64], 'guitar'],
    [[35, 40, 45, 50, 55, 59, 64], 'guitar'],
  ])('%j is a %s tuning', (tuning, instrument) => {
    expect(instrumentOfTuning(tuning)).toBe(instrument)
  })
})
