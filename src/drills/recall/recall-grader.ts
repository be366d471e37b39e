// Neck Recall grading: the typed or picked note name for the asked cell.
import {
  pitchClassFromAnswer,
  pitchClassName,
  toAscii,
  toUnicode,
  type AccidentalPreference,
} from '../../theory'
import type { DrillGrader, Grade } from '../engine/types'
import type { RecallQuestion } from './recall-generator'

export interface RecallGrading {
  /** Only the spelling in the key counts (D# is wrong in Bb major, where the note is Eb). */
  spellInKey: boolean
  keyLabel: string
  accidentals: AccidentalPreference
}

/** "eb" → "Eb", "F♯" → "F#", "BB" → "Bb": a letter and its accidentals, as the attempt stores it. */
export function normalizeNoteName(text: string): string {
  const ascii = toAscii(text.trim())
  return `${ascii.charAt(0).toUpperCase()}${ascii.slice(1).toLowerCase()}`
}

// Both names of a black key ("G♯/A♭"), the instrument's preference first.
function bothNames(pitchClass: number, prefer: AccidentalPreference): string {
  const first = pitchClassName(pitchClass, prefer)
  const second = pitchClassName(pitchClass, prefer === 'flat' ? 'sharp' : 'flat')
  return toUnicode(first === second ? first : `${first}/${second}`)
}

function grade(question: RecallQuestion, text: string, options: RecallGrading): Grade {
  const base = { cell: question.cell, reveal: [question.cell], detail: {} }
  let pitchClass: number
  try {
    pitchClass = pitchClassFromAnswer(text)
  } catch (error) {
    const message = error instanceof RangeError ? error.message : 'Type a note name.'
    return {
      ...base,
      correct: false,
      answer: text,
      complete: false,
      counted: false,
      feedback: message,
    }
  }
  const answer = normalizeNoteName(text)
  const expectedClass = question.expectedPitch % 12
  const rightSound = pitchClass === expectedClass
  const rightSpelling = !options.spellInKey || answer === question.spelled
  const correct = rightSound && rightSpelling
  const shown = toUnicode(answer)
  const expected = options.spellInKey
    ? toUnicode(question.spelled)
    : bothNames(expectedClass, options.accidentals)
  let feedback = `Right: ${expected}.`
  if (!rightSound) feedback = `Not ${shown}: this cell is ${expected}.`
  else if (!rightSpelling)
    feedback = `${shown} sounds right, but in ${toUnicode(options.keyLabel)} it is spelled ${expected}.`
  return { ...base, correct, answer, complete: true, counted: true, feedback }
}

export function recallGrader(options: RecallGrading): DrillGrader<RecallQuestion, string> {
  return {
    grade: (question, text) => grade(question, text, options),
    reveal: (question) => ({
      correct: false,
      answer: '',
      cell: question.cell,
      complete: true,
      counted: true,
      feedback: `This cell is ${options.spellInKey ? toUnicode(question.spelled) : bothNames(question.expectedPitch % 12, options.accidentals)}.`,
      reveal: [question.cell],
      detail: { revealed: true },
    }),
  }
}
