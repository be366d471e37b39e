// The statistics queue: every stored answer reaches every rollup and review card exactly once, also
// with concurrent batches from one learner, resent batches, and a drain that fails half-way.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startTestApi, type TestApi } from '../helpers/api'
import { attemptBody, practiser, type Answer, type Practiser } from '../helpers/practice'
import { recomputed, rolledUp } from '../helpers/statistics-check'
import { randomUUID } from 'node:crypto'
import { applyAnswers } from '../../server/focus/focus-service'
import { latestCellAnswers, loadCards, usualMs } from '../../server/focus/focus-repository'
import { NO_INSTRUMENT } from '../../server/progress/progress-repository'

let api: TestApi
beforeAll(async () => {
  api = await startTestApi()
})
afterAll(() => api.close())

const BATCHES = 8
const PER_BATCH = 100

/** 8 sessions of 100 answers over 20 places of strings 0–3, frets 0–4, every 7th a miss. */
function batchesOf(p: Practiser) {
  const start = Date.now() - 3_600_000
  return Array.from({ length: BATCHES }, (_, b) => {
    const sessionId = randomUUID()
    return Array.from({ length: PER_BATCH }, (_, i) => {
      const answer: Answer = {
        string: i % 4,
        fret: (i >> 2) % 5,
        correct: i % 7 !== 0,
        ms: 800 + ((i * 37) % 900),
        at: new Date(start + (b * PER_BATCH + i) * 1000).toISOString(),
      }
      return attemptBody(p, sessionId, answer)
    })
  })
}

const sendAll = (p: Practiser, batches: ReturnType<typeof batchesOf>) =>
  Promise.all(
    batches.map((attempts) => p.agent.post('/api/attempts').send({ attempts, timeZone: 'UTC' })),
  )

const sum = (rows: { attempts?: number; reps?: number }[], field: 'attempts' | 'reps') =>
  rows.reduce((total, r) => total + (r[field] ?? 0), 0)

describe('concurrent batches from one learner', () => {
  it('when 8 batches of 100 arrive at once, then all 800 reach the statistics and the cards; resent, nothing counts twice', async () => {
    const p = await practiser(api.app)
    const batches = batchesOf(p)

    const first = await sendAll(p, batches)
    expect(first.map((r) => [r.status, r.body.stored])).toEqual(Array(BATCHES).fill([201, 100]))
    expect(await api.ctx.statistics.settle([p.user.id])).toBe(0)

    const figures = await rolledUp(api.ctx.db, p.user.id)
    expect(sum(figures.places, 'attempts')).toBe(800)
    expect(sum(figures.days, 'attempts')).toBe(800)
    expect(sum(figures.sessions, 'attempts')).toBe(800)
    expect(sum(figures.cards, 'reps')).toBe(800)
    expect(figures).toEqual(await recomputed(api.ctx.db, p.user.id))

    const again = await sendAll(p, batches)
    expect(again.map((r) => [r.status, r.body.duplicates])).toEqual(Array(BATCHES).fill([200, 100]))
    expect(await api.ctx.statistics.settle([p.user.id])).toBe(0)
    expect(await rolledUp(api.ctx.db, p.user.id)).toEqual(figures)
  })

  it('when answers are stored, then they wait in the queue until a reader or the drain rolls them up', async () => {
    const p = await practiser(api.app)
    const [batch] = batchesOf(p)
    await p.agent.post('/api/attempts').send({ attempts: batch }).expect(201)
    expect(await api.ctx.db('rollup_queue').where({ user_id: p.user.id })).toHaveLength(100)
    expect(sum((await rolledUp(api.ctx.db, p.user.id)).places, 'attempts')).toBe(0)

    const summary = await p.agent.get('/api/progress/summary').expect(200)

    expect(summary.body.pending).toBe(0)
    expect(summary.body.totals.attempts).toBe(100)
    expect(await api.ctx.db('rollup_queue').where({ user_id: p.user.id })).toHaveLength(0)
  })
})

describe('a drain that fails half-way', () => {
  it('when the card step fails after the rollup, then nothing is counted and the answers stay queued; the next drain counts them once', async () => {
    const p = await practiser(api.app)
    const [batch] = batchesOf(p)
    await p.agent.post('/api/attempts').send({ attempts: batch }).expect(201)
    // A fault in the last step of the drain's transaction, for this player's cards only.
    const fault = `focus_fault_${p.user.id.replaceAll('-', '')}`
    await api.ctx.db.raw(`create function ${fault}() returns trigger language plpgsql as $$
      begin raise exception 'card store unavailable'; end $$`)
    await api.ctx.db.raw(`create trigger ${fault} before insert on focus_cards for each row
      when (new.user_id = '${p.user.id}') execute function ${fault}()`)
    try {
      expect(await api.ctx.statistics.settle([p.user.id])).toBe(100)
      expect(sum((await rolledUp(api.ctx.db, p.user.id)).places, 'attempts')).toBe(0)
    } finally {
      await api.ctx.db.raw(`drop trigger ${fault} on focus_cards`)
      await api.ctx.db.raw(`drop function ${fault}()`)
    }

    expect(await api.ctx.statistics.settle([p.user.id])).toBe(0)
    const figures = await rolledUp(api.ctx.db, p.user.id)
    expect(sum(figures.places, 'attempts')).toBe(100)
    expect(sum(figures.cards, 'reps')).toBe(100)
    expect(figures).toEqual(await recomputed(api.ctx.db, p.user.id))
  })
})

describe('one drain for several players and instruments', () => {
  it('when two players answer on an instrument and without one, then one drain moves each card as if that player and instrument were drained alone', async () => {
    const players = [await practiser(api.app), await practiser(api.app)]
    for (const p of players) {
      const [first, second] = batchesOf(p)
      const noInstrument = second!.map((a) => ({ ...a, instrumentId: null }))
      await p.agent.post('/api/attempts').send({ attempts: first }).expect(201)
      await p.agent.post('/api/attempts').send({ attempts: noInstrument }).expect(201)
    }
    const ids = players.map((p) => p.user.id)
    expect(await api.ctx.db('rollup_queue').whereIn('user_id', ids)).toHaveLength(400)

    expect(await api.ctx.statistics.settle(ids)).toBe(0) // 400 answers: one drain

    for (const p of players) {
      for (const key of [p.instrumentId, NO_INSTRUMENT]) {
        const answers = await latestCellAnswers(api.ctx.db, p.user.id, key, 1000)
        const alone = key === NO_INSTRUMENT ? await answersWithout(p.user.id) : answers
        const expected = applyAnswers(new Map(), alone, await usualMs(api.ctx.db, p.user.id, key))
        const stored = await loadCards(api.ctx.db, p.user.id, key)
        expect(stored.size).toBe(expected.length)
        for (const { string, fret, card } of expected)
          expect(stored.get(`${string}:${fret}`)).toEqual(card)
      }
    }
  })
})

/** A player's placed answers stored without an instrument, oldest first. */
async function answersWithout(userId: string) {
  const rows = await api.ctx
    .db('attempts')
    .where({ user_id: userId })
    .whereNull('instrument_id')
    .whereNotNull('string')
    .orderBy('created_at')
    .select('string', 'fret', 'correct', 'response_ms', 'created_at')
  return rows.map((r) => ({
    string: r.string,
    fret: r.fret,
    correct: r.correct,
    responseMs: r.response_ms,
    at: r.created_at,
  }))
}
