// Pitch Hunt questions: pitches drawn from a fret band of the neck, weak spots first.
import {
  createRandom,
  drawByPitch,
  positionsInRegion,
  type FrettedNote,
  type Position,
} from '../../theory'
import type { HuntSettings } from '../../contract/drills'
import type { DrillQuestion } from '../engine/types'
import type { FocusCell } from '../recall/recall-generator'

export interface HuntQuestion extends DrillQuestion {
  /** The cell the pitch was drawn from (any place of the same pitch is a right answer). */
  cell: Position
}

export interface HuntPlan {
  tuning: readonly number[]
  frets: number
  settings: HuntSettings
  seed: number
  /** Weak spots from the focus selector, weakest first; cells outside the fret band are ignored. */
  focus?: readonly FocusCell[]
}

/** The cells the hunted pitches come from: every string, frets lowFret..highFret (clipped). */
export function huntCells(plan: Pick<HuntPlan, 'tuning' | 'frets' | 'settings'>): FrettedNote[] {
  const highFret = Math.min(plan.settings.highFret, plan.frets)
  const lowFret = Math.min(plan.settings.lowFret, highFret)
  return positionsInRegion(plan.tuning, lowFret, highFret)
}

function toQuestion(cell: FrettedNote, reason?: string): HuntQuestion {
  return {
    key: String(cell.pitch),
    expectedPitch: cell.pitch,
    cell: { string: cell.string, fret: cell.fret },
    detail: reason ? { focusReason: reason.slice(0, 64) } : {},
    ...(reason ? { reason } : {}),
  }
}

/**
 * The questions of a session: with focus on, the weak spots inside the band first (weakest first),
 * then pitches of the band drawn evenly (each pitch as likely, whatever its number of places),
 * never the same pitch twice in a row. No question count (a time
 * limit only) draws 500.
 */
export function huntQuestions(plan: HuntPlan): HuntQuestion[] {
  const cells = huntCells(plan)
  const random = createRandom(plan.seed)
  const count = plan.settings.questionCount ?? 500
  const inBand = new Map(cells.map((cell) => [`${cell.string}:${cell.fret}`, cell]))
  const weak = (plan.settings.focus ? (plan.focus ?? []) : []).filter((item) =>
    inBand.has(`${item.string}:${item.fret}`),
  )
  const questions: HuntQuestion[] = []
  for (const item of weak.slice(0, count)) {
    if (questions.at(-1)?.expectedPitch !== item.pitch)
      questions.push(toQuestion(item, item.reason))
  }
  while (questions.length < count) {
    // pitch first, then a place: a pitch with more places comes up no more often (drawByPitch)
    questions.push(toQuestion(drawByPitch(cells, random, questions.at(-1)?.expectedPitch)))
  }
  return questions
}
