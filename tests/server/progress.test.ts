// /api/progress: statistics of a hand-built practice history, checked against arithmetic done by
// hand below (medians and p90 are linear-interpolation percentiles, rank = p·(n−1), as
// PostgreSQL's percentile_cont), plus streaks, filters and who may read whose progress.
import type { Express } from 'express'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { rosterSummary } from '../../server/roster/roster-summary'
import { makeAdmin, startTestApi, type TestApi } from '../helpers/api'
import { at, practise, practiser, utcDay, type Practiser } from '../helpers/practice'

let api: TestApi
let app: Express
let noor: Practiser
let guitarId: string

// Day 1, 2026-03-02 (UTC). Recall session at 10:00, sent in two batches of three:
//   string 1 fret 3 (C2): right 1200 ms, right 1800, wrong 3000, right 900
//   string 0 fret 8 (C2): right 2000, wrong 2500
// Hunt session: string 2 fret 2 (E2): right 1000 at 10:05:00, right 1400 at 10:08:00.
// Day 2, 2026-03-03: recall, string 1 fret 3: right 1000 at 09:00:00, wrong 2000 at 09:00:05.
const DAY1 = '2026-03-02'
const DAY2 = '2026-03-03'
const RECALL_DAY1 = [
  { string: 1, fret: 3, correct: true, ms: 1200, at: at(DAY1, '10:00:00') },
  { string: 1, fret: 3, correct: true, ms: 1800, at: at(DAY1, '10:00:10') },
  { string: 1, fret: 3, correct: false, ms: 3000, at: at(DAY1, '10:00:20') },
  { string: 1, fret: 3, correct: true, ms: 900, at: at(DAY1, '10:00:30') },
  { string: 0, fret: 8, correct: true, ms: 2000, at: at(DAY1, '10:00:40') },
  { string: 0, fret: 8, correct: false, ms: 2500, at: at(DAY1, '10:00:50') },
]
const HUNT_DAY1 = [
  { string: 2, fret: 2, correct: true, ms: 1000, at: at(DAY1, '10:05:00'), drill: 'hunt' },
  { string: 2, fret: 2, correct: true, ms: 1400, at: at(DAY1, '10:08:00'), drill: 'hunt' },
]
const RECALL_DAY2 = [
  { string: 1, fret: 3, correct: true, ms: 1000, at: at(DAY2, '09:00:00') },
  { string: 1, fret: 3, correct: false, ms: 2000, at: at(DAY2, '09:00:05') },
]

beforeAll(async () => {
  api = await startTestApi()
  app = api.app
  noor = await practiser(app)
  expect(noor.tuning.slice(0, 3)).toEqual([28, 33, 38]) // E1 A1 D2: the cells above hold C2, C2, E2
  await practise(noor, RECALL_DAY1, { batchSize: 3 })
  await practise(noor, HUNT_DAY1)
  await practise(noor, RECALL_DAY2)
  const guitar = await noor.agent
    .post('/api/instruments')
    .send({ name: 'Guitar', tuning: [40, 45, 50, 55, 59, 64], frets: 22, scaleLengthMm: 648 })
  guitarId = guitar.body.instrument.id
  await practise({ ...noor, instrumentId: guitarId, tuning: [40, 45, 50, 55, 59, 64] }, [
    { string: 0, fret: 0, correct: true, ms: 700, at: at(DAY1, '20:00:00') },
  ])
})
afterAll(() => api.close())

const get = (agent: Practiser['agent'], path: string) => agent.get(`/api/progress${path}`)

