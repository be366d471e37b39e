// Neck Recall grading: the typed or picked note name for the asked cell, accepted as the theory
// core's acceptedNames allows (in a key: its spelling for scale notes).
import {
  acceptedNames,
  pitchClassFromAnswer,
  toAscii,
  toUnicode,
  type AccidentalPreference,
  type KeyRef,
} from '../../theory'
import type { DrillGrader, Grade } from '../engine/types'
import type { RecallQuestion } from './recall-generator'

export interface RecallGrading {
  /** With "spell in a key": scale notes only as the key spells them (D# is wrong in Bb major). */
  key: KeyRef | null
  keyLabel: string
  accidentals: AccidentalPreference
}

/** "eb" → "Eb", "F♯" → "F#", "BB" → "Bb": a letter and its accidentals, as the attempt stores it. */
export function normalizeNoteName(text: string): string {
  const ascii = toAscii(text.trim())
  return `${ascii.charAt(0).toUpperCase()}${ascii.slice(1).toLowerCase()}`
}

// The names a right answer may have ("E♭/D♯"), the preferred first.
const acceptedText = (question: RecallQuestion, options: RecallGrading) =>
  acceptedNames(question.expectedPitch, options.key, options.accidentals).map(toUnicode).join('/')

// Why a right-sounding name is not accepted: the key's spelling, or a name no player writes (B𝄪).
function spellingMiss(shown: string, expected: string, options: RecallGrading): string {
  return options.key
    ? `${shown} sounds right, but in ${toUnicode(options.keyLabel)} it is spelled ${expected}.`
    : `${shown} sounds right, but write it ${expected.replace('/', ' or ')}.`
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
  const rightSound = pitchClass === question.expectedPitch % 12
  const accepted = acceptedNames(question.expectedPitch, options.key, options.accidentals)
  const correct = rightSound && accepted.includes(answer)
  const shown = toUnicode(answer)
  const expected = acceptedText(question, options)
  let feedback = `Right: ${expected}.`
  if (!rightSound) feedback = `Not ${shown}: this cell is ${expected}.`
  else if (!correct) feedback = spellingMiss(shown, expected, options)
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
      feedback: `This cell is ${acceptedText(question, options)}.`,
      reveal: [question.cell],
      detail: { revealed: true },
    }),
  }
}
