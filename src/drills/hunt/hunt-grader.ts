// Pitch Hunt grading: the exact pitch anywhere on the neck; or, in "find every place", all of them.
import { pitchName, positionsOf, toUnicode, type Position } from '../../theory'
import { gradeLocate, revealLocate, sameCell, type Neck, type PickedCell } from '../engine/locate'
import type { DrillGrader, Grade } from '../engine/types'
import type { HuntQuestion } from './hunt-generator'

// The places already found for this question (its earlier right picks).
function foundPlaces(picks: readonly Grade[]): Position[] {
  return picks.flatMap((pick) => (pick.correct && pick.cell ? [pick.cell] : []))
}

function gradeFindAll(
  neck: Neck,
  question: HuntQuestion,
  pick: PickedCell,
  picks: readonly Grade[],
): Grade {
  const places = positionsOf(neck.tuning, neck.frets, question.expectedPitch)
  const found = foundPlaces(picks)
  const name = toUnicode(pitchName(question.expectedPitch, neck.accidentals))
  const single = gradeLocate({
    neck,
    expectedPitch: question.expectedPitch,
    pick,
    questionCell: question.cell,
  })
  if (single.correct && found.some((place) => sameCell(place, pick))) {
    return {
      ...single,
      counted: false,
      complete: false,
      reveal: found,
      feedback: `Already found; ${places.length - found.length} to go.`,
    }
  }
  const total = found.length + (single.correct ? 1 : 0)
  const complete = total >= places.length
  const left = places.length - total
  let feedback = single.correct
    ? `Found ${total} of ${places.length}.`
    : `Not there: that is ${toUnicode(pitchName(pick.pitch, neck.accidentals))}. Keep looking.`
  if (complete) feedback = `Every place of ${name} found.`
  else if (single.correct) feedback += ` ${left} to go.`
  const reveal = complete ? places : single.correct ? [...found, pick] : found
  return {
    ...single,
    complete,
    reveal,
    feedback,
    detail: { findAll: true, found: total, places: places.length },
  }
}

export function huntGrader(neck: Neck, findAll: boolean): DrillGrader<HuntQuestion, PickedCell> {
  return {
    grade: (question, pick, picks) =>
      findAll
        ? gradeFindAll(neck, question, pick, picks)
        : gradeLocate({
            neck,
            expectedPitch: question.expectedPitch,
            pick,
            questionCell: question.cell,
          }),
    reveal: (question) => ({ ...revealLocate(neck, question.expectedPitch), cell: question.cell }),
  }
}
