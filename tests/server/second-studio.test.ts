// Issue 16 item 7: a student joining a second studio chooses what earlier practice its teacher may
// see ("from now on" by default, the last 30 days, everything); every teacher-facing read keeps to it.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedInAgent, startTestApi, type TestApi } from '../helpers/api'
import { insertAttempts, joinStudio, teacherWithStudio, type Agent } from '../helpers/studio'

let api: TestApi
let first: Agent & { studioId: string }
let student: Agent
const DAY_MIN = 24 * 60
const CHORD = { chordType: 'maj7', degree: '3' }

async function linkToken(teacher: Agent & { studioId: string }) {
  const res = await teacher.agent
    .post(`/api/studio/studios/${teacher.studioId}/invite-links`)
    .send({})
  expect(res.status).toBe(201)
  return new URL(res.body.url).searchParams.get('token')!
}

/** A new teacher whose studio the student joins with a link and the given choice. */
async function secondTeacher(name: string, shareHistory?: string) {
  const teacher = await teacherWithStudio(api.app, name)
  const token = await linkToken(teacher)
  const res = await student.agent
    .post('/api/invitations/accept')
    .send({ token, ...(shareHistory ? { shareHistory } : {}) })
  expect(res.status).toBe(200)
  return { teacher, answer: res.body }
}

const summaryOf = async (teacher: Agent) =>
  (await teacher.agent.get('/api/progress/summary').query({ student: student.user.id })).body
const resultLines = async (teacher: Agent) =>
  (await teacher.agent.get(`/api/studio/students/${student.user.id}/results.csv`)).text
    .trim()
    .split('\r\n')
const rosterRowFor = async (teacher: Agent) =>
  (await teacher.agent.get(`/api/studio/students/${student.user.id}`)).body.student

beforeAll(async () => {
  api = await startTestApi({ signupsPerHour: 1000 })
  first = await teacherWithStudio(api.app, 'First Studio Teacher')
  student = await signedInAgent(api.app, 'student', 'Wren Twostudios')
  await joinStudio(api.ctx, first.studioId, student.user.id)
  // 40 days ago: one miss on string 1 fret 3; 10 days ago: 2 answers; an hour ago: 3 answers
  await insertAttempts(api.ctx, student.user.id, null, [
    { correct: false, responseMs: 2000, minutesAgo: 40 * DAY_MIN, string: 1, fret: 3 },
  ])
  await insertAttempts(api.ctx, student.user.id, null, [
    { correct: true, responseMs: 900, minutesAgo: 10 * DAY_MIN, string: 2, fret: 1 },
    { correct: false, responseMs: 1500, minutesAgo: 10 * DAY_MIN - 1, string: 2, fret: 4 },
  ])
  await insertAttempts(api.ctx, student.user.id, null, [
    { correct: true, responseMs: 700, minutesAgo: 61, string: 0, fret: 1 },
    { correct: false, responseMs: 1100, minutesAgo: 60, string: 0, fret: 5 },
    {
      correct: false,
      responseMs: 1200,
      minutesAgo: 59,
      ...{ drill: 'chords', detail: CHORD, string: 0, fret: 7 },
    },
  ])
})
afterAll(() => api.close())

