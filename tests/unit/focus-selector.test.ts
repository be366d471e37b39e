// The focus selector (pure): prefers weak places, never starves any place, draws in rounds.
import { describe, expect, it } from 'vitest'
import { createRandom } from '../../src/theory'
import { reviewCard } from '../../server/focus/focus-cards'
import { selectFocus } from '../../server/focus/focus-selector'
import type { FocusCandidate } from '../../server/focus/focus-types'

const DAY = 24 * 3600 * 1000
const NOW = new Date('2026-03-10T18:00:00Z')
const BASS = [28, 33, 38, 43]

function blank(string: number, fret: number): FocusCandidate {
  return {
    string,
    fret,
    pitch: (BASS[string] ?? 0) + fret,
    attempts: 0,
    recentCorrect: [],
    recentMs: [],
    lastSeenAt: null,
    card: null,
  }
}

/** Applies answers to a candidate as the server does (rollup window and card). */
function answered(
  c: FocusCandidate,
  answers: { correct: boolean; ms: number; at: Date }[],
  usualMs = 1000,
): FocusCandidate {
  let next = { ...c }
  for (const a of answers) {
    next = {
      ...next,
      attempts: next.attempts + 1,
      recentCorrect: [...next.recentCorrect, a.correct].slice(-50),
      recentMs: a.correct ? [...next.recentMs, a.ms].slice(-50) : next.recentMs,
      lastSeenAt: a.at,
      card: reviewCard(next.card, { correct: a.correct, responseMs: a.ms, at: a.at }, usualMs),
    }
  }
  return next
}

/** A 4 × 13 board practised daily for ten days, every answer right in about a second… */
function practisedBoard(): FocusCandidate[] {
  const board: FocusCandidate[] = []
  for (let string = 0; string < 4; string++) {
    for (let fret = 0; fret <= 12; fret++) {
      const days = Array.from({ length: 10 }, (_, d) => ({
        correct: true,
        ms: 950 + ((string * 13 + fret) % 7) * 20,
        at: new Date(NOW.getTime() - (10 - d) * DAY),
      }))
      board.push(answered(blank(string, fret), days))
    }
  }
  return board
}

/** …except the planted weak place, string 1 fret 5, missed on three of its last four days. */
function withPlantedWeakPlace(board: FocusCandidate[]) {
  const index = board.findIndex((c) => c.string === 1 && c.fret === 5)
  const misses = [3, 2, 1].map((d) => ({
    correct: false,
    ms: 3000,
    at: new Date(NOW.getTime() - d * DAY),
  }))
  board[index] = answered(board[index]!, [
    ...misses,
    { correct: true, ms: 2400, at: new Date(NOW.getTime() - 0.5 * DAY) },
  ])
  return board
}

describe('selectFocus', () => {
  it('prefers a planted weak place: over 200 seeded draws of 5 it is almost always chosen, others rarely', () => {
    const board = withPlantedWeakPlace(practisedBoard())
    const chosen = new Map<string, number>()
    for (let seed = 1; seed <= 200; seed++) {
      for (const p of selectFocus(board, { n: 5, now: NOW, random: createRandom(seed) })) {
        chosen.set(`${p.string}:${p.fret}`, (chosen.get(`${p.string}:${p.fret}`) ?? 0) + 1)
      }
    }
    const weakRate = (chosen.get('1:5') ?? 0) / 200
    const otherRates = [...chosen.entries()].filter(([k]) => k !== '1:5').map(([, n]) => n / 200)
    // Uniform choice would pick any one place in 5/52 ≈ 10 % of the draws.
    expect(weakRate).toBeGreaterThanOrEqual(0.95)
    expect(Math.max(...otherRates)).toBeLessThan(0.5)
  })

  it('gives the weak place the highest score and says why', () => {
    const board = withPlantedWeakPlace(practisedBoard())
    const [first] = selectFocus(board, {
      n: 52,
      now: NOW,
      random: createRandom(3),
      temperature: 1e-6,
    })
    expect(first).toMatchObject({ string: 1, fret: 5, reason: 'missed 3 times this week' })
  })

  it('never starves a place: over 300 sessions every place is asked, none waits more than 100 sessions', () => {
    let board = Array.from({ length: 52 }, (_, i) => blank(Math.floor(i / 13), i % 13))
    const random = createRandom(11)
    const lastAsked = new Map<string, number>()
    let longestWait = 0
    let now = Date.parse('2026-01-01T09:00:00Z')
    for (let session = 0; session < 300; session++) {
      for (const pick of selectFocus(board, { n: 10, now: new Date(now), random })) {
        const key = `${pick.string}:${pick.fret}`
        longestWait = Math.max(longestWait, session - (lastAsked.get(key) ?? -1))
        lastAsked.set(key, session)
        // Place 1:5 is always missed; every other place is always right.
        const correct = key !== '1:5'
        board = board.map((c) =>
          c.string === pick.string && c.fret === pick.fret
            ? answered(c, [{ correct, ms: correct ? 1000 : 3000, at: new Date(now) }])
            : c,
        )
        now += 8000
      }
      now += 6 * 3600 * 1000
    }
    for (const session of lastAsked.values()) longestWait = Math.max(longestWait, 300 - session)
    expect(lastAsked.size).toBe(52)
    expect(longestWait).toBeLessThanOrEqual(100)
  })

  it('draws every place once before repeating any, and never the same place twice in a row', () => {
    const region = [blank(0, 1), blank(0, 2), blank(1, 1), blank(1, 2)]
    const picks = selectFocus(region, { n: 10, now: NOW, random: createRandom(5) })
    const keys = picks.map((p) => `${p.string}:${p.fret}`)
    expect(new Set(keys.slice(0, 4)).size).toBe(4)
    expect(new Set(keys.slice(4, 8)).size).toBe(4)
    expect(keys.every((k, i) => i === 0 || k !== keys[i - 1])).toBe(true)
  })

  it('is reproducible: the same seed gives the same questions', () => {
    const board = practisedBoard()
    const draw = () => selectFocus(board, { n: 12, now: NOW, random: createRandom(42) })
    expect(draw()).toEqual(draw())
  })

  it('asks unpractised places first on a half-practised board, saying so', () => {
    const board = practisedBoard().map((c) => (c.string === 3 ? blank(3, c.fret) : c))
    const picks = selectFocus(board, { n: 13, now: NOW, random: createRandom(9) })
    expect(picks.every((p) => p.string === 3 && p.reason === 'not practised yet')).toBe(true)
  })

  it('returns nothing for an empty region', () => {
    expect(selectFocus([], { n: 5, now: NOW, random: createRandom(1) })).toEqual([])
  })
})
