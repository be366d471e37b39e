import { describe, expect, it } from 'vitest'
import * as theory from './index'

// The public contract of issue 3: outside checks call exactly these names.
const CONTRACT = [
  'parsePitch',
  'pitchName',
  'noteAt',
  'positionsOf',
  'instrumentRange',
  'fretDistances',
  'octaveChoices',
  'scalePitchNames',
  'lowestScaleTone',
  'keyCycleInWindow',
  'rangeRun',
]

// Issue 13: what the drills wire in next (names and signatures as the issue gives them).
const ISSUE_13 = [
  'acceptedNames',
  'nameInContext',
  'keyInfo',
  'scaleCatalog',
  'cycleNotes',
  'writtenPitch',
  'drawByPitch',
  'positionName',
  'parseChord',
  'invertChord',
  'chordTonesInWindow',
  'chordTonesInRegion',
  'twoFiveOneCycle',
  'twelveBarBlues',
  'customProgression',
]

describe('public API (src/theory/index.ts)', () => {
  it.each([...CONTRACT, ...ISSUE_13])('exports %s as a function', (name) => {
    expect(typeof (theory as Record<string, unknown>)[name]).toBe('function')
  })

  it('holds the contract’s example values (PRODUCT.md / issue 3)', () => {
    expect([theory.parsePitch('Eb1'), theory.parsePitch('Cb3'), theory.parsePitch('B#3')]).toEqual([
      27, 47, 60,
    ])
    expect(theory.pitchName(54)).toBe('F#3')
    expect(theory.scalePitchNames('Eb', 'minor')).toEqual(['Eb', 'F', 'Gb', 'Ab', 'Bb', 'Cb', 'Db'])
    expect(theory.fretDistances(34, 24)).toHaveLength(25)
  })
})