describe('figures per place and note', () => {
  it('when a student reads their places, then accuracy, median and p90 match the hand-built history', async () => {
    const res = await get(noor.agent, '/positions')

    expect(res.status).toBe(200)
    expect(res.body.instrument.id).toBe(noor.instrumentId)
    const place = (s: number, f: number) =>
      res.body.positions.find(
        (p: { string: number; fret: number }) => p.string === s && p.fret === f,
      )
    // string 1 fret 3: 6 answers, 4 right → 4/6. Right times 1200 1800 900 1000 → sorted 900 1000 1200 1800:
    // median (1000 + 1200) / 2 = 1100; p90 rank 0.9·3 = 2.7 → 1200 + 0.7·(1800 − 1200) = 1620.
    expect(place(1, 3)).toMatchObject({
      attempts: 6,
      correct: 4,
      recentAnswers: 6,
      medianMs: 1100,
      lastSeenAt: '2026-03-03T09:00:05.000Z',
    })
    expect(place(1, 3).accuracy).toBeCloseTo(4 / 6, 10)
    expect(place(1, 3).p90Ms).toBeCloseTo(1620, 6)
    // string 0 fret 8: 2 answers, 1 right (2000 ms) → 0.5; median = p90 = 2000.
    expect(place(0, 8)).toMatchObject({
      attempts: 2,
      correct: 1,
      accuracy: 0.5,
      medianMs: 2000,
      p90Ms: 2000,
    })
    // string 2 fret 2 (hunt): 1000 and 1400 → median 1200; p90 rank 0.9 → 1000 + 0.9·400 = 1360.
    expect(place(2, 2)).toMatchObject({ attempts: 2, accuracy: 1, medianMs: 1200 })
    expect(place(2, 2).p90Ms).toBeCloseTo(1360, 6)
    expect(res.body.positions).toHaveLength(3) // the guitar answer belongs to the other instrument
  })

  it('when filtered to one drill, then only that drill counts', async () => {
    const res = await get(noor.agent, '/positions?drill=hunt')
    expect(
      res.body.positions.map((p: { string: number; fret: number }) => [p.string, p.fret]),
    ).toEqual([[2, 2]])
  })

  it('when a student reads their notes, then places of one pitch class are pooled', async () => {
    const res = await get(noor.agent, '/notes')

    expect(res.status).toBe(200)
    expect(res.body.pitchClasses).toHaveLength(12)
    const c = res.body.pitchClasses[0]
    // C = string 1 fret 3 (6 answers, 4 right) + string 0 fret 8 (2, 1 right) → 8 answers, 5 right.
    // Right times 1200 1800 900 1000 2000 → sorted 900 1000 1200 1800 2000: median 1200;
    // p90 rank 0.9·4 = 3.6 → 1800 + 0.6·200 = 1920.
    expect(c).toMatchObject({ pitchClass: 0, attempts: 8, correct: 5, medianMs: 1200 })
    expect(c.p90Ms).toBeCloseTo(1920, 6)
    expect(res.body.pitchClasses[4]).toMatchObject({ pitchClass: 4, attempts: 2, correct: 2 }) // E
    expect(res.body.pitchClasses[7]).toMatchObject({ attempts: 0, accuracy: null, medianMs: null })
    expect(res.body.pitches.map((p: { pitch: number }) => p.pitch)).toEqual([36, 40]) // C2, E2
    // By string: the A string (1) holds only C (6 answers); the E string (0) C (2 answers).
    expect(res.body.byString[1].pitchClasses[0]).toMatchObject({ attempts: 6, correct: 4 })
    expect(res.body.byString[0].pitchClasses[0]).toMatchObject({ attempts: 2, correct: 1 })
  })

  it('when a place has more than 50 answers, then recent figures use the latest 50 and the lifetime ones all', async () => {
    const p = await practiser(app)
    // 5 misses, then 50 right answers of 1000 … 1049 ms: recent = the 50 right ones (accuracy 1),
    // median (1024 + 1025) / 2 = 1024.5; lifetime accuracy 50/55.
    const answers = [
      ...Array.from({ length: 5 }, (_, i) => ({
        string: 0,
        fret: 1,
        correct: false,
        ms: 4000,
        at: at(DAY1, `11:00:0${i}`),
      })),
      ...Array.from({ length: 50 }, (_, i) => ({
        string: 0,
        fret: 1,
        correct: true,
        ms: 1000 + i,
        at: new Date(Date.parse(at(DAY1, '11:01:00')) + i * 1000).toISOString(),
      })),
    ]
    await practise(p, answers, { batchSize: 20 })

    const place = (await get(p.agent, '/positions')).body.positions[0]

    expect(place).toMatchObject({
      attempts: 55,
      correct: 50,
      recentAnswers: 50,
      recentAccuracy: 1,
      medianMs: 1024.5,
    })
    expect(place.accuracy).toBeCloseTo(50 / 55, 10)
  })
})

