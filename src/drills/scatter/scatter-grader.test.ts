import { describe, expect, it } from 'vitest'
import { scatterGrader } from './scatter-grader'
import type { ScatterQuestion } from './scatter-generator'

const NECK = { tuning: [28, 33, 38, 43], frets: 20, accidentals: 'flat' as const } // E1 A1 D2 G2
const BB2: ScatterQuestion = {
  key: '0:6',
  expectedPitch: 46,
  cell: null,
  name: 'Bb2',
  displaced: true,
  sequence: 0,
  index: 6,
  detail: {},
}

describe('Octave Scatter grader', () => {
  const grader = scatterGrader(NECK)

  it('accepts Bb2 (46) on the G string fret 3 or the D string fret 8 (arithmetic)', () => {
    expect(grader.grade(BB2, { string: 3, fret: 3, pitch: 46 }, []).correct).toBe(true)
    expect(grader.grade(BB2, { string: 2, fret: 8, pitch: 46 }, []).detail).toEqual({
      displaced: true,
    })
  })

  it('refuses Bb1 (34), the right letter in the wrong octave', () => {
    const grade = grader.grade(BB2, { string: 1, fret: 1, pitch: 34 }, [])
    expect(grade.correct).toBe(false)
    expect(grade.feedback).toContain('B♭2 is an octave higher')
  })
})
