// The focus selector: which places to ask next. Weak places are drawn far more often than strong
// ones (weighted sampling, weight e^(score / temperature)), yet every place keeps a chance, and
// forgetting and the little-practice bonus grow until a neglected place comes up. Pure: no I/O;
// time and randomness come from the caller, so the learner simulation runs exactly this code.
import type { Random } from '../../src/theory'
import { scoreCandidate, usualResponseMs } from './focus-score'
import type { FocusCandidate, FocusPick, ScoredCandidate, WeaknessParts } from './focus-types'

/**
 * Lower = greedier. At 0.04 a place scoring 0.1 higher is drawn about 12 times as often; chosen with
 * the learner simulation (npm run bench:focus), where 0.1 needed about 15 % more questions.
 */
export const FOCUS_TEMPERATURE = 0.04

export interface SelectOptions {
  /** How many questions to return (places repeat only after every place was drawn once). */
  n: number
  now: Date
  random: Random
  temperature?: number
  /** Weights of the weakness parts (WEIGHTS by default). */
  weights?: WeaknessParts
}

/** Scores every candidate against the player's own usual response time. */
export function scoreAll(
  candidates: readonly FocusCandidate[],
  now: Date,
  weights?: WeaknessParts,
): ScoredCandidate[] {
  const usualMs = usualResponseMs(candidates)
  return candidates.map((c) => scoreCandidate(c, usualMs, now, weights))
}

// Draws one index with probability proportional to its weight.
function drawIndex(weights: readonly number[], random: Random): number {
  const total = weights.reduce((sum, w) => sum + w, 0)
  let target = random() * total
  for (let i = 0; i < weights.length; i++) {
    target -= weights[i] ?? 0
    if (target < 0) return i
  }
  return weights.length - 1
}

const toPick = (c: ScoredCandidate): FocusPick => ({
  string: c.string,
  fret: c.fret,
  pitch: c.pitch,
  score: Math.round(c.score * 1000) / 1000,
  due: c.card?.due ?? null,
  reason: c.reason,
})

/**
 * Picks `n` questions from the candidates: weighted draws without replacement; when every place
 * has been drawn, a new round starts (never the same place twice in a row).
 */
export function selectFocus(
  candidates: readonly FocusCandidate[],
  options: SelectOptions,
): FocusPick[] {
  const scored = scoreAll(candidates, options.now, options.weights)
  const temperature = options.temperature ?? FOCUS_TEMPERATURE
  // Relative to the top score, so low temperatures cannot overflow to Infinity.
  const top = Math.max(...scored.map((c) => c.score))
  const weightOf = (c: ScoredCandidate) => Math.exp((c.score - top) / temperature)
  const picks: FocusPick[] = []
  let pool: ScoredCandidate[] = []
  while (picks.length < options.n && scored.length) {
    if (!pool.length)
      pool = scored.filter((c) => scored.length === 1 || !samePlace(c, picks.at(-1)))
    const index = drawIndex(pool.map(weightOf), options.random)
    const [chosen] = pool.splice(index, 1)
    if (chosen) picks.push(toPick(chosen))
  }
  return picks
}

const samePlace = (c: ScoredCandidate, pick: FocusPick | undefined) =>
  pick !== undefined && c.string === pick.string && c.fret === pick.fret
