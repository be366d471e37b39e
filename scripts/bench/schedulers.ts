// The three question strategies the focus benchmark compares, all behind one interface: the
// production focus selector, uniform random, and a Leitner-box scheduler.
import { createRandom, type Random } from '../../src/theory'
import { reviewCard } from '../../server/focus/focus-cards'
import { usualResponseMs } from '../../server/focus/focus-score'
import { selectFocus, type SelectOptions } from '../../server/focus/focus-selector'
import type { FocusCandidate } from '../../server/focus/focus-types'
import type { Place } from './learner-model'

const RECENT = 50 // as the statistics rollup keeps

export interface Scheduler {
  /** The places to ask in the next session. */
  next(n: number, now: number): number[]
  /** Told after each session, like the server after a batch of attempts. */
  record(answers: { index: number; correct: boolean; responseMs: number; at: number }[]): void
}

/** The production selector over the same state the server keeps (rollup windows and FSRS cards). */
export function adaptive(
  places: Place[],
  seed: number,
  options: Partial<SelectOptions> = {},
): Scheduler {
  const random = createRandom(seed)
  const candidates: FocusCandidate[] = places.map((p) => ({
    string: p.string,
    fret: p.fret,
    pitch: p.pitch,
    attempts: 0,
    recentCorrect: [],
    recentMs: [],
    lastSeenAt: null,
    card: null,
  }))
  const indexOf = new Map(candidates.map((c, i) => [`${c.string}:${c.fret}`, i]))
  return {
    next: (n, now) =>
      selectFocus(candidates, { ...options, n, now: new Date(now), random }).map((p) =>
        indexOf.get(`${p.string}:${p.fret}`)!,
      ),
    record(answers) {
      for (const a of answers) {
        const c = candidates[a.index]!
        c.attempts++
        c.recentCorrect = [...c.recentCorrect, a.correct].slice(-RECENT)
        if (a.correct) c.recentMs = [...c.recentMs, a.responseMs].slice(-RECENT)
        c.lastSeenAt = new Date(a.at)
      }
      const usual = usualResponseMs(candidates) // once per batch, as the server does
      for (const a of answers) {
        const c = candidates[a.index]!
        c.card = reviewCard(
          c.card,
          { correct: a.correct, responseMs: a.responseMs, at: new Date(a.at) },
          usual,
        )
      }
    },
  }
}

/** Every question a place drawn uniformly at random. */
export function uniform(places: Place[], seed: number): Scheduler {
  const random: Random = createRandom(seed)
  return {
    next: (n) => Array.from({ length: n }, () => Math.floor(random() * places.length)),
    record: () => undefined,
  }
}

/**
 * Leitner boxes 1–5: box k is reviewed every 2^(k−1) sessions; right → next box, wrong → box 1.
 * A session asks the due places (lowest box first), then new places, then the least recently
 * asked of the lowest boxes, so every session has n questions like the others.
 */
export function leitner(places: Place[]): Scheduler {
  const box = places.map(() => 0) // 0 = not introduced yet
  const lastAsked = places.map(() => -1)
  let session = 0
  return {
    next(n) {
      const order = places.map((_, i) => i)
      const due = order
        .filter((i) => box[i]! > 0 && session % 2 ** (box[i]! - 1) === 0)
        .sort((a, b) => box[a]! - box[b]!)
      const fresh = order.filter((i) => box[i] === 0)
      const rest = order
        .filter((i) => box[i]! > 0 && !due.includes(i))
        .sort((a, b) => box[a]! - box[b]! || lastAsked[a]! - lastAsked[b]!)
      const picks = [...due, ...fresh, ...rest].slice(0, n)
      for (const i of picks) lastAsked[i] = session
      session++
      return picks
    },
    record(answers) {
      for (const a of answers)
        box[a.index] = a.correct ? Math.min(5, Math.max(1, box[a.index]!) + 1) : 1
    },
  }
}
