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
const BB_MAJOR = { tonic: 'Bb', scale: 'major' }
const plain = recallGrader({ key: null, keyLabel: 'Bb major', accidentals: 'flat' })
const inKey = recallGrader({ key: BB_MAJOR, keyLabel: 'Bb major', accidentals: 'flat' })
const cell = (pitch: number): RecallQuestion => ({ ...QUESTION, expectedPitch: pitch })

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

  it('in a key, a note outside it takes either single-accidental name (issue 13, common practice)', () => {
    const dMinor = recallGrader({
      key: { tonic: 'D', scale: 'minor' },
      keyLabel: 'D minor',
      accidentals: 'sharp',
    })
    // C#2 = 37 is the raised 7th of D minor (handbook); Db is its other single-accidental name
    expect(dMinor.grade(cell(37), 'C#', []).correct).toBe(true)
    expect(dMinor.grade(cell(37), 'Db', []).correct).toBe(true)
    // Bb2 = 46 is not in C major: A# and Bb both count
    const cMajor = recallGrader({
      key: { tonic: 'C', scale: 'major' },
      keyLabel: 'C major',
      accidentals: 'sharp',
    })
    expect(cMajor.grade(cell(46), 'Bb', []).correct).toBe(true)
    expect(cMajor.grade(cell(46), 'A#', []).correct).toBe(true)
  })

  it('without a key, a natural note takes its natural name only: Fb for E and B## for C# are misses', () => {
    const fb = plain.grade(cell(40), 'Fb', []) // E2 = 40 (scientific pitch notation)
    expect(fb.correct).toBe(false)
    expect(fb.feedback).toBe('F♭ sounds right, but write it E.')
    expect(plain.grade(cell(37), 'B##', []).correct).toBe(false) // C#2 = 37
    expect(plain.grade(cell(37), 'Db', []).correct).toBe(true)
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
