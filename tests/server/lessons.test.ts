// Lessons (issue 16): a weekly schedule in the teacher's time zone, notes private or shared, the
// iCalendar export (RFC 5545), "since the last lesson", and who may do what.
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startTestApi, type TestApi } from '../helpers/api'
import { insertAttempts, studentIn, teacherWithStudio, type Agent } from '../helpers/studio'

let api: TestApi
let teacher: Agent & { studioId: string }
let other: Agent & { studioId: string }
let student: Agent
let outsider: Agent
beforeAll(async () => {
  api = await startTestApi()
  teacher = await teacherWithStudio(api.app, 'Lesson Teacher')
  other = await teacherWithStudio(api.app, 'Other Teacher')
  student = await studentIn(api.app, api.ctx, teacher.studioId, 'Lesson Student')
  outsider = await studentIn(api.app, api.ctx, other.studioId, 'Not Yours')
})
afterAll(() => api.close())

const weekly = (over: Record<string, unknown> = {}) => ({
  studentId: student.user.id,
  date: '2031-03-25',
  time: '16:30',
  timeZone: 'Europe/Tallinn',
  durationMinutes: 45,
  weeks: 3,
  ...over,
})

describe('scheduling', () => {
  it('when a teacher schedules 3 weekly lessons, then they keep 16:30 Tallinn time across the clock change', async () => {
    const res = await teacher.agent.post('/api/lessons').send(weekly())
    expect(res.status).toBe(201)
    // IANA tz database: Tallinn is UTC+2 until 30 Mar 2031 03:00, UTC+3 after
    expect(res.body.lessons.map((l: { startsAt: string }) => l.startsAt)).toEqual([
      '2031-03-25T14:30:00.000Z',
      '2031-04-01T13:30:00.000Z',
      '2031-04-08T13:30:00.000Z',
    ])
    const series = new Set(res.body.lessons.map((l: { seriesId: string }) => l.seriesId))
    expect(series.size).toBe(1)
    expect(res.body.lessons[0]).toMatchObject({ status: 'scheduled', durationMinutes: 45 })
  })

  it('when the student is not in her studios or the body is wrong, then 403 or 400 with the fields', async () => {
    const mine = await teacher.agent
      .post('/api/lessons')
      .send(weekly({ studentId: outsider.user.id }))
    expect(mine.status).toBe(403)
    const bad = await teacher.agent
      .post('/api/lessons')
      .send(weekly({ time: '25:00', timeZone: 'Mars/Base', weeks: 60 }))
    expect(bad.status).toBe(400)
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['time', 'timeZone', 'weeks'])
    expect((await student.agent.post('/api/lessons').send(weekly())).status).toBe(403)
    expect((await request(api.app).get('/api/lessons')).status).toBe(401)
  })
})

describe('notes and the calendar', () => {
  it('when the teacher writes a private and a shared note, then the student reads only the shared one', async () => {
    const [lesson] = (
      await teacher.agent.post('/api/lessons').send(weekly({ weeks: 1, date: '2031-05-06' }))
    ).body.lessons
    await teacher.agent
      .post(`/api/lessons/${lesson.id}/notes`)
      .send({ body: 'Tense wrist: watch it.' })
    const shared = await teacher.agent
      .post(`/api/lessons/${lesson.id}/notes`)
      .send({ body: 'Next week: the A string, frets 5 to 9.', shared: true })
    expect(shared.status).toBe(201)
    expect(shared.body.lesson.notes).toHaveLength(2)
    const mine = (await student.agent.get('/api/lessons')).body.lessons.find(
      (l: { id: string }) => l.id === lesson.id,
    )
    expect(mine.notes.map((n: { body: string }) => n.body)).toEqual([
      'Next week: the A string, frets 5 to 9.',
    ])
    expect(
      (await other.agent.post(`/api/lessons/${lesson.id}/notes`).send({ body: 'x' })).status,
    ).toBe(403)
    expect(
      (await other.agent.patch(`/api/lessons/${lesson.id}`).send({ status: 'attended' })).status,
    ).toBe(403)
  })

  it('when a lesson is cancelled, then the iCalendar export leaves it out and keeps the others in UTC', async () => {
    const list = (await teacher.agent.get('/api/lessons').query({ student: student.user.id })).body
      .lessons
    const cancelled = await teacher.agent
      .patch(`/api/lessons/${list[1].id}`)
      .send({ status: 'cancelled' })
    expect(cancelled.body.lesson.status).toBe('cancelled')
    const res = await teacher.agent.get('/api/lessons/calendar.ics')
    expect(res.status).toBe(200)
    expect(res.headers['content-type']).toBe('text/calendar; charset=utf-8')
    const text: string = res.text
    expect(text.startsWith('BEGIN:VCALENDAR')).toBe(true)
    expect(text.match(/BEGIN:VEVENT/g)).toHaveLength(list.length - 1)
    expect(text).toContain('DTSTART:20310325T143000Z') // RFC 5545 §3.3.5: UTC form ends in Z
    expect(text).not.toContain(`lesson-${list[1].id}`)
    expect(text).toContain('SUMMARY:Lesson: Lesson Student')
    const students = await student.agent.get('/api/lessons/calendar.ics')
    expect(students.text).toContain('SUMMARY:Lesson with Lesson Teacher')
    expect(students.text).not.toContain('Tense wrist')
  })
})

describe('since the last lesson', () => {
  it('when the student practised after a lesson, then only those answers count; the roster names a lesson without practice since', async () => {
    const past = new Date(Date.now() - 3 * 864e5)
    const date = past.toISOString().slice(0, 10)
    await teacher.agent
      .post('/api/lessons')
      .send(weekly({ weeks: 1, date, time: '08:00', timeZone: 'UTC' }))
    await insertAttempts(api.ctx, student.user.id, null, [
      { correct: true, responseMs: 900, minutesAgo: 5 * 24 * 60 }, // before the lesson
    ])
    const roster = await teacher.agent.get('/api/studio/roster').query({ search: 'Lesson Student' })
    const lessonDay = new Intl.DateTimeFormat('en-GB', {
      timeZone: 'UTC',
      weekday: 'short',
      day: 'numeric',
      month: 'short',
    }).format(new Date(`${date}T08:00:00Z`))
    expect(roster.body.items[0].attention.map((r: { text: string }) => r.text)).toContain(
      `No practice since the lesson on ${lessonDay}`,
    )
    await insertAttempts(api.ctx, student.user.id, null, [
      { correct: true, responseMs: 900, minutesAgo: 60 },
      { correct: false, responseMs: 900, minutesAgo: 60 },
    ])
    const res = await teacher.agent
      .get('/api/lessons/since-last')
      .query({ student: student.user.id })
    expect(res.status).toBe(200)
    expect(res.body.since).toMatchObject({ answers: 2, accuracy: 0.5, sessions: 1, days: 1 })
    expect(Date.parse(res.body.since.lessonAt)).toBe(Date.parse(`${date}T08:00:00Z`))
    const theirs = await other.agent
      .get('/api/lessons/since-last')
      .query({ student: student.user.id })
    expect(theirs.status).toBe(403)
  })
})
