// Issue 16: every user has a time zone — the browser's by default, or one chosen in Account, which
// the browser's reports (sign-in, practice batches) then leave alone; e-mails use it.
import request from 'supertest'
import { randomUUID } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedInAgent, startTestApi, waitForMail, type TestApi } from '../helpers/api'
import { attemptInput } from '../helpers/attempt-input'
import { planBody, studentIn, teacherWithStudio } from '../helpers/studio'

let api: TestApi
beforeAll(async () => {
  api = await startTestApi()
})
afterAll(() => api.close())

const zoneOf = async (agent: Awaited<ReturnType<typeof signedInAgent>>['agent']) =>
  (await agent.get('/api/account/time-zone').expect(200)).body.setting

describe('the account time zone', () => {
  it('when a new user has not reported a browser yet, then the zone is UTC and follows the browser', async () => {
    const { agent } = await signedInAgent(api.app, 'student', 'Zone New')
    expect(await zoneOf(agent)).toEqual({ timeZone: 'UTC', followsBrowser: true })
  })

  it('when the browser reports its zone, then it becomes the user’s zone', async () => {
    const { agent } = await signedInAgent(api.app, 'teacher', 'Zone Browser')
    const res = await agent
      .post('/api/account/time-zone/browser')
      .send({ timeZone: 'America/Chicago' })
    expect(res.status).toBe(200)
    expect(res.body.setting).toEqual({ timeZone: 'America/Chicago', followsBrowser: true })
    expect(await zoneOf(agent)).toEqual({ timeZone: 'America/Chicago', followsBrowser: true })
  })

  it('when a zone is chosen, then neither a browser report nor a practice batch changes it', async () => {
    const { agent } = await signedInAgent(api.app, 'student', 'Zone Chooser')
    const chosen = await agent
      .put('/api/account/time-zone')
      .send({ timeZone: 'Asia/Tokyo', followsBrowser: false })
    expect(chosen.body.setting).toEqual({ timeZone: 'Asia/Tokyo', followsBrowser: false })
    await agent
      .post('/api/account/time-zone/browser')
      .send({ timeZone: 'Europe/Lisbon' })
      .expect(200)
    await agent
      .post('/api/attempts')
      .send({ attempts: [attemptInput({ id: randomUUID() })], timeZone: 'Europe/Berlin' })
      .expect(201)
    expect(await zoneOf(agent)).toEqual({ timeZone: 'Asia/Tokyo', followsBrowser: false })
  })

  it('when the user follows the browser again, then the next report moves the zone', async () => {
    const { agent } = await signedInAgent(api.app, 'student', 'Zone Follower')
    await agent.put('/api/account/time-zone').send({ timeZone: 'Asia/Tokyo' }).expect(200)
    await agent
      .put('/api/account/time-zone')
      .send({ timeZone: 'Europe/Lisbon', followsBrowser: true })
      .expect(200)
    await agent
      .post('/api/account/time-zone/browser')
      .send({ timeZone: 'Europe/Berlin' })
      .expect(200)
    expect(await zoneOf(agent)).toEqual({ timeZone: 'Europe/Berlin', followsBrowser: true })
  })

  it("when a student chose a zone, then a plan's e-mail writes the due date in it", async () => {
    const teacher = await teacherWithStudio(api.app, 'Zone Mail Teacher')
    const student = await studentIn(api.app, api.ctx, teacher.studioId, 'Zone Mail Student')
    await student.agent.put('/api/account/time-zone').send({ timeZone: 'Asia/Tokyo' }).expect(200)
    const dueAt = '2031-12-10T14:59:00.000Z' // 23:59 in Tokyo (UTC+9)
    await teacher.agent
      .post('/api/plans')
      .send(planBody({ dueAt, studentIds: [student.user.id] }))
      .expect(201)
    const mail = await waitForMail(api.ctx, student.email)
    expect(mail.text).toContain('due Wed, 10 Dec 2031, 23:59 (Asia/Tokyo)')
  })

  it('when the zone is unknown, misspelt or the body has extra fields, then 400 names the field and nothing changes', async () => {
    const { agent } = await signedInAgent(api.app, 'student', 'Zone Bad')
    const bad = await agent.put('/api/account/time-zone').send({ timeZone: 'Mars/Olympus' })
    expect(bad.status).toBe(400)
    expect(bad.body.error.fields.timeZone).toBeDefined()
    const extra = await agent
      .post('/api/account/time-zone/browser')
      .send({ timeZone: 'UTC', admin: true })
    expect(extra.status).toBe(400)
    expect(await zoneOf(agent)).toEqual({ timeZone: 'UTC', followsBrowser: true })
  })

  it('when nobody is signed in, then 401', async () => {
    const res = await request(api.app)
      .put('/api/account/time-zone')
      .set('X-Requested-With', 'ambitus')
      .send({ timeZone: 'UTC' })
    expect(res.status).toBe(401)
  })
})
