// GET /api/focus: the next questions for a drill, weakest places first, each with its reason; cards
// kept current as attempts arrive.
import { randomUUID } from 'node:crypto'
import type { Express } from 'express'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startTestApi, type TestApi } from '../helpers/api'
import { practise, practiser, type Practiser } from '../helpers/practice'

let api: TestApi
let app: Express
beforeAll(async () => {
  api = await startTestApi()
  app = api.app
})
afterAll(() => api.close())

const focus = (p: Practiser, query: string) => p.agent.get(`/api/focus?${query}`)
type Item = {
  string: number
  fret: number
  pitch: number
  score: number
  due: string | null
  reason: string
}
const minutesAgo = (m: number) => new Date(Date.now() - m * 60_000).toISOString()

/** Every place of strings 0–1, frets 0–4 answered right twice; string 1 fret 3 missed three times. */
async function practisedWithWeakSpot() {
  const p = await practiser(app)
  const answers = []
  let minute = 600
  for (const round of [0, 1]) {
    for (let string = 0; string <= 1; string++) {
      for (let fret = 0; fret <= 4; fret++)
        answers.push({
          string,
          fret,
          correct: true,
          ms: 900 + round * 50,
          at: minutesAgo(minute--),
        })
    }
  }
  for (let i = 0; i < 3; i++)
    answers.push({ string: 1, fret: 3, correct: false, ms: 3000, at: minutesAgo(minute--) })
  await practise(p, answers, { batchSize: 20 })
  return p
}

describe('choosing questions', () => {
  it('when a new student asks, then every item is on the neck, unpractised, and says so', async () => {
    const p = await practiser(app)

    const res = await focus(p, 'drill=hunt&n=10')

    expect(res.status).toBe(200)
    expect(res.body.instrumentId).toBe(p.instrumentId)
    expect(res.body.items).toHaveLength(10)
    for (const item of res.body.items as Item[]) {
      expect(item.reason).toBe('not practised yet')
      expect(item.due).toBeNull()
      expect(item.pitch).toBe(p.tuning[item.string]! + item.fret) // note at (s, f) = open[s] + f
    }
  })

  it('when one place was missed three times, then it comes first in most seeded draws and says why', async () => {
    const p = await practisedWithWeakSpot()
    const region = 'lowString=0&highString=1&lowFret=0&highFret=4'
    let firsts = 0
    let reason = ''
    for (let seed = 1; seed <= 20; seed++) {
      const res = await focus(p, `drill=recall&n=3&${region}&seed=${seed}`)
      const top = res.body.items[0] as Item
      if (top.string === 1 && top.fret === 3) {
        firsts++
        reason = top.reason
      }
    }
    // Uniform choice would put it first 1 time in 10.
    expect(firsts).toBeGreaterThanOrEqual(18)
    expect(reason).toBe('missed 3 times this week')
  })

  it('when a region is given, then every item lies inside it, each place once before any repeats', async () => {
    const p = await practiser(app)

    const res = await focus(
      p,
      'drill=recall&n=12&lowString=1&highString=2&lowFret=3&highFret=5&seed=4',
    )

    const items = res.body.items as Item[]
    expect(items).toHaveLength(12)
    expect(items.every((i) => i.string >= 1 && i.string <= 2 && i.fret >= 3 && i.fret <= 5)).toBe(
      true,
    )
    expect(new Set(items.slice(0, 6).map((i) => `${i.string}:${i.fret}`)).size).toBe(6)
  })

  it('when the same seed is used twice, then the same questions come back', async () => {
    const p = await practisedWithWeakSpot()
    const a = await focus(p, 'drill=hunt&n=8&seed=77')
    const b = await focus(p, 'drill=hunt&n=8&seed=77')
    expect(a.body.items).toEqual(b.body.items)
  })

  it('when Range Runs asks, then keys of the scale and hand regions come ranked by weak places', async () => {
    const p = await practisedWithWeakSpot()

    const res = await focus(p, 'drill=runs&n=5&scale=minor')

    expect(res.status).toBe(200)
    expect(res.body.keys).toHaveLength(12)
    expect(res.body.keys[0]).toMatchObject({ scale: 'minor' })
    expect(typeof res.body.keys[0].reason).toBe('string')
    const scores = res.body.keys.map((k: { score: number }) => k.score)
    expect(scores).toEqual([...scores].sort((a: number, b: number) => b - a))
    expect(res.body.regions.length).toBeGreaterThan(0)
    expect(res.body.regions[0].highFret - res.body.regions[0].lowFret).toBe(4)
  })

  it('when Neck Recall asks, then no keys are returned', async () => {
    const p = await practiser(app)
    const res = await focus(p, 'drill=recall&n=2')
    expect(res.body.keys).toBeUndefined()
  })
})

