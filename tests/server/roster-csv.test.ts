// Issue 16, item 8: the CSV exports open cleanly in a spreadsheet: the student's name on each answer,
// local date-times, labels as on screen, seconds, strings and frets as players count them, sessions
// numbered per student.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startTestApi, type TestApi } from '../helpers/api'
import { insertAttempts, studentIn, teacherWithStudio, type Agent } from '../helpers/studio'

let api: TestApi
let teacher: Agent & { studioId: string }
let eli: Agent
const lines = (text: string) =>
  text
    .replace(/^\uFEFF/, '')
    .trim()
    .split('\r\n')

beforeAll(async () => {
  api = await startTestApi()
  teacher = await teacherWithStudio(api.app, 'Sheet Teacher')
  eli = await studentIn(api.app, api.ctx, teacher.studioId, 'Eli Sheet')
  const first = '00000000-0000-4000-8000-00000000000a'
  const second = '00000000-0000-4000-8000-00000000000b'
  await insertAttempts(api.ctx, eli.user.id, null, [
    { correct: true, responseMs: 1234, sessionId: first, minutesAgo: 90 },
    { correct: false, responseMs: 2500, sessionId: first, minutesAgo: 89 },
  ])
  await insertAttempts(api.ctx, eli.user.id, null, [
    { correct: true, responseMs: 800, sessionId: second, minutesAgo: 10, drill: 'hunt' },
  ])
  await api.ctx.db('attempts').where({ session_id: second }).update({ answer: '0:7' })
})
afterAll(() => api.close())

describe('results CSV', () => {
  it('when exported in a time zone, then each answer has the name, a local time, a session number, seconds and human string numbers', async () => {
    const res = await teacher.agent
      .get(`/api/studio/students/${eli.user.id}/results.csv`)
      .query({ timeZone: 'Asia/Kolkata' })
    expect(res.status).toBe(200)
    const [header, hunt, ...recall] = lines(res.text)
    expect(header).toBe(
      'Student,Answered at (Asia/Kolkata),Session,Drill,String (1 = lowest),Fret (0 = open),Expected,Answer,Correct,Response (s),Plan',
    )
    expect(hunt).toMatch(
      /^Eli Sheet,\d{4}-\d\d-\d\d \d\d:\d\d:\d\d,2,Pitch Hunt,2,3,C2,"string 1, fret 7",yes,0.8,$/,
    )
    expect(recall.map((l) => l.split(',')[2])).toEqual(['1', '1'])
    expect(recall[1]).toContain(',yes,1.23,')
    const [, time] = hunt!.split(',')
    const utc = await api.ctx.db('attempts').where({ answer: '0:7' }).first('created_at')
    // India is UTC+05:30 all year (IANA tz database)
    const local = new Date(utc.created_at.getTime() + 5.5 * 3600 * 1000).toISOString()
    expect(time).toBe(`${local.slice(0, 10)} ${local.slice(11, 19)}`)
  })

  it('when the time zone is not one, then 400 names it', async () => {
    const res = await teacher.agent
      .get(`/api/studio/students/${eli.user.id}/results.csv`)
      .query({ timeZone: 'Mars/Olympus' })
    expect(res.status).toBe(400)
    expect(res.body.error.fields['query.timeZone']).toEqual(['Not a known time zone.'])
  })
})

describe('roster CSV', () => {
  it('when exported, then the status reads as on screen, recall in seconds and last practice in local time', async () => {
    const res = await teacher.agent.get('/api/studio/roster.csv').query({ timeZone: 'UTC' })
    const [header, row] = lines(res.text)
    expect(header).toContain('Status,Last practice (UTC)')
    expect(header).toContain('Median recall (s, 7 days)')
    expect(row).toMatch(/^Eli Sheet,[^,]+,[^,]+,On track,\d{4}-\d\d-\d\d \d\d:\d\d:\d\d,/)
    expect(row).not.toContain('on-track')
    expect(row).toContain(',1,') // median recall of right answers 800 and 1234 ms → 1.0 s
  })
})
