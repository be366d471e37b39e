import { describe, expect, it } from 'vitest'
import { cycleGrader, describeStep } from './cycle-grader'
import type { CycleQuestion } from './cycle-generator'

const NECK = { tuning: [28, 33, 38, 43], frets: 20, accidentals: 'flat' as const } // E1 A1 D2 G2
// F major in the window C2–C3: degree 6 is D3 (50), above the window, folded to D2 (38) (PRODUCT.md rule)
const D2: CycleQuestion = {
  key: '1:5',
  expectedPitch: 38,
  cell: null,
  tonic: 'F',
  scale: 'major',
  degree: 6,
  octave: false,
  name: 'D2',
  displaced: true,
  keyIndex: 1,
  direction: 'up',
  detail: {},
}

describe('Window Cycle grader', () => {
  const grader = cycleGrader(NECK)

  it('a folded note found at its exact pitch is right, and the feedback says it was folded', () => {
    const grade = grader.grade(D2, { string: 2, fret: 0, pitch: 38 }, [])
    expect(grade.correct).toBe(true)
    expect(grade.feedback).toBe('Right: D2 (folded down an octave to stay inside the window).')
    expect(grade.detail).toEqual({ displaced: true })
  })

  it('D3 (the unfolded note) is a miss that explains the fold', () => {
    const grade = grader.grade(D2, { string: 2, fret: 12, pitch: 50 }, [])
    expect(grade.correct).toBe(false)
    expect(grade.feedback).toContain('D2 is an octave lower')
    expect(grade.feedback).toContain('It was folded down an octave to stay inside the window.')
  })

  it('names the step for the prompt', () => {
    expect(describeStep(D2)).toBe('F major, degree 6')
    expect(
      describeStep({ tonic: 'Eb', scale: 'major', degree: 1, octave: true, displaced: false }),
    ).toBe('E♭ major, degree 1 (the octave)')
  })

  it('a closing root folded onto the starting pitch is a fold, not the octave (PRODUCT.md)', () => {
    const closing = { tonic: 'F', scale: 'major', degree: 1, octave: false, displaced: true }
    expect(describeStep(closing)).toBe('F major, degree 1 (folded)')
  })

  it('going down, a note below the window is folded up (PRODUCT.md "down": mirror image)', () => {
    const down = { ...D2, direction: 'down' as const }
    const grade = grader.grade(down, { string: 2, fret: 0, pitch: 38 }, [])
    expect(grade.feedback).toBe('Right: D2 (folded up an octave to stay inside the window).')
  })
})
