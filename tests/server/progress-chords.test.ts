// Chord Tones statistics: attempts of the sixth drill are stored, rolled up per chord type and
// degree by the live SQL trigger, and read back from GET /api/progress/chords (figures by hand).
import type { Express } from 'express'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startTestApi, type TestApi } from '../helpers/api'
import { at, attemptBody, practise, practiser, type Practiser } from '../helpers/practice'

let api: TestApi
let app: Express
let lena: Practiser

const DAY = '2026-03-02'
// A ii–V–I in C, frets 2–6 of a 4-string bass: Dm7 from D2 (string 2 fret 0 is D2; fret 3 F2 …).
const tone = (chord: string, chordType: string, degree: string, correct: boolean, ms: number) => ({
  string: 2,
  fret: 3,
  correct,
  ms,
  at: at(DAY, `10:00:${String(ms % 60).padStart(2, '0')}`),
  drill: 'chords',
  detail: { chord, chordType, degree, inversion: 0, key: 'C' },
})
// minor seventh: 1 right 900, b3 right 1500 and wrong 2500, 5 right 1100, b7 wrong 3000
// dominant seventh: 1 right 700, 3 right 1300 and right 1700, b7 right 2100
const SESSION = [
  tone('Dm7', 'minor seventh', '1', true, 900),
  tone('Dm7', 'minor seventh', 'b3', true, 1500),
  tone('Dm7', 'minor seventh', 'b3', false, 2500),
  tone('Dm7', 'minor seventh', '5', true, 1100),
  tone('Dm7', 'minor seventh', 'b7', false, 3000),
  tone('G7', 'dominant seventh', '1', true, 700),
  tone('G7', 'dominant seventh', '3', true, 1300),
  tone('G7', 'dominant seventh', '3', true, 1700),
  tone('G7', 'dominant seventh', 'b7', true, 2100),
]

beforeAll(async () => {
  api = await startTestApi()
  app = api.app
  lena = await practiser(app)
  await practise(lena, SESSION, { batchSize: 4 })
})
afterAll(() => api.close())

type Row = { attempts: number; correct: number; accuracy: number; medianMs: number | null }
const byKey = <T extends Record<string, unknown>>(rows: T[], key: keyof T) =>
  Object.fromEntries(rows.map((r) => [String(r[key]), r]))

describe('Chord Tones attempts and statistics', () => {
  it('when chord-tone attempts are posted, then they are stored under the new drill id', async () => {
    const rows = await api.ctx.db('attempts').where({ user_id: lena.user.id, drill: 'chords' })
    expect(rows).toHaveLength(9)
    expect(rows.map((r) => r.detail.chordType).sort()[0]).toBe('dominant seventh')
  })

  it('when the student reads chord tones, then figures per chord type match the history', async () => {
    const res = await lena.agent.get('/api/progress/chords')

    expect(res.status).toBe(200)
    const types = byKey<Row & { chordType: string }>(res.body.chordTypes, 'chordType')
    // minor seventh: 5 answers, 3 right; right times 900 1100 1500 → median 1100
    expect(types['minor seventh']).toMatchObject({ attempts: 5, correct: 3, medianMs: 1100 })
    expect(types['minor seventh']?.accuracy).toBeCloseTo(0.6, 10)
    // dominant seventh: 4 of 4; 700 1300 1700 2100 → median (1300 + 1700) / 2 = 1500
    expect(types['dominant seventh']).toMatchObject({ attempts: 4, correct: 4, medianMs: 1500 })
    // weakest chord type first
    expect(res.body.chordTypes.map((r: { chordType: string }) => r.chordType)).toEqual([
      'minor seventh',
      'dominant seventh',
    ])
  })

  it('when the student reads chord tones, then degrees pool the chord types, in chord order', async () => {
    const res = await lena.agent.get(`/api/progress/chords?instrument=${lena.instrumentId}`)

    expect(res.status).toBe(200)
    expect(res.body.instrumentId).toBe(lena.instrumentId)
    expect(res.body.degrees.map((r: { degree: string }) => r.degree)).toEqual([
      '1',
      'b3',
      '3',
      '5',
      'b7',
    ])
    const degrees = byKey<Row & { degree: string }>(res.body.degrees, 'degree')
    // 1: 900 and 700 → median 800; b7: one miss (3000) and one right 2100 → 1 of 2, median 2100
    expect(degrees['1']).toMatchObject({ attempts: 2, correct: 2, medianMs: 800 })
    expect(degrees['b7']).toMatchObject({ attempts: 2, correct: 1, accuracy: 0.5, medianMs: 2100 })
    expect(degrees['b3']).toMatchObject({ attempts: 2, correct: 1, medianMs: 1500 })
    const cell = res.body.cells.find(
      (c: { chordType: string; degree: string }) =>
        c.chordType === 'dominant seventh' && c.degree === '3',
    )
    expect(cell).toMatchObject({ attempts: 2, correct: 2, medianMs: 1500 })
  })

  it('when a chords attempt carries an odd detail, then it is stored and not counted per degree', async () => {
    const p = await practiser(app)
    await practise(p, [
      { ...tone('C', 'major', '1', true, 800), detail: { chord: 'C', degree: 3 } },
    ])
    const res = await p.agent.get('/api/progress/chords')
    expect(res.body.chordTypes).toEqual([])
    expect(await api.ctx.db('attempts').where({ user_id: p.user.id })).toHaveLength(1)
  })

  it('when a drill id is unknown, then the attempt is refused with a field error', async () => {
    const body = attemptBody(lena, crypto.randomUUID(), { ...SESSION[0]!, drill: 'chord' })
    const res = await lena.agent.post('/api/attempts').send({ attempts: [body] })
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields)).toContain('attempts.0.drill')
  })

  it('when someone else asks, then 401 signed out, 403 for another student, 400 for a bad id', async () => {
    expect((await request(app).get('/api/progress/chords')).status).toBe(401)
    const other = await practiser(app)
    const res = await other.agent.get(`/api/progress/chords?student=${lena.user.id}`)
    expect(res.status).toBe(403)
    const bad = await lena.agent.get('/api/progress/chords?instrument=7')
    expect(bad.status).toBe(400)
    expect(bad.body.error.fields).toHaveProperty(['query.instrument'])
  })
})
