// Issue 14: the roster names each student's fastest clean tempo of the last 7 days (any drill) and
// the drill it was played in; a student without a clean played take has none; the CSV carries it.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startTestApi, type TestApi } from '../helpers/api'
import { insertAttempts, studentIn, teacherWithStudio, type Agent } from '../helpers/studio'

let api: TestApi
let teacher: Agent & { studioId: string }
let rue: Agent
let sol: Agent

const DAY_MINUTES = 24 * 60
const take = (drill: string, cleanTempo: number | null, minutesAgo: number) => ({
  correct: true,
  responseMs: 500,
  drill,
  minutesAgo,
  detail: {
    played: true,
    tempo: cleanTempo ?? 120,
    ...(cleanTempo === null ? {} : { cleanTempo, playedSettings: 'C major, frets 2–5' }),
  },
})

beforeAll(async () => {
  api = await startTestApi()
  teacher = await teacherWithStudio(api.app, 'Tempo Teacher')
  rue = await studentIn(api.app, api.ctx, teacher.studioId, 'Rue Tempofast')
  sol = await studentIn(api.app, api.ctx, teacher.studioId, 'Sol Tempoless')
  await insertAttempts(api.ctx, rue.user.id, null, [
    take('cycle', 88, 60), // clean, another drill
    take('runs', 96, 2 * DAY_MINUTES), // the fastest clean take this week
    take('runs', null, 30), // played at 120 but not clean: does not count
    take('runs', 140, 10 * DAY_MINUTES), // clean but 10 days ago: outside the week
  ])
  // Sol only taps (no played detail) and once played a take that was not clean.
  await insertAttempts(api.ctx, sol.user.id, null, [
    { correct: true, responseMs: 700 },
    take('runs', null, 20),
  ])
})
afterAll(() => api.close())

const rowOf = async (name: string) => {
  const res = await teacher.agent.get('/api/studio/roster').query({ search: name })
  expect(res.status).toBe(200)
  return res.body.items[0]
}

describe('roster fastest clean tempo', () => {
  it('when a student played clean takes this week, then the roster names the fastest and its drill', async () => {
    expect((await rowOf('Tempofast')).fastestTempo).toEqual({
      bpm: 96,
      drill: 'runs',
      settings: 'C major, frets 2–5',
    })
  })

  it('when a student has no clean played take this week, then the figure is null', async () => {
    expect((await rowOf('Tempoless')).fastestTempo).toBeNull()
  })

  it('when sorted by fastest tempo, descending, then the student with one comes first', async () => {
    const res = await teacher.agent
      .get('/api/studio/roster')
      .query({ search: 'Tempo', sortBy: 'fastestTempo', sortDesc: true })
    expect(res.status).toBe(200)
    expect(res.body.items.map((r: { name: string }) => r.name)).toEqual([
      'Rue Tempofast',
      'Sol Tempoless',
    ])
  })

  it("when exported, then the CSV has the tempo and the drill's name", async () => {
    const res = await teacher.agent.get('/api/studio/roster.csv').query({ timeZone: 'UTC' })
    const lines = res.text
      .replace(/^\uFEFF/, '')
      .trim()
      .split(/\r?\n/)
    expect(lines[0]).toMatch(/,"Fastest clean tempo \(BPM, 7 days\)",Fastest clean tempo drill$/)
    expect(lines.find((l) => l.startsWith('Rue Tempofast'))).toMatch(/,96,Range Runs$/)
    expect(lines.find((l) => l.startsWith('Sol Tempoless'))).toMatch(/,,$/)
  })

  it('when the teacher opens the student page, then the row carries the same tempo', async () => {
    const res = await teacher.agent.get(`/api/studio/students/${rue.user.id}`)
    expect(res.status).toBe(200)
    expect(res.body.student.fastestTempo).toMatchObject({ bpm: 96, drill: 'runs' })
  })
})