describe('timeline', () => {
  it('when a student reads a date range, then each day has hand-checked figures per drill and for all drills', async () => {
    const res = await get(
      noor.agent,
      `/timeline?from=${DAY1}&to=${DAY2}&instrument=${noor.instrumentId}`,
    )

    expect(res.status).toBe(200)
    expect(res.body).toMatchObject({ from: DAY1, to: DAY2, timeZone: 'UTC' })
    const series = Object.fromEntries(
      res.body.series.map((s: { drill: string; points: unknown[] }) => [s.drill, s.points]),
    )
    expect(Object.keys(series).sort()).toEqual(['all', 'hunt', 'recall'])
    // Day 1, all drills: 8 answers, 6 right. Right times 1200 1800 900 2000 1000 1400 → sorted
    // 900 1000 1200 1400 1800 2000: median (1200 + 1400) / 2 = 1300; p90 rank 4.5 → 1800 + 0.5·200 = 1900.
    // Active time: recall 1200 (first answer) + 5 gaps of 10 s = 51 200 ms; hunt 1000 + a 180 s gap
    // capped at 120 s = 121 000 ms; 172 200 ms = 2.87 min → 2.9.
    expect(series.all[0]).toMatchObject({
      day: DAY1,
      attempts: 8,
      correct: 6,
      accuracy: 0.75,
      medianMs: 1300,
      p90Ms: 1900,
      minutes: 2.9,
    })
    // Day 2: 2 answers, 1 right (1000 ms); active 1000 + 5000 ms = 0.1 min.
    expect(series.all[1]).toMatchObject({
      day: DAY2,
      attempts: 2,
      correct: 1,
      accuracy: 0.5,
      medianMs: 1000,
      p90Ms: 1000,
      minutes: 0.1,
    })
    // Recall on day 1: right 1200 1800 900 2000 → median 1500; p90 rank 2.7 → 1800 + 0.7·200 = 1940.
    expect(series.recall[0]).toMatchObject({ attempts: 6, correct: 4, medianMs: 1500 })
    expect(series.recall[0].p90Ms).toBeCloseTo(1940, 6)
    expect(series.hunt).toHaveLength(1)
  })

  it('when filtered by drill and date, then only those days and that drill come back', async () => {
    const res = await get(noor.agent, `/timeline?from=${DAY2}&to=${DAY2}&drill=recall`)
    expect(res.body.series).toHaveLength(1)
    expect(res.body.series[0].drill).toBe('recall')
    expect(res.body.series[0].points.map((p: { day: string }) => p.day)).toEqual([DAY2])
  })

  it('when filtered by instrument, then the other instrument is left out; without a filter every instrument counts', async () => {
    const guitar = await get(noor.agent, `/timeline?from=${DAY1}&to=${DAY2}&instrument=${guitarId}`)
    const all = await get(noor.agent, `/timeline?from=${DAY1}&to=${DAY2}`)
    const firstAll = (body: { series: { drill: string; points: { attempts: number }[] }[] }) =>
      body.series.find((s) => s.drill === 'all')!.points[0]!
    expect(firstAll(guitar.body).attempts).toBe(1)
    expect(firstAll(all.body).attempts).toBe(9) // 8 on the bass + 1 on the guitar
  })

  it('when no range is given, then the last 30 days up to today are shown', async () => {
    const res = await get(noor.agent, '/timeline')
    expect(res.body.to).toBe(utcDay(0))
    expect(res.body.from).toBe(utcDay(29))
  })

  it.each([
    ['from=2026-03-05&to=2026-03-01', 'query.to'],
    ['from=yesterday', 'query.from'],
    ['from=2020-01-01&to=2026-01-01', 'query.from'],
    ['drill=scales', 'query.drill'],
    ['instrument=guitar', 'query.instrument'],
    ['student=42', 'query.student'],
    ['colour=red', 'query'],
  ])('when the query is %s, then 400 names %s', async (query, field) => {
    const res = await get(noor.agent, `/timeline?${query}`)
    expect(res.status).toBe(400)
    expect(
      Object.keys(res.body.error.fields).some(
        (k) =>
          k === field || k.startsWith(`${field}.`) || (field === 'query' && k.startsWith('query')),
      ),
    ).toBe(true)
  })

  it("when the instrument is not the student's, then 400 names it", async () => {
    const other = await practiser(app)
    const res = await get(noor.agent, `/positions?instrument=${other.instrumentId}`)
    expect(res.status).toBe(400)
    expect(res.body.error.fields['query.instrument']).toBeDefined()
  })
})