describe('joining a second studio', () => {
  it('when the student keeps the default, then the new teacher sees none of the earlier answers', async () => {
    const { teacher, answer } = await secondTeacher('Default Teacher')
    expect(Date.parse(answer.studio.sharesFrom)).toBeGreaterThan(Date.now() - 60_000)
    const summary = await summaryOf(teacher)
    expect(summary.totals).toMatchObject({ attempts: 0, sessions: 0 })
    expect(summary.lastPracticeAt).toBeNull()
    const places = await teacher.agent
      .get('/api/progress/positions')
      .query({ student: student.user.id })
    expect(places.body.positions).toEqual([])
    const chords = await teacher.agent
      .get('/api/progress/chords')
      .query({ student: student.user.id })
    expect(chords.body.cells).toEqual([])
    expect(await resultLines(teacher)).toHaveLength(1) // the header only
    const row = await rosterRowFor(teacher)
    expect(row).toMatchObject({ lastPracticeAt: null, attemptsThisWeek: 0, weakSpots: [] })
    expect(row.attention.map((r: { text: string }) => r.text)).toContain(
      'No practice since joining',
    )
    const listed = (await teacher.agent.get('/api/studio/students')).body.students
    expect(listed[0]).toMatchObject({ lastPracticeAt: null, accuracy: null })
    const since = await teacher.agent
      .get('/api/lessons/since-last')
      .query({ student: student.user.id })
    expect(since.body.since).toMatchObject({ answers: 0, sessions: 0 })
  })

  it('when the student shares everything, then the new teacher sees what the first teacher sees', async () => {
    const { teacher, answer } = await secondTeacher('Everything Teacher', 'everything')
    expect(answer.studio.sharesFrom).toBeNull()
    const [mine, theirs] = [await summaryOf(teacher), await summaryOf(first)]
    expect(theirs.totals.attempts).toBe(6)
    expect(mine.totals).toEqual(theirs.totals)
    expect(await resultLines(teacher)).toHaveLength((await resultLines(first)).length)
    expect((await rosterRowFor(teacher)).weakSpots).toEqual((await rosterRowFor(first)).weakSpots)
  })

  it('when the student shares the last 30 days, then the answers of 40 days ago stay hidden', async () => {
    const { teacher, answer } = await secondTeacher('Month Teacher', 'last-30-days')
    const from = Date.parse(answer.studio.sharesFrom)
    expect(Date.now() - from).toBeGreaterThan(30 * DAY_MIN * 60_000)
    expect(Date.now() - from).toBeLessThan(31 * DAY_MIN * 60_000)
    expect((await summaryOf(teacher)).totals.attempts).toBe(5)
    expect((await summaryOf(first)).totals.attempts).toBe(6)
    const places = await teacher.agent
      .get('/api/progress/positions')
      .query({ student: student.user.id })
    const strings = places.body.positions.map((p: { string: number }) => p.string)
    expect(strings).not.toContain(1) // the miss on string 1 was 40 days ago
    expect(strings).toEqual(expect.arrayContaining([0, 2]))
  })

  it('when the first teacher looks, then every earlier answer is still there', async () => {
    const row = await rosterRowFor(first)
    expect(row.lastPracticeAt).not.toBeNull()
    expect(row.attemptsThisWeek).toBe(3)
    expect(await resultLines(first)).toHaveLength(1 + 6) // all six lie in the default 90 days
  })

  it('when the student lists their studios, then each says from when it sees their practice', async () => {
    const res = await student.agent.get('/api/studio/memberships')
    const byTeacher = new Map(
      res.body.memberships.map((m: { teacherName: string; sharesFrom: string | null }) => [
        m.teacherName,
        m.sharesFrom,
      ]),
    )
    expect(byTeacher.get('First Studio Teacher')).toBeNull()
    expect(byTeacher.get('Everything Teacher')).toBeNull()
    expect(byTeacher.get('Default Teacher')).toEqual(expect.any(String))
  })

  it('when a first studio is joined without a choice, then it sees everything', async () => {
    const newcomer = await signedInAgent(api.app, 'student', 'Solo Newcomer')
    const teacher = await teacherWithStudio(api.app, 'Only Teacher')
    const res = await newcomer.agent
      .post('/api/invitations/accept')
      .send({ token: await linkToken(teacher) })
    expect(res.body.studio.sharesFrom).toBeNull()
  })

  it('when the choice is not one of the three, then 400 names the field', async () => {
    const teacher = await teacherWithStudio(api.app, 'Refused Teacher')
    const res = await student.agent
      .post('/api/invitations/accept')
      .send({ token: await linkToken(teacher), shareHistory: 'some' })
    expect(res.status).toBe(400)
    expect(res.body.error.fields.shareHistory).toEqual(['Choose what earlier practice to share.'])
  })

  it('when the student practises after joining, then the new teacher sees just that', async () => {
    const { teacher } = await secondTeacher('Later Teacher', 'from-now')
    await insertAttempts(api.ctx, student.user.id, null, [
      { correct: false, responseMs: 800, minutesAgo: 0, string: 3, fret: 2 },
    ])
    const [, ...answers] = await resultLines(teacher)
    expect(answers).toHaveLength(1)
    expect(answers[0]).toMatch(/,1,Neck Recall,4,2,/) // session 1 of what this teacher sees
    const places = await teacher.agent
      .get('/api/progress/positions')
      .query({ student: student.user.id })
    expect(places.body.positions).toHaveLength(1)
    expect(places.body.positions[0]).toMatchObject({ string: 3, fret: 2, attempts: 1, correct: 0 })
    const row = await rosterRowFor(teacher)
    expect(row.weakSpots.map((w: { string: number }) => w.string)).toEqual([3])
  })
})
