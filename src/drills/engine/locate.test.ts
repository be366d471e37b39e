import { describe, expect, it } from 'vitest'
import { describeMiss, gradeLocate, nearestPlace, revealLocate, type Neck } from './locate'

const NECK: Neck = { tuning: [28, 33, 38, 43], frets: 20, accidentals: 'flat' } // E1 A1 D2 G2 (common practice)

describe('grading a located pitch', () => {
  it('accepts the exact pitch on any string and stores the picked cell', () => {
    // A2 = 45 = E string 17 = A string 12 = D string 7 = G string 2 (arithmetic, REFERENCES.md)
    for (const [string, fret] of [
      [0, 17],
      [1, 12],
      [2, 7],
      [3, 2],
    ] as const) {
      const grade = gradeLocate({
        neck: NECK,
        expectedPitch: 45,
        pick: { string, fret, pitch: 45 },
      })
      expect(grade.correct).toBe(true)
      expect(grade.cell).toEqual({ string, fret })
      expect(grade.answer).toBe(`${string}:${fret}`)
    }
  })

  it('refuses the same note an octave away and reveals every place of the right pitch', () => {
    const grade = gradeLocate({
      neck: NECK,
      expectedPitch: 45,
      pick: { string: 1, fret: 0, pitch: 33 },
    })
    expect(grade.correct).toBe(false)
    expect(grade.feedback).toBe(
      'That is A1; A2 is an octave higher. It lives at the marked places.',
    )
    expect(grade.reveal).toHaveLength(4)
    // stored cell: the place of A2 nearest the pick by fret: G string fret 2 (2 frets from the open A)
    expect(grade.cell).toEqual({ string: 3, fret: 2 })
  })

  it('stores the question cell for a miss when the question has one', () => {
    const grade = gradeLocate({
      neck: NECK,
      expectedPitch: 45,
      pick: { string: 0, fret: 0, pitch: 28 },
      questionCell: { string: 2, fret: 7 },
    })
    expect(grade.cell).toEqual({ string: 2, fret: 7 })
  })

  it.each([
    [33, 45, 'an octave higher'],
    [57, 45, 'an octave lower'],
    [21, 45, '2 octaves higher'],
    [44, 45, '1 semitone higher'],
    [48, 45, '3 semitones lower'],
  ])('a pick of %i for %i is described as %s (arithmetic)', (picked, expected, text) => {
    expect(describeMiss(picked, expected)).toBe(text)
  })

  it('finds the nearest place by fret first', () => {
    expect(
      nearestPlace(
        [
          { string: 0, fret: 17 },
          { string: 3, fret: 2 },
        ],
        { string: 0, fret: 4 },
      ),
    ).toEqual({ string: 3, fret: 2 })
    expect(nearestPlace([], { string: 0, fret: 4 })).toBeNull()
  })

  it('"show me" is a miss that reveals every place', () => {
    const grade = revealLocate(NECK, 45)
    expect(grade.correct).toBe(false)
    expect(grade.reveal).toHaveLength(4)
  })
})
