// Finding 10 as the attack: another site makes the signed-in browser send a form, a bodyless POST
// or a multipart upload. Without our anti-CSRF header every state-changing request is a 403.
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { sessionCookieName } from '../../server/auth/session-token'
import { CSRF_HEADER, CSRF_VALUE } from '../../server/lib/csrf'
import { signedInAgent, startTestApi, type TestApi } from '../helpers/api'
import { createPlan, studentIn, teacherWithStudio, wavFile } from '../helpers/studio'

let api: TestApi
let cookie: string
let teacherCookie: string
let planId: string
let planItemId: string
beforeAll(async () => {
  api = await startTestApi()
  const teacher = await teacherWithStudio(api.app)
  const student = await studentIn(api.app, api.ctx, teacher.studioId)
  const plan = await createPlan(teacher, { studentIds: [student.user.id] })
  planId = plan.id
  planItemId = plan.items[0]!.id
  const jarCookie = (agent: typeof student.agent) =>
    agent.jar
      .getCookie(sessionCookieName(api.ctx.config), {
        domain: '127.0.0.1',
        path: '/',
        secure: false,
        script: false,
      })!
      .toValueString()
  cookie = jarCookie(student.agent)
  teacherCookie = jarCookie(teacher.agent)
})
afterAll(() => api.close())

/** The browser of a signed-in user, driven by another site: it sends the cookie, not our header. */
const fromOtherSite = (method: 'post' | 'put' | 'patch' | 'delete', path: string, who = cookie) =>
  request(api.bareApp)[method](path).set('Cookie', who).set('Origin', 'https://elsewhere.example')

describe('requests another site can make', () => {
  it('when a cross-site form posts to sign out, then 403 and the session lives on', async () => {
    const res = await fromOtherSite('post', '/api/auth/logout').type('form').send('confirm=yes')
    expect(res.status).toBe(403)
    expect(res.body.error.code).toBe('csrf')
    const me = await request(api.bareApp).get('/api/auth/me').set('Cookie', cookie)
    expect(me.status).toBe(200)
  })

  it('when a bodyless POST copies a plan, then 403 and no copy exists', async () => {
    const before = await api.ctx.db('plans').count({ n: '*' }).first()
    const res = await fromOtherSite('post', `/api/plans/${planId}/copy`, teacherCookie)
    expect(res.status).toBe(403)
    expect(await api.ctx.db('plans').count({ n: '*' }).first()).toEqual(before)
  })

  it('when a multipart upload is posted, then 403 before the file is read', async () => {
    const res = await fromOtherSite('post', '/api/recordings')
      .field('planItemId', planItemId)
      .attach('file', wavFile(), 'take.wav')
    expect(res.status).toBe(403)
    expect(
      await api.ctx.db('recordings').where({ plan_item_id: planItemId }).first(),
    ).toBeUndefined()
  })

  it.each(['put', 'patch', 'delete'] as const)(
    'when %s is sent without the header, then 403',
    async (method) => {
      const res = await fromOtherSite(method, `/api/plans/${planId}`, teacherCookie).send({})
      expect(res.status).toBe(403)
    },
  )

  it('when the header has another value, then 403 as well', async () => {
    const res = await fromOtherSite('post', '/api/auth/logout').set(CSRF_HEADER, 'XMLHttpRequest')
    expect(res.status).toBe(403)
  })
})

describe('what still works', () => {
  it('when a GET comes without the header, then it is answered as usual', async () => {
    const res = await request(api.bareApp).get('/api/auth/me').set('Cookie', cookie)
    expect(res.status).toBe(200)
  })

  it('when our client posts with the header, then the request goes through', async () => {
    const { agent } = await signedInAgent(api.bareApp)
    const res = await agent.post('/api/auth/logout').set(CSRF_HEADER, CSRF_VALUE)
    expect(res.status).toBe(204)
  })
})
