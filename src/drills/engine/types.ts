// Shapes shared by the drill engine and the drill modules: questions, grades and answer records.
import type { Position } from '../../theory'

/** Drill-specific context stored with each attempt (the attempts API accepts these value types). */
export type AttemptDetail = Record<string, string | number | boolean | null>

/** One thing the student is asked. Drills extend it with what their prompt needs. */
export interface DrillQuestion {
  /** Names what is asked (the same cell or note gives the same key); retries ask each missed key once. */
  key: string
  /** The pitch a right answer sounds (or names). */
  expectedPitch: number
  /** The cell the question is about (Neck Recall asks about a cell); null when it asks for a pitch. */
  cell: Position | null
  detail: AttemptDetail
  /** Why the focus selector chose this question ("missed twice this week"), when it did. */
  reason?: string
  /** The expected note as this drill names it (nameInContext: in its key, with octave). */
  name?: string
}

/** What a grader decides about one answer. */
export interface Grade {
  correct: boolean
  /** The answer as stored on the attempt: a note name ("Eb"), a pitch ("Eb2") or a cell ("2:5"). */
  answer: string
  /** The cell stored on the attempt (see each grader for which cell that is). */
  cell: Position | null
  /** False while a question wants more answers (Pitch Hunt's "find every place"). */
  complete: boolean
  /** False for an answer that is not counted (a place already found): shown, not recorded. */
  counted: boolean
  /** What the student reads after answering (note names with ♯/♭ glyphs). */
  feedback: string
  /** The cell the student picked, for drills answered on the board. */
  pick?: Position
  /** Cells the feedback points at (the right places, the intended cell). */
  reveal: Position[]
  detail: AttemptDetail
}

/** A grader turns an answer into a Grade; `picks` are this question's earlier grades. */
export interface DrillGrader<Q extends DrillQuestion, A> {
  grade(question: Q, answer: A, picks: readonly Grade[]): Grade
  /** The grade for "show me": counts as a miss and reveals the answer. */
  reveal(question: Q, picks: readonly Grade[]): Grade
}

/** One graded, counted answer with its response time (ms since the question or last pick). */
export interface AnswerRecord<Q extends DrillQuestion> {
  question: Q
  questionIndex: number
  grade: Grade
  responseMs: number
}

/** What a finished session adds up to. */
export interface SessionSummary<Q extends DrillQuestion> {
  /** Answers given (right or wrong); "show me" is counted apart in `shown`. */
  answers: number
  correct: number
  shown: number
  /** 0..1; null when nothing was answered. */
  accuracy: number | null
  medianMs: number | null
  slowest: SlowCell[]
  misses: Q[]
  questionsAsked: number
  durationMs: number
}

/** A cell and how slowly it was answered (median over its answers in the session). */
export interface SlowCell extends Position {
  /** The note as the session named it (in its key), when its questions name notes. */
  name?: string
  medianMs: number
  answers: number
  correct: number
}
