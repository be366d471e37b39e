// A note played on the instrument (the "play" input mode) as the answer of a drill that is answered
// on the board: a microphone hears the pitch, not the string, so the place is the one nearest the
// question's cell (skipping places already found).
import { positionsOf, type Position } from '../../theory'
import { nearestPlace, sameCell, type PickedCell } from './locate'
import type { DrillQuestion, Grade } from './types'

/** Where `pitch` sounds on this neck nearest `near`; null when the neck cannot play it. */
export function placeOfPitch(
  neck: { tuning: readonly number[]; frets: number },
  pitch: number,
  near: Position | null,
  avoid: readonly Position[] = [],
): PickedCell | null {
  const places = positionsOf(neck.tuning, neck.frets, pitch)
  const open = places.filter((place) => !avoid.some((cell) => sameCell(cell, place)))
  const place = nearestPlace(open.length > 0 ? open : places, near ?? { string: 0, fret: 0 })
  return place ? { ...place, pitch } : null
}

/** The places this question's right picks already found. */
export const foundCells = (picks: readonly Grade[]): Position[] =>
  picks.flatMap((grade) => (grade.correct && grade.pick ? [grade.pick] : []))

/** How a drill answered on the board takes its answers: a pick as it is, a played note at its place. */
export const LOCATE_ANSWERS = {
  picked: (cell: PickedCell) => cell,
  heard: (
    pitch: number,
    question: DrillQuestion,
    context: { neck: { tuning: readonly number[]; frets: number }; picks: readonly Grade[] },
  ) => placeOfPitch(context.neck, pitch, question.cell, foundCells(context.picks)),
}
