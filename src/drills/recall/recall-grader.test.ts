import { describe, expect, it } from 'vitest'
import { normalizeNoteName, recallGrader } from './recall-grader'
import type { RecallQuestion } from './recall-generator'

// A string (A1 = 33), fret 6 = 39 = D#2/Eb2 (arithmetic); in Bb major it is Eb, degree 4 (handbook).
const QUESTION: RecallQuestion = {
  key: '1:6',
  expectedPitch: 39,
  cell: { string: 1, fret: 6 },
  spelled: 'Eb',
  detail: {},
}
const plain = recallGrader({ spellInKey: false, keyLabel: 'Bb major', accidentals: 'flat' })
const inKey = recallGrader({ spellInKey: true, keyLabel: 'Bb major', accidentals: 'flat' })

describe('Neck Recall grader', () => {
  it.each(['Eb', 'eb', 'D#', 'd#', 'E♭', 'D♯', ' EB '])(
    'accepts the enharmonic answer %j when spelling is free',
    (text) => {
      const grade = plain.grade(QUESTION, text, [])
      expect(grade.correct).toBe(true)
      expect(grade.counted).toBe(true)
      expect(grade.cell).toEqual({ string: 1, fret: 6 })
    },
  )

  it('with "spell in key", Eb counts and D# is a miss that explains the spelling', () => {
    expect(inKey.grade(QUESTION, 'Eb', []).correct).toBe(true)
    const grade = inKey.grade(QUESTION, 'D#', [])
    expect(grade.correct).toBe(false)
    expect(grade.answer).toBe('D#')
    expect(grade.feedback).toBe('D♯ sounds right, but in B♭ major it is spelled E♭.')
  })

  it('a wrong note is a counted miss naming both spellings of the right one', () => {
    const grade = plain.grade(QUESTION, 'E', [])
    expect(grade).toMatchObject({ correct: false, counted: true, complete: true, answer: 'E' })
    expect(grade.feedback).toBe('Not E: this cell is E♭/D♯.')
  })

  it('text that is not a note name is not counted and says what to type', () => {
    const grade = plain.grade(QUESTION, 'H', [])
    expect(grade).toMatchObject({ counted: false, complete: false })
    expect(grade.feedback).toContain('type a letter A–G')
  })

  it('"show me" is a miss that names the cell', () => {
    expect(plain.reveal(QUESTION, [])).toMatchObject({
      correct: false,
      counted: true,
      feedback: 'This cell is E♭/D♯.',
    })
  })

  it.each([
    ['bb', 'Bb'],
    ['F♯', 'F#'],
    ['c', 'C'],
  ])('normalises %j to %j', (text, name) => {
    expect(normalizeNoteName(text)).toBe(name)
  })
})
