// Shapes shared by the pure focus modules (scoring, selection, cards) and their callers.

/** Spaced-review state of one fretboard place (an FSRS card plus the last few miss times). */
export interface ReviewCard {
  due: Date
  stability: number
  difficulty: number
  elapsedDays: number
  scheduledDays: number
  learningSteps: number
  reps: number
  lapses: number
  /** FSRS state: 0 new, 1 learning, 2 review, 3 relearning. */
  state: number
  lastReview: Date | null
  /** When the last few misses happened, newest last (for "missed twice this week"). */
  recentMisses: Date[]
}

/** What the statistics know about one place: its answers lately and the spaced-review card. */
export interface FocusCandidate {
  string: number
  fret: number
  pitch: number
  /** Answers ever given at this place. */
  attempts: number
  /** Right/wrong of the latest answers (up to 50), oldest first. */
  recentCorrect: boolean[]
  /** Response times of the latest correct answers (up to 50), oldest first. */
  recentMs: number[]
  lastSeenAt: Date | null
  card: ReviewCard | null
}

/** One graded answer, as the card scheduler needs it. */
export interface ReviewAnswer {
  correct: boolean
  responseMs: number
  at: Date
}

/** The parts a weakness score is made of, each 0..1. */
export interface WeaknessParts {
  error: number
  slowness: number
  forgetting: number
  due: number
  exploration: number
}

export interface ScoredCandidate extends FocusCandidate {
  score: number
  parts: WeaknessParts
  reason: string
}

/** A chosen question: the place, its weakness score, when it is due and why it was chosen. */
export interface FocusPick {
  string: number
  fret: number
  pitch: number
  score: number
  due: Date | null
  reason: string
}
