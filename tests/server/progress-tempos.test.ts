// /api/progress/tempos: the fastest clean tempo of takes played on the instrument, stored in the
// attempts' detail (cleanTempo, playedSettings) and read back per drill, settings and day; who may
// read it, and a bad query.
import type { Express } from 'express'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startTestApi, type TestApi } from '../helpers/api'
import { at, practise, practiser, type Practiser } from '../helpers/practice'

let api: TestApi
let app: Express
let student: Practiser

const DAY1 = '2026-03-02'
const DAY2 = '2026-03-03'
const C_MAJOR = 'C major, frets 2–5'
const played = (bpm: number | null, settings = C_MAJOR) => ({
  played: true,
  tempo: bpm ?? 72,
  beatMs: 12,
  ...(bpm === null ? {} : { cleanTempo: bpm, playedSettings: settings }),
})
const run = (day: string, time: string, detail: ReturnType<typeof played>) => ({
  string: 1,
  fret: 3,
  correct: true,
  ms: 450,
  at: at(day, time),
  drill: 'runs',
  detail: {
    tonic: 'C',
    scale: 'major',
    lowFret: 2,
    highFret: 5,
    pattern: '0:3-3-3-3',
    direction: 'up',
    ...detail,
  },
})

beforeAll(async () => {
  api = await startTestApi()
  app = api.app
  student = await practiser(app)
  // Day 1: clean takes at 72 and 76, a sloppy one at 80 (no cleanTempo); another key clean at 60.
  await practise(student, [
    run(DAY1, '10:00:00', played(72)),
    run(DAY1, '10:01:00', played(76)),
    run(DAY1, '10:02:00', played(null)),
    run(DAY1, '10:03:00', played(60, 'G major, frets 2–5')),
  ])
  // Day 2: clean at 80; a tapped answer with no detail of a take
  await practise(student, [
    run(DAY2, '09:00:00', played(80)),
    { string: 1, fret: 3, correct: true, ms: 900, at: at(DAY2, '09:05:00') },
  ])
})
afterAll(() => api.close())

const range = `from=${DAY1}&to=${DAY2}`

describe('GET /api/progress/tempos', () => {
  it('when a student reads their tempos, then the fastest clean tempo per drill, settings and day comes back', async () => {
    const res = await student.agent.get(`/api/progress/tempos?${range}`)

    expect(res.status).toBe(200)
    const line = (settings: string) =>
      res.body.series.find((s: { settings: string }) => s.settings === settings)
    // C major: day 1 max(72, 76) = 76 (the sloppy 80 does not count), day 2 80; fastest 80
    expect(line(C_MAJOR)).toEqual({
      drill: 'runs',
      settings: C_MAJOR,
      fastest: 80,
      points: [
        { day: DAY1, bpm: 76 },
        { day: DAY2, bpm: 80 },
      ],
    })
    expect(line('G major, frets 2–5')).toMatchObject({
      fastest: 60,
      points: [{ day: DAY1, bpm: 60 }],
    })
    expect(res.body.series).toHaveLength(2)
  })

  it('when filtered to another drill, then nothing comes back', async () => {
    const res = await student.agent.get(`/api/progress/tempos?${range}&drill=hunt`)
    expect(res.status).toBe(200)
    expect(res.body.series).toEqual([])
  })

  it('when the range is backwards, then 400 with the field named', async () => {
    const res = await student.agent.get(`/api/progress/tempos?from=${DAY2}&to=${DAY1}`)
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toHaveProperty(['query.to'])
  })

  it('when nobody is signed in, then 401; another student, then 403', async () => {
    const { default: request } = await import('supertest')
    expect((await request(app).get('/api/progress/tempos')).status).toBe(401)
    const other = await practiser(app)
    const res = await other.agent.get(`/api/progress/tempos?student=${student.user.id}`)
    expect(res.status).toBe(403)
  })
})