describe('summary and streaks', () => {
  it('when a student practised today, the two days before and four days in a row earlier, then the streak is 3 and the longest 4', async () => {
    const p = await practiser(app)
    for (const daysAgo of [0, 1, 2, 10, 11, 12, 13]) {
      await practise(p, [
        { string: 0, fret: 1, correct: true, ms: 1000, at: at(utcDay(daysAgo), '00:00:10') },
      ])
    }

    const res = await get(p.agent, '/summary')

    expect(res.status).toBe(200)
    expect(res.body.streak).toEqual({ current: 3, longest: 4, practisedToday: true })
    expect(res.body.today).toBe(utcDay(0))
    expect(res.body.totals).toMatchObject({
      attempts: 7,
      correct: 7,
      accuracy: 1,
      days: 7,
      sessions: 7,
    })
    expect(res.body.last7Days).toMatchObject({ attempts: 3, days: 3 })
    expect(res.body.todayTotals).toMatchObject({ attempts: 1, days: 1 })
    expect(res.body.lastPracticeAt).toBe(at(utcDay(0), '00:00:10'))
  })

  it('when the last practice was yesterday, then the streak still counts but today is not practised yet', async () => {
    const p = await practiser(app)
    await practise(p, [
      { string: 0, fret: 1, correct: true, ms: 1000, at: at(utcDay(1), '00:00:10') },
    ])
    expect((await get(p.agent, '/summary')).body.streak).toEqual({
      current: 1,
      longest: 1,
      practisedToday: false,
    })
  })

  it('when the last practice was three days ago, then the current streak is 0', async () => {
    const p = await practiser(app)
    await practise(p, [
      { string: 0, fret: 1, correct: true, ms: 1000, at: at(utcDay(3), '00:00:10') },
    ])
    expect((await get(p.agent, '/summary')).body.streak).toEqual({
      current: 0,
      longest: 1,
      practisedToday: false,
    })
  })

  it('when a new student has no practice, then the summary is empty but complete', async () => {
    const p = await practiser(app)
    const res = await get(p.agent, '/summary')
    expect(res.body).toMatchObject({
      streak: { current: 0, longest: 0, practisedToday: false },
      lastPracticeAt: null,
      activeInstrumentId: p.instrumentId,
    })
    expect(res.body.totals).toMatchObject({ attempts: 0, accuracy: null, minutes: 0 })
  })

  it('when the summary is limited to a range and an instrument, then totals count only those', async () => {
    const res = await get(
      noor.agent,
      `/summary?from=${DAY1}&to=${DAY1}&instrument=${noor.instrumentId}`,
    )
    // Day 1 on the bass: 8 answers, 6 right, 2.9 minutes, in 2 sessions.
    expect(res.body.totals).toMatchObject({
      attempts: 8,
      correct: 6,
      accuracy: 0.75,
      minutes: 2.9,
      days: 1,
      sessions: 2,
    })
    expect(res.body.instruments.map((i: { id: string }) => i.id).sort()).toEqual(
      [noor.instrumentId, guitarId].sort(),
    )
  })
})

