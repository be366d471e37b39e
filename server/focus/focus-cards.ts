// Spaced review per fretboard place with FSRS (ts-fsrs): a miss is "Again", a slow right answer
// "Hard", any other right answer "Good". Pure: no I/O, the caller passes the time.
import { fsrs, Rating, type Card, type Grade } from 'ts-fsrs'
import type { ReviewAnswer, ReviewCard } from './focus-types'

/** FSRS with its published default weights, 90 % target retention and no random fuzz (reproducible). */
const SCHEDULER = fsrs({ request_retention: 0.9, enable_fuzz: false, enable_short_term: true })
/** A right answer slower than this many times the player's usual time counts as "Hard". */
export const SLOW_FACTOR = 1.5
const MISSES_KEPT = 5

function toFsrs(card: ReviewCard): Card {
  return {
    due: card.due,
    stability: card.stability,
    difficulty: card.difficulty,
    elapsed_days: card.elapsedDays,
    scheduled_days: card.scheduledDays,
    learning_steps: card.learningSteps,
    reps: card.reps,
    lapses: card.lapses,
    state: card.state,
    ...(card.lastReview ? { last_review: card.lastReview } : {}),
  }
}

function fromFsrs(card: Card, recentMisses: Date[]): ReviewCard {
  return {
    due: card.due,
    stability: card.stability,
    difficulty: card.difficulty,
    elapsedDays: card.elapsed_days,
    scheduledDays: card.scheduled_days,
    learningSteps: card.learning_steps,
    reps: card.reps,
    lapses: card.lapses,
    state: card.state,
    lastReview: card.last_review ?? null,
    recentMisses,
  }
}

/** The FSRS grade of an answer, given the player's usual (median) response time. */
export function gradeOf(answer: ReviewAnswer, usualMs: number | null): Grade {
  if (!answer.correct) return Rating.Again
  if (usualMs !== null && answer.responseMs > SLOW_FACTOR * usualMs) return Rating.Hard
  return Rating.Good
}

/** A card nobody has reviewed yet, due at once. */
export function newCard(now: Date): ReviewCard {
  return {
    due: now,
    stability: 0,
    difficulty: 0,
    elapsedDays: 0,
    scheduledDays: 0,
    learningSteps: 0,
    reps: 0,
    lapses: 0,
    state: 0,
    lastReview: null,
    recentMisses: [],
  }
}

/**
 * The card after one more answer at its place. Answers that arrive out of order (older than the
 * last review) are scheduled at the last review time, since FSRS cannot go back in time.
 */
export function reviewCard(
  card: ReviewCard | null,
  answer: ReviewAnswer,
  usualMs: number | null,
): ReviewCard {
  const current = card ?? newCard(answer.at)
  const last = current.lastReview?.getTime() ?? -Infinity
  const at = answer.at.getTime() < last ? new Date(last) : answer.at
  const next = SCHEDULER.next(toFsrs(current), at, gradeOf(answer, usualMs)).card
  const misses = answer.correct
    ? current.recentMisses
    : [...current.recentMisses, answer.at].slice(-MISSES_KEPT)
  return fromFsrs(next, misses)
}

/** Probability (0..1) that the place is still recalled at `now`, by the FSRS forgetting curve. */
export function retrievability(card: ReviewCard | null, now: Date): number {
  if (!card || card.state === 0 || !card.lastReview) return 0
  return SCHEDULER.get_retrievability(toFsrs(card), now, false)
}
