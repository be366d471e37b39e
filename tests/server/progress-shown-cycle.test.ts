// Issue 13 on the server: "show me" stored as shown and counted apart in the statistics, and where
// the last Window Cycle session stopped (GET /api/progress/cycle-position), from hand-built answers.
import { randomUUID } from 'node:crypto'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startTestApi, type TestApi } from '../helpers/api'
import { at, attemptBody, practise, practiser } from '../helpers/practice'

let api: TestApi
beforeAll(async () => {
  api = await startTestApi()
})
afterAll(() => api.close())

const DAY = '2026-03-02'

describe('"show me" is stored as shown', () => {
  it('when a student asks to be shown an answer, then it counts apart: not an answer, not a miss', async () => {
    const p = await practiser(api.app)
    // string 1 fret 3 (C2): right 1200 ms, wrong 2000 ms, then shown; string 0 fret 8: shown only
    await practise(p, [
      { string: 1, fret: 3, correct: true, ms: 1200, at: at(DAY, '10:00:00') },
      { string: 1, fret: 3, correct: false, ms: 2000, at: at(DAY, '10:00:10') },
      { string: 1, fret: 3, correct: false, ms: 4000, at: at(DAY, '10:00:20'), outcome: 'shown' },
      { string: 0, fret: 8, correct: false, ms: 3000, at: at(DAY, '10:00:30'), outcome: 'shown' },
    ])

    const positions = await p.agent.get('/api/progress/positions')
    const place = (s: number, f: number) =>
      positions.body.positions.find(
        (x: { string: number; fret: number }) => x.string === s && x.fret === f,
      )
    // 2 answers, 1 right → accuracy 1/2 (the shown one left out); 1 shown
    expect(place(1, 3)).toMatchObject({ attempts: 2, correct: 1, accuracy: 0.5, shown: 1 })
    expect(place(0, 8)).toMatchObject({ attempts: 0, correct: 0, accuracy: null, shown: 1 })

    const summary = await p.agent.get(`/api/progress/summary?from=${DAY}&to=${DAY}`)
    expect(summary.body.totals).toMatchObject({ attempts: 2, correct: 1, accuracy: 0.5, shown: 2 })
    const stored = await api.ctx.db('attempts').where({ user_id: p.user.id, outcome: 'shown' })
    expect(stored).toHaveLength(2)
  })

  it('when a shown answer claims to be right, then 400 names the field', async () => {
    const p = await practiser(api.app)
    const body = attemptBody(p, randomUUID(), {
      string: 1,
      fret: 3,
      correct: true,
      ms: 900,
      at: at(DAY, '10:00:00'),
      outcome: 'shown',
    })
    const res = await p.agent.post('/api/attempts').send({ attempts: [body] })
    expect(res.status).toBe(400)
    expect(res.body.error.fields['attempts.0.correct']![0]).toMatch(/shown answer is not a right/)
  })
})

const cycleNote = (
  key: string,
  noteIndex: number,
  phase: string,
  time: string,
  scale = 'major',
) => ({
  string: null,
  fret: null,
  correct: true,
  ms: 800,
  at: at(DAY, time),
  drill: 'cycle',
  pitch: 41,
  detail: { key, scale, degree: 1, displaced: false, noteIndex, phase },
})

describe('GET /api/progress/cycle-position', () => {
  it('when Window Cycle sessions were played, then the last note of that scale is where to continue', async () => {
    const p = await practiser(api.app)
    await practise(p, [cycleNote('C', 6, 'up', '10:00:00'), cycleNote('C', 7, 'up', '10:00:05')])
    await practise(p, [cycleNote('F', 2, 'down', '11:00:00')])
    await practise(p, [cycleNote('Bb', 4, 'up', '12:00:00', 'dorian')])
    // an attempt from before positions were stored has no noteIndex: skipped
    await practise(p, [
      {
        ...cycleNote('Eb', 0, 'up', '13:00:00'),
        detail: { key: 'Eb', scale: 'major', degree: 1, displaced: false },
      },
    ])

    const major = await p.agent.get('/api/progress/cycle-position?scale=major')
    expect(major.status).toBe(200)
    expect(major.body.stop).toEqual({
      key: 'F',
      noteIndex: 2,
      phase: 'down',
      at: at(DAY, '11:00:00'),
    })
    const dorian = await p.agent.get('/api/progress/cycle-position?scale=dorian')
    expect(dorian.body.stop).toMatchObject({ key: 'Bb', noteIndex: 4, phase: 'up' })
    const otherItem = await p.agent.get(
      `/api/progress/cycle-position?scale=major&planItem=${randomUUID()}`,
    )
    expect(otherItem.body.stop).toBeNull()
  })

  it('when nothing was played, then there is no stop; a bad scale is a 400, no session a 401', async () => {
    const p = await practiser(api.app)
    expect((await p.agent.get('/api/progress/cycle-position?scale=minor')).body).toEqual({
      stop: null,
    })
    const bad = await p.agent.get('/api/progress/cycle-position?scale=nonsense')
    expect(bad.status).toBe(400)
    expect(bad.body.error.fields['query.scale']).toBeDefined()
    expect(
      (await request(api.bareApp).get('/api/progress/cycle-position?scale=major')).status,
    ).toBe(401)
  })

  it("when a student asks for another student's cycle, then 403", async () => {
    const p = await practiser(api.app)
    const other = await practiser(api.app)
    const res = await p.agent.get(
      `/api/progress/cycle-position?scale=major&student=${other.user.id}`,
    )
    expect(res.status).toBe(403)
  })
})
