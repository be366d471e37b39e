// The simulated learner of the focus benchmark: a forgetting-curve model of how a student comes to
// recall each fretboard place. Documented in DEVELOPERS.md ("Focus benchmark"):
//
//   recall probability   p(t) = g + (1 − g) · 2^(−(t − t_last) / h)
//     g = 1/12, a lucky guess among the 12 pitch classes; h = the place's memory half-life (days);
//     t_last = the last time the place was practised (an answer with feedback).
//   after a right answer h ← h · (1 + (G − 1) · s), after a wrong one h ← max(f, h / 2) where the
//     relearning floor f starts at h0 and grows by 20 % with every miss (relearning gets easier each
//     time: Ebbinghaus's "savings");
//     G = growth per successful review (2.5 for most places, 1.5 for the few weak ones);
//     h0 = 1 day for most places, 0.25 day for the weak ones; h never exceeds 10 years;
//     s = 0.3 + 0.7 · min(1, (1 − m) / 0.5) with m = 2^(−Δt / h) the memory left before the answer:
//     reviewing what is still fresh teaches less (the spacing effect), reviewing when half is gone
//     teaches fully.
//   a place never practised recalls at chance (p = g); its first answer with feedback sets h = h0.
//   right answers take 900 + 2600 · (1 − m) ms (log-normal noise, σ 0.25); wrong ones 2500–4000 ms.
// The form follows the exponential forgetting curve (Ebbinghaus 1885) with half-life growth per
// review as in half-life regression (Settles & Meeder 2016); the constants are ours.
import type { Random } from '../../src/theory'

export const GUESS = 1 / 12
const DAY_MS = 24 * 3600 * 1000

export interface Place {
  string: number
  fret: number
  pitch: number
  weak: boolean
  /** Memory half-life in days; 0 = never practised. */
  halfLife: number
  /** Half-life a miss falls back to (grows with each relearning). */
  floor: number
  lastPractised: number
}

export interface LearnerParams {
  h0: number
  growth: number
  weakH0: number
  weakGrowth: number
}

export const LEARNER: LearnerParams = { h0: 1, growth: 2.5, weakH0: 0.25, weakGrowth: 1.5 }
const MAX_HALF_LIFE = 3650
const SAVINGS = 1.2

/** Memory left (0..1) at time `now` (ms), without the guessing floor. */
export function memory(place: Place, now: number): number {
  if (place.halfLife === 0) return 0
  return 2 ** (-(now - place.lastPractised) / DAY_MS / place.halfLife)
}

export const recallProbability = (place: Place, now: number) =>
  GUESS + (1 - GUESS) * memory(place, now)

/** A board of places (frets 0..frets−1 on each string), `weakCount` of them much weaker. */
export function makeBoard(
  tuning: number[],
  frets: number,
  weakCount: number,
  random: Random,
): Place[] {
  const places: Place[] = tuning.flatMap((open, string) =>
    Array.from({ length: frets }, (_, fret) => ({
      string,
      fret,
      pitch: open + fret,
      weak: false,
      halfLife: 0,
      floor: 0,
      lastPractised: 0,
    })),
  )
  for (let marked = 0; marked < weakCount;) {
    const place = places[Math.floor(random() * places.length)]!
    if (!place.weak) {
      place.weak = true
      marked++
    }
  }
  return places
}

function gaussian(random: Random) {
  return Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random())
}

/** The learner answers a question about a place at `now`; the place's memory is updated. */
export function answer(place: Place, now: number, random: Random, params = LEARNER) {
  const m = memory(place, now)
  const correct = random() < GUESS + (1 - GUESS) * m
  const responseMs = correct
    ? Math.round((900 + 2600 * (1 - m)) * Math.exp(0.25 * gaussian(random)))
    : Math.round(2500 + 1500 * random())
  const growth = place.weak ? params.weakGrowth : params.growth
  if (place.halfLife === 0) {
    place.halfLife = place.floor = place.weak ? params.weakH0 : params.h0
  } else if (correct) {
    const spacing = 0.3 + 0.7 * Math.min(1, (1 - m) / 0.5)
    place.halfLife = Math.min(MAX_HALF_LIFE, place.halfLife * (1 + (growth - 1) * spacing))
  } else {
    place.floor *= SAVINGS
    place.halfLife = Math.max(place.floor, place.halfLife / 2)
  }
  place.lastPractised = now
  return { correct, responseMs }
}