describe('spaced-review cards', () => {
  it('when attempts arrive, then each place gets a card; a miss is remembered for "missed … this week"', async () => {
    const p = await practiser(app)
    await practise(p, [
      { string: 0, fret: 2, correct: true, ms: 900, at: minutesAgo(3) },
      { string: 0, fret: 2, correct: false, ms: 3000, at: minutesAgo(2) },
      { string: 1, fret: 4, correct: true, ms: 900, at: minutesAgo(1) },
      { string: null, fret: null, correct: true, ms: 900, at: minutesAgo(1), pitch: 40 },
    ])
    expect(await api.ctx.statistics.settle([p.user.id])).toBe(0) // the drain moves the cards

    const cards = await api.ctx
      .db('focus_cards')
      .where({ user_id: p.user.id })
      .orderBy(['string', 'fret'])

    expect(cards.map((c) => [c.string, c.fret, c.reps])).toEqual([
      [0, 2, 2],
      [1, 4, 1],
    ])
    expect(cards[0].recent_misses).toHaveLength(1)
    expect(cards[0].lapses + cards[0].state).toBeGreaterThan(0) // a miss sends it back to (re)learning
  })

  it('when history was stored without cards (seeded), then the first focus request builds them', async () => {
    const p = await practiser(app)
    const sessionId = randomUUID()
    await api.ctx.db('attempts').insert(
      [0, 1, 2].map((fret) => ({
        id: randomUUID(),
        user_id: p.user.id,
        instrument_id: p.instrumentId,
        tuning: p.tuning,
        drill: 'recall',
        session_id: sessionId,
        string: 0,
        fret,
        expected_pitch: p.tuning[0]! + fret,
        answer: 'x',
        correct: fret !== 1,
        response_ms: 1000,
        created_at: new Date(Date.now() - 3_600_000),
      })),
    )
    expect(await api.ctx.db('focus_cards').where({ user_id: p.user.id })).toHaveLength(0)

    const res = await focus(
      p,
      'drill=recall&n=3&lowString=0&highString=0&lowFret=0&highFret=2&seed=1',
    )

    expect(res.status).toBe(200)
    expect(await api.ctx.db('focus_cards').where({ user_id: p.user.id })).toHaveLength(3)
    expect((res.body.items as Item[]).find((i) => i.fret === 1)!.reason).toBe(
      'missed once this week',
    )
  })
})

describe('bad requests', () => {
  it.each([
    ['n=5', 'query.drill'],
    ['drill=scales', 'query.drill'],
    ['drill=hunt&n=0', 'query.n'],
    ['drill=hunt&n=101', 'query.n'],
    ['drill=hunt&n=many', 'query.n'],
    ['drill=hunt&lowFret=5&highFret=2', 'query.highFret'],
    ['drill=hunt&lowString=3&highString=1', 'query.highString'],
    ['drill=hunt&highFret=31', 'query.highFret'],
    ['drill=runs&scale=klingon', 'query.scale'],
    ['drill=hunt&instrument=mine', 'query.instrument'],
    ['drill=hunt&student=x', 'query'],
  ])('when the query is %s, then 400 names %s', async (query, field) => {
    const p = await practiser(app)
    const res = await focus(p, query)
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields)).toContain(field)
  })

  it('when the region lies beyond the instrument, then 400 says how many strings and frets it has', async () => {
    const p = await practiser(app)
    const res = await focus(p, 'drill=hunt&highString=5&highFret=30')
    expect(res.status).toBe(400)
    expect(res.body.error.fields['query.highString'][0]).toContain('4 strings')
    expect(res.body.error.fields['query.highFret']).toBeDefined()
  })

  it("when the instrument is someone else's, then 400 names it", async () => {
    const p = await practiser(app)
    const other = await practiser(app)
    const res = await focus(p, `drill=hunt&instrument=${other.instrumentId}`)
    expect(res.status).toBe(400)
    expect(res.body.error.fields['query.instrument']).toEqual([
      'This is not one of your instruments.',
    ])
  })

  it('when nobody is signed in, then 401', async () => {
    expect((await request(app).get('/api/focus?drill=hunt')).status).toBe(401)
  })
})
