import { describe, expect, it } from 'vitest'
import { runsGrader } from './runs-grader'
import type { RunsQuestion } from './runs-generator'

const NECK = { tuning: [28, 33, 38, 43], frets: 20, accidentals: 'flat' as const } // E1 A1 D2 G2
// D2 = 38: the fingering plays it on the A string, fret 5 (A1 33 + 5, arithmetic); also the open D string.
const D2: RunsQuestion = {
  key: '0:4',
  expectedPitch: 38,
  cell: { string: 1, fret: 5 },
  name: 'D2',
  direction: 'up',
  pattern: '0:2-3-3-3',
  finger: 4,
  move: 'hand',
  detail: {},
}

describe('Range Runs grader', () => {
  const grader = runsGrader(NECK)

  it('the exact pitch on the fingering cell is right and on the fingering', () => {
    const grade = grader.grade(D2, { string: 1, fret: 5, pitch: 38 }, [])
    expect(grade).toMatchObject({
      correct: true,
      feedback: 'Right: D2.',
      detail: { onFingering: true },
    })
  })

  it('the exact pitch elsewhere is right, off the fingering, and says where the fingering plays it', () => {
    const grade = grader.grade(D2, { string: 2, fret: 0, pitch: 38 }, [])
    expect(grade).toMatchObject({
      correct: true,
      cell: { string: 2, fret: 0 },
      detail: { onFingering: false },
    })
    expect(grade.feedback).toBe('Right note, D2; this fingering plays it on the A string, fret 5.')
  })

  it('a wrong pitch is a miss stored on the fingering cell', () => {
    const grade = grader.grade(D2, { string: 1, fret: 3, pitch: 36 }, [])
    expect(grade).toMatchObject({
      correct: false,
      cell: { string: 1, fret: 5 },
      detail: { onFingering: false },
    })
  })
})