describe('fingerings', () => {
  it('when Range Runs were practised with two patterns, then each pattern counts its sessions and attempts', async () => {
    const p = await practiser(app)
    const run = (pattern: string, time: string) => ({
      string: 1,
      fret: 5,
      correct: true,
      ms: 800,
      at: at(DAY1, time),
      drill: 'runs',
      detail: { tonic: 'G', scale: 'major', lowFret: 2, highFret: 5, pattern, direction: 'up' },
    })
    await practise(p, [run('3-3-3-3', '10:00:00'), run('3-3-3-3', '10:00:05')])
    await practise(p, [run('3-3-3-3', '11:00:00'), run('4-4-3-2', '11:00:05')])
    await practise(p, [
      {
        ...run('2-3-3-3', '12:00:00'),
        detail: {
          tonic: 'G',
          scale: 'major',
          lowFret: 0,
          highFret: 4,
          pattern: '2-3-3-3',
          direction: 'up',
        },
      },
    ])

    const res = await get(p.agent, '/fingerings?tonic=G&scale=major&lowFret=2&highFret=5')

    expect(res.status).toBe(200)
    const byPattern = Object.fromEntries(
      res.body.patterns.map((x: { pattern: string }) => [x.pattern, x]),
    )
    expect(Object.keys(byPattern).sort()).toEqual(['3-3-3-3', '4-4-3-2'])
    expect(byPattern['3-3-3-3']).toMatchObject({
      sessions: 2,
      attempts: 3,
      lastPractisedAt: at(DAY1, '11:00:00'),
    })
    expect(byPattern['4-4-3-2']).toMatchObject({ sessions: 1, attempts: 1 })
  })

  it('when a runs attempt carries an odd detail, then it is still stored and simply not counted', async () => {
    const p = await practiser(app)
    const odd = {
      string: 1,
      fret: 5,
      correct: true,
      ms: 800,
      at: at(DAY1, '10:00:00'),
      drill: 'runs',
    }
    await practise(p, [
      {
        ...odd,
        detail: { tonic: 'G', scale: 'major', lowFret: 'two', highFret: 5, pattern: '3-3-3-3' },
      },
      { ...odd, detail: { tonic: 'G', scale: 'major', lowFret: 2, highFret: 5 } },
    ])
    const res = await get(p.agent, '/fingerings?tonic=G&scale=major&lowFret=2&highFret=5')
    expect(res.body.patterns).toEqual([])
    expect(await api.ctx.db('attempts').where({ user_id: p.user.id }).count({ n: '*' })).toEqual([
      { n: '2' },
    ])
  })

  it('when the tonic or region is not valid, then 400 names the field', async () => {
    const res = await get(noor.agent, '/fingerings?tonic=H&scale=major&lowFret=5&highFret=2')
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['query.highFret', 'query.tonic'])
  })
})

