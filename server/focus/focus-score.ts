// How weak a fretboard place is: error rate lately, slowness against the player's own usual time,
// forgetting since the last answer (FSRS), being due for review, and a bonus for little practice
// so nothing is starved. Pure: the caller passes the time. Every part is 0..1; weights sum to 1.
import { median } from '../progress/percentile'
import { retrievability } from './focus-cards'
import type { FocusCandidate, ScoredCandidate, WeaknessParts } from './focus-types'

export const WEIGHTS: WeaknessParts = {
  error: 0.4,
  slowness: 0.2,
  forgetting: 0.2,
  due: 0.1,
  exploration: 0.1,
}
/** Each older answer counts this much less than the next one, so recent form dominates. */
const RECENCY_DECAY = 0.8
const DAY_MS = 24 * 3600 * 1000
const WEEK_MS = 7 * DAY_MS

/** Recency-weighted share of misses, with one imagined miss and one imagined hit as a prior. */
export function errorRate(recentCorrect: readonly boolean[]): number {
  let misses = 0.5
  let total = 1
  let weight = 1
  for (let i = recentCorrect.length - 1; i >= 0; i--, weight *= RECENCY_DECAY) {
    total += weight
    if (!recentCorrect[i]) misses += weight
  }
  return misses / total
}

/** 0 at or below the usual time, 1 at twice the usual time or slower; unknown times count 0.3. */
export function slowness(recentMs: readonly number[], usualMs: number | null): number {
  const itemMs = median(recentMs)
  if (itemMs === null || usualMs === null || usualMs <= 0) return 0.3
  return Math.min(1, Math.max(0, itemMs / usualMs - 1))
}

/**
 * The player's usual response time: the median, over places with a right answer lately, of each
 * place's median (every place counts once, however often it was asked).
 */
export function usualResponseMs(candidates: readonly FocusCandidate[]): number | null {
  return median(candidates.flatMap((c) => (c.recentMs.length ? [median(c.recentMs)!] : [])))
}

const missesSince = (c: FocusCandidate, since: number) =>
  (c.card?.recentMisses ?? []).filter((at) => at.getTime() >= since).length

const TIMES = ['never', 'once', 'twice']

/** The short sentence a student sees next to a question chosen for them. */
export function reasonFor(c: FocusCandidate, parts: WeaknessParts, now: Date): string {
  if (c.attempts === 0) return 'not practised yet'
  const missed = missesSince(c, now.getTime() - WEEK_MS)
  if (missed >= 1) return `missed ${TIMES[missed] ?? `${missed} times`} this week`
  if (parts.slowness >= 0.3) return 'slower than your usual'
  if (parts.due === 1) return 'due for review'
  const idleDays = c.lastSeenAt ? Math.floor((now.getTime() - c.lastSeenAt.getTime()) / DAY_MS) : 0
  if (idleDays >= 7) return `not seen for ${idleDays} days`
  if (parts.error >= 0.25) return 'still shaky lately'
  return 'a quick check to keep it fresh'
}

/** Scores one place; `usualMs` is the player's usual response time (usualResponseMs). */
export function scoreCandidate(
  c: FocusCandidate,
  usualMs: number | null,
  now: Date,
  weights = WEIGHTS,
): ScoredCandidate {
  const parts: WeaknessParts = {
    error: errorRate(c.recentCorrect),
    slowness: slowness(c.recentMs, usualMs),
    forgetting: 1 - retrievability(c.card, now),
    due: c.card && c.card.due.getTime() <= now.getTime() ? 1 : 0,
    exploration: 1 / Math.sqrt(1 + c.attempts),
  }
  const score = (Object.keys(weights) as (keyof WeaknessParts)[]).reduce(
    (sum, k) => sum + weights[k] * parts[k],
    0,
  )
  return { ...c, score, parts, reason: reasonFor(c, parts, now) }
}
