// Issue 16 item 7: a copyable invitation link for a studio — open to any student account (or a new
// one), limited uses and an expiry, withdrawn by its teacher; only the token's hash is stored.
import request from 'supertest'
import { createHash } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import {
  signedInAgent,
  startTestApi,
  TEST_PASSWORD,
  uniqueEmail,
  type TestApi,
} from '../helpers/api'
import { teacherWithStudio, type Agent } from '../helpers/studio'

let api: TestApi
let teacher: Agent & { studioId: string }
let other: Agent & { studioId: string }
beforeAll(async () => {
  api = await startTestApi({ signupsPerHour: 1000 })
  teacher = await teacherWithStudio(api.app, 'Link Teacher')
  other = await teacherWithStudio(api.app, 'Other Link Teacher')
})
afterAll(() => api.close())

async function newLink(body: object = {}) {
  const res = await teacher.agent
    .post(`/api/studio/studios/${teacher.studioId}/invite-links`)
    .send(body)
  expect(res.status).toBe(201)
  return { link: res.body.link, token: new URL(res.body.url).searchParams.get('token')! }
}
const members = async () =>
  (await api.ctx.db('studio_members').where({ studio_id: teacher.studioId })).length

describe('invitation links', () => {
  it('when a teacher makes a link, then its preview names the studio and no address, and only its hash is stored', async () => {
    const { link, token } = await newLink({ maxUses: 3, days: 2 })
    expect(link).toMatchObject({ maxUses: 3, uses: 0, status: 'open' })
    const preview = await request(api.app).get('/api/invitations/preview').query({ token })
    expect(preview.body.invitation).toMatchObject({ studioName: expect.any(String), email: null })
    const row = await api.ctx.db('studio_invite_links').where({ id: link.id }).first()
    expect(row.token_hash).toBe(createHash('sha256').update(token).digest('hex'))
    expect(JSON.stringify(row)).not.toContain(token)
  })

  it('when a signed-in student and a newcomer use the link, then both join and the uses are counted', async () => {
    const { link, token } = await newLink({ maxUses: 2 })
    const before = await members()
    const student = await signedInAgent(api.app, 'student', 'Link Student')
    const joined = await student.agent.post('/api/invitations/accept').send({ token })
    expect(joined.status).toBe(200)
    const email = uniqueEmail('link-new')
    const created = await request(api.app)
      .post('/api/invitations/accept')
      .set('X-Requested-With', 'ambitus')
      .send({ token, name: 'Link Newcomer', email, password: TEST_PASSWORD })
    expect(created.status).toBe(201)
    expect(created.body.user).toMatchObject({ email, role: 'student' })
    expect(await members()).toBe(before + 2)
    const list = (await teacher.agent.get('/api/studio/invite-links')).body.links
    expect(list.find((l: { id: string }) => l.id === link.id)).toMatchObject({
      uses: 2,
      status: 'used-up',
    })
    const third = await signedInAgent(api.app, 'student', 'Too Late')
    const refused = await third.agent.post('/api/invitations/accept').send({ token })
    expect(refused.status).toBe(410)
    expect(refused.body.error.message).toMatch(/used as many times/)
  })

  it('when five students use a two-use link at once, then exactly two join', async () => {
    const { token } = await newLink({ maxUses: 2 })
    const before = await members()
    const students = await Promise.all(
      [1, 2, 3, 4, 5].map((n) => signedInAgent(api.app, 'student', `Racer ${n}`)),
    )
    const answers = await Promise.all(
      students.map((s) => s.agent.post('/api/invitations/accept').send({ token })),
    )
    expect(answers.filter((a) => a.status === 200)).toHaveLength(2)
    expect(answers.filter((a) => a.status === 410)).toHaveLength(3)
    expect(await members()).toBe(before + 2)
  })

  it('when the teacher withdraws a link, then it answers 410 and another teacher cannot withdraw it', async () => {
    const { link, token } = await newLink()
    expect((await other.agent.delete(`/api/studio/invite-links/${link.id}`)).status).toBe(403)
    const revoked = await teacher.agent.delete(`/api/studio/invite-links/${link.id}`)
    expect(revoked.body.link.status).toBe('revoked')
    const preview = await request(api.app).get('/api/invitations/preview').query({ token })
    expect(preview.status).toBe(410)
    expect(preview.body.error.message).toMatch(/withdrawn/)
  })

  it('when a newcomer leaves out the address, a teacher uses the link or the limits are out of range, then 400/403', async () => {
    const { token } = await newLink()
    const missing = await request(api.app)
      .post('/api/invitations/accept')
      .set('X-Requested-With', 'ambitus')
      .send({ token, name: 'No Address', password: TEST_PASSWORD })
    expect(missing.status).toBe(400)
    expect(missing.body.error.fields.email).toBeDefined()
    expect((await other.agent.post('/api/invitations/accept').send({ token })).status).toBe(403)
    const bad = await teacher.agent
      .post(`/api/studio/studios/${teacher.studioId}/invite-links`)
      .send({ maxUses: 0, days: 31 })
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['days', 'maxUses'])
    const foreign = await other.agent
      .post(`/api/studio/studios/${teacher.studioId}/invite-links`)
      .send({})
    expect(foreign.status).toBe(403)
  })
})