describe('who may read progress', () => {
  async function studioOf(teacher: Practiser, ...students: Practiser[]) {
    const [studio] = await api.ctx
      .db('studios')
      .insert({ teacher_id: teacher.user.id, name: 'Test studio' })
      .returning('id')
    for (const s of students)
      await api.ctx.db('studio_members').insert({ studio_id: studio.id, student_id: s.user.id })
  }

  it('when nobody is signed in, then 401', async () => {
    expect((await request(app).get('/api/progress/summary')).status).toBe(401)
  })

  it("when a student asks for another student's progress, then 403 on every endpoint", async () => {
    const other = await practiser(app)
    for (const path of [
      '/summary',
      '/positions',
      '/notes',
      '/timeline',
      '/fingerings?tonic=C&scale=major&lowFret=0&highFret=4',
    ]) {
      const sep = path.includes('?') ? '&' : '?'
      expect((await get(other.agent, `${path}${sep}student=${noor.user.id}`)).status).toBe(403)
    }
  })

  it("when a teacher reads a student of their studio, then they get that student's figures", async () => {
    const teacher = await practiser(app, 'teacher')
    await studioOf(teacher, noor)

    const res = await get(teacher.agent, `/positions?student=${noor.user.id}`)

    expect(res.status).toBe(200)
    expect(res.body.instrument.id).toBe(noor.instrumentId)
    expect(res.body.positions).toHaveLength(3)
  })

  it('when a teacher reads a student outside their studios, then 403', async () => {
    const teacher = await practiser(app, 'teacher')
    const stranger = await practiser(app)
    await studioOf(teacher, stranger)
    expect((await get(teacher.agent, `/summary?student=${noor.user.id}`)).status).toBe(403)
  })

  it('when an admin reads any student, then 200', async () => {
    const admin = await practiser(app, 'teacher')
    await makeAdmin(api.ctx, admin.user.id)
    const res = await get(admin.agent, `/summary?student=${noor.user.id}&from=${DAY1}&to=${DAY2}`)
    expect(res.status).toBe(200)
    expect(res.body.totals.attempts).toBe(11)
  })
})

