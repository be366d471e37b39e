import { describe, expect, it } from 'vitest'
import type { Neck } from '../engine/locate'
import type { Grade } from '../engine/types'
import { huntGrader } from './hunt-grader'
import type { HuntQuestion } from './hunt-generator'

const NECK: Neck = { tuning: [28, 33, 38, 43], frets: 20, accidentals: 'flat' } // E1 A1 D2 G2 (common practice)
// A2 = 45: E 17, A 12, D 7, G 2 (arithmetic, REFERENCES.md)
const A2: HuntQuestion = { key: '45', expectedPitch: 45, cell: { string: 1, fret: 12 }, detail: {} }

describe('Pitch Hunt grader', () => {
  it('one pick: any place of the exact pitch is right; the octave below is wrong', () => {
    const grader = huntGrader(NECK, false)
    expect(grader.grade(A2, { string: 3, fret: 2, pitch: 45 }, []).correct).toBe(true)
    const miss = grader.grade(A2, { string: 1, fret: 0, pitch: 33 }, [])
    expect(miss).toMatchObject({ correct: false, complete: true, cell: { string: 1, fret: 12 } })
    expect(miss.reveal).toHaveLength(4)
  })

  it('find every place: done after all four places; a repeat is not counted; a wrong pick counts', () => {
    const grader = huntGrader(NECK, true)
    const picks: Grade[] = []
    const pick = (string: number, fret: number, pitch: number) => {
      const grade = grader.grade(A2, { string, fret, pitch }, picks)
      picks.push(grade)
      return grade
    }
    expect(pick(2, 7, 45)).toMatchObject({
      correct: true,
      complete: false,
      counted: true,
      feedback: 'Found 1 of 4. 3 to go.',
    })
    expect(pick(2, 7, 45)).toMatchObject({
      counted: false,
      complete: false,
      feedback: 'Already found; 3 to go.',
    })
    expect(pick(2, 6, 44)).toMatchObject({ correct: false, counted: true, complete: false })
    pick(0, 17, 45)
    pick(3, 2, 45)
    const last = pick(1, 12, 45)
    expect(last).toMatchObject({
      correct: true,
      complete: true,
      feedback: 'Every place of A2 found.',
    })
    expect(last.reveal).toHaveLength(4)
  })
})
