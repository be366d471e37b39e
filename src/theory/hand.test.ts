import { describe, expect, it } from 'vitest'
import { handStep, positionName } from './hand'

describe('handStep: one finger per fret, hand at V (common practice: frets 5–8 ↔ fingers 1–4)', () => {
  it.each([
    [5, { finger: 1, move: 'hand', handAt: 5 }],
    [6, { finger: 2, move: 'hand', handAt: 5 }],
    [8, { finger: 4, move: 'hand', handAt: 5 }],
    [4, { finger: 1, move: 'stretch', handAt: 5 }], // one fret below: finger 1 reaches back
    [9, { finger: 4, move: 'stretch', handAt: 5 }], // one fret above: finger 4 reaches on
    [10, { finger: 4, move: 'shift', handAt: 7 }], // the hand moves just far enough: 7–10
    [2, { finger: 1, move: 'shift', handAt: 2 }],
    [0, { finger: 0, move: 'open', handAt: 5 }], // an open string needs no finger
  ])('fret %i → %j', (fret, step) => {
    expect(handStep(5, fret, 'one-finger-per-fret')).toEqual(step)
  })
})

describe('handStep: the three-fret system (fingers 1-2-4 over three frets, low register on bass)', () => {
  it.each([
    [1, { finger: 1, move: 'hand', handAt: 1 }],
    [2, { finger: 2, move: 'hand', handAt: 1 }],
    [3, { finger: 4, move: 'hand', handAt: 1 }], // a whole tone under fingers 1 and 4
    [4, { finger: 4, move: 'stretch', handAt: 1 }],
    [5, { finger: 4, move: 'shift', handAt: 3 }],
  ])('hand at I, fret %i → %j', (fret, step) => {
    expect(handStep(1, fret, 'three-fret')).toEqual(step)
  })
})

describe('positionName (common practice: the first finger’s fret as a Roman numeral)', () => {
  it.each([
    [1, 'I'],
    [2, 'II'],
    [4, 'IV'],
    [5, 'V'],
    [7, 'VII'],
    [9, 'IX'],
    [12, 'XII'],
    [14, 'XIV'],
    [19, 'XIX'],
    [24, 'XXIV'],
  ])('fret %i → %s', (fret, name) => {
    expect(positionName(fret)).toBe(name)
  })

  it('throws a RangeError for fret 0 or past 30', () => {
    expect(() => positionName(0)).toThrow(RangeError)
    expect(() => positionName(31)).toThrow(RangeError)
  })
})