describe('roster summary', () => {
  // The figures the roster is built on, as JSON (as the roster's routes send them).
  const summaryOf = async (teacherId: string) =>
    JSON.parse(JSON.stringify(await rosterSummary(api.ctx, teacherId)))

  it("when a teacher asks for the roster, then each student's week is summed by hand-checked figures", async () => {
    const teacher = await practiser(app, 'teacher')
    const ada = await practiser(app)
    const ben = await practiser(app)
    const [studio] = await api.ctx
      .db('studios')
      .insert({ teacher_id: teacher.user.id, name: 'Roster studio' })
      .returning('id')
    for (const s of [ada, ben])
      await api.ctx.db('studio_members').insert({ studio_id: studio.id, student_id: s.user.id })
    // 9 days ago: string 1 fret 3 right 2000, 2400; string 0 fret 5 right 1500 ×3.
    const before = utcDay(9)
    await practise(ada, [
      { string: 1, fret: 3, correct: true, ms: 2000, at: at(before, '12:00:00') },
      { string: 1, fret: 3, correct: true, ms: 2400, at: at(before, '12:00:10') },
      ...[20, 30, 40].map((s) => ({
        string: 0,
        fret: 5,
        correct: true,
        ms: 1500,
        at: at(before, `12:00:${s}`),
      })),
    ])
    // Yesterday: string 1 fret 3 right 1000, right 1400, wrong 2000, 10 s apart.
    const yesterday = utcDay(1)
    await practise(ada, [
      { string: 1, fret: 3, correct: true, ms: 1000, at: at(yesterday, '12:00:00') },
      { string: 1, fret: 3, correct: true, ms: 1400, at: at(yesterday, '12:00:10') },
      { string: 1, fret: 3, correct: false, ms: 2000, at: at(yesterday, '12:00:20') },
    ])

    const res = { body: await summaryOf(teacher.user.id) } // what the roster is built on

    const a = res.body.students.find((s: { studentId: string }) => s.studentId === ada.user.id)
    // Last 7 days: 3 answers, 2 right → 2/3; right times 1000, 1400 → median 1200. Active time
    // 1000 + 10 000 + 10 000 = 21 000 ms = 0.35 min → 0.4. The 7 days before: right times
    // 2000 2400 1500 1500 1500 → median 1500; 1200 / 1500 − 1 = −0.2 → faster.
    expect(a).toMatchObject({
      attempts7d: 3,
      minutes7d: 0.4,
      medianRecallMs7d: 1200,
      medianRecallMsPrev7d: 1500,
    })
    expect(a.accuracy7d).toBeCloseTo(2 / 3, 10)
    expect(a.recallTrend).toEqual({ change: -0.2, direction: 'faster' })
    expect(a.lastPracticeAt).toBe(at(yesterday, '12:00:20'))
    expect(a.studios).toEqual([{ id: studio.id, name: 'Roster studio' }])
    // Weakest places: string 1 fret 3 (5 answers, 4 right = 0.8; right times 2000 2400 1000 1400 →
    // median 1700); string 0 fret 5 (3 of 3, never missed) is no weak spot (weak-places.ts).
    expect(
      a.weakestPositions.map((w: { string: number; fret: number }) => [w.string, w.fret]),
    ).toEqual([[1, 3]])
    expect(a.weakestPositions[0]).toMatchObject({
      instrumentId: ada.instrumentId,
      stringName: 'A', // string 1 of E1 A1 D2 G2
      answers: 5,
      accuracy: 0.8,
      medianMs: 1700,
    })
    const b = res.body.students.find((s: { studentId: string }) => s.studentId === ben.user.id)
    expect(b).toMatchObject({
      attempts7d: 0,
      minutes7d: 0,
      accuracy7d: null,
      medianRecallMs7d: null,
      lastPracticeAt: null,
      weakestPositions: [],
    })
    expect(b.recallTrend).toEqual({ change: null, direction: null })
    // The roster page shows the same week for Ada.
    const page = await teacher.agent.get('/api/studio/roster')
    expect(page.status).toBe(200)
    expect(page.body.items.find((r: { id: string }) => r.id === ada.user.id)).toMatchObject({
      attemptsThisWeek: 3,
      minutesThisWeek: 0.4,
      recall: { medianMs: 1200, previousMedianMs: 1500, change: -0.2, direction: 'faster' },
    })
  })

  it('when a guitarist is weak on both E strings, then the roster tells the low one from the high one', async () => {
    const teacher = await practiser(app, 'teacher')
    const guitarist = await practiser(app)
    const [studio] = await api.ctx
      .db('studios')
      .insert({ teacher_id: teacher.user.id, name: 'Guitar studio' })
      .returning('id')
    await api.ctx
      .db('studio_members')
      .insert({ studio_id: studio.id, student_id: guitarist.user.id })
    const tuning = [40, 45, 50, 55, 59, 64] // E2 A2 D3 G3 B3 E4, common practice
    const guitar = await guitarist.agent
      .post('/api/instruments')
      .send({ name: 'Guitar', tuning, frets: 22, scaleLengthMm: 648 })
    const day = utcDay(1)
    // Fret 1 on string 0 (F2) and string 5 (F4): three misses each.
    const misses = [0, 5].flatMap((string) =>
      [0, 1, 2].map((i) => ({
        string,
        fret: 1,
        correct: false,
        ms: 3000,
        at: at(day, `12:0${string}:0${i}`),
      })),
    )
    await practise({ ...guitarist, instrumentId: guitar.body.instrument.id, tuning }, misses)

    const res = { body: await summaryOf(teacher.user.id) }

    const names = res.body.students[0].weakestPositions.map(
      (w: { string: number; stringName: string }) => [w.string, w.stringName],
    )
    expect(names).toEqual([
      [0, 'low E'],
      [5, 'high E'],
    ])
  })

  it('when a teacher has no studio, then the roster is empty', async () => {
    const teacher = await practiser(app, 'teacher')
    expect(await rosterSummary(api.ctx, teacher.user.id)).toEqual({ students: [] })
    expect((await teacher.agent.get('/api/studio/roster')).body).toEqual({ total: 0, items: [] })
  })

  it('when a student asks for a roster, then 403', async () => {
    expect((await noor.agent.get('/api/studio/roster')).status).toBe(403)
  })
})
