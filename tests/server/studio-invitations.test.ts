// Invitations by e-mail: sent through the sink, single use, expiring, resend and revoke; accepting
// signs a new student up or an existing one in; removing and leaving.
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import {
  signedInAgent,
  startTestApi,
  TEST_PASSWORD,
  uniqueEmail,
  waitForMail,
  type TestApi,
} from '../helpers/api'
import { teacherWithStudio } from '../helpers/studio'
import { latestMailTo } from '../../server/admin/mail-log-repository'

let api: TestApi
beforeAll(async () => {
  api = await startTestApi()
})
afterAll(() => api.close())

/** The token from the link in the newest invitation mail to an address. */
async function tokenFromMail(email: string, after = 0) {
  const mail = await waitForMail(api.ctx, email, after)
  const link = /http\S+\/invitations\/accept\?token=(\S+)/.exec(mail.text)
  if (!link) throw new Error(`no link in: ${mail.text}`)
  return { token: decodeURIComponent(link[1]!), mail }
}

async function invite(teacher: Awaited<ReturnType<typeof teacherWithStudio>>, email: string) {
  return teacher.agent.post(`/api/studio/studios/${teacher.studioId}/invitations`).send({ email })
}

describe('inviting', () => {
  it('when a teacher invites an address, then a mail with a single-use link reaches the sink and the invitation is pending', async () => {
    const teacher = await teacherWithStudio(api.app, 'Ilse Brandt')
    const email = uniqueEmail('invitee')
    const res = await invite(teacher, email.toUpperCase())
    expect(res.status).toBe(201)
    expect(res.body.invitation).toMatchObject({ email, status: 'pending', sendCount: 1 })
    const { token, mail } = await tokenFromMail(email)
    expect(mail.subject).toContain('Ilse Brandt invites you')
    const stored = await api.ctx.db('studio_invitations').where({ email }).first()
    expect(stored.token_hash).not.toContain(token) // only the hash is stored
    const preview = await request(api.app).get('/api/invitations/preview').query({ token })
    expect(preview.body.invitation).toMatchObject({
      email,
      teacherName: 'Ilse Brandt',
      accountExists: false,
    })
    const listed = await teacher.agent.get('/api/studio/invitations')
    expect(listed.body.invitations.map((i: { email: string }) => i.email)).toEqual([email])
  })

  it('when the address is not an e-mail, then 400 names the field', async () => {
    const teacher = await teacherWithStudio(api.app)
    const res = await invite(teacher, 'not-an-address')
    expect(res.status).toBe(400)
    expect(res.body.error.fields.email).toBeDefined()
  })

  it("when a teacher invites to another teacher's studio, then 403; to a missing studio, 404", async () => {
    const owner = await teacherWithStudio(api.app)
    const other = await teacherWithStudio(api.app)
    expect(
      (
        await other.agent
          .post(`/api/studio/studios/${owner.studioId}/invitations`)
          .send({ email: uniqueEmail() })
      ).status,
    ).toBe(403)
    expect(
      (
        await other.agent
          .post(`/api/studio/studios/${crypto.randomUUID()}/invitations`)
          .send({ email: uniqueEmail() })
      ).status,
    ).toBe(404)
  })
})

describe('accepting', () => {
  it('when a new student accepts with name and password, then the account exists, is signed in and in the studio', async () => {
    const teacher = await teacherWithStudio(api.app)
    const email = uniqueEmail('newbie')
    await invite(teacher, email)
    const { token } = await tokenFromMail(email)
    const student = request.agent(api.app)
    const res = await student
      .post('/api/invitations/accept')
      .send({ token, name: 'Nova Reyes', password: TEST_PASSWORD })
    expect(res.status).toBe(201)
    expect(res.body.user).toMatchObject({ email, name: 'Nova Reyes', role: 'student' })
    expect((await student.get('/api/auth/me')).body.user.email).toBe(email)
    const roster = await teacher.agent.get('/api/studio/students')
    expect(roster.body.students.map((s: { email: string }) => s.email)).toContain(email)
  })

  it('when the link is used a second time, then 410 and nothing changes', async () => {
    const teacher = await teacherWithStudio(api.app)
    const email = uniqueEmail('once')
    await invite(teacher, email)
    const { token } = await tokenFromMail(email)
    expect(
      (
        await request(api.app)
          .post('/api/invitations/accept')
          .send({ token, name: 'First', password: TEST_PASSWORD })
      ).status,
    ).toBe(201)
    const again = await request(api.app)
      .post('/api/invitations/accept')
      .send({ token, name: 'Second', password: TEST_PASSWORD })
    expect(again.status).toBe(410)
    expect(again.body.error.message).toContain('already accepted')
    expect((await request(api.app).get('/api/invitations/preview').query({ token })).status).toBe(
      410,
    )
  })

  it('when the invitation has expired, then accepting answers 410 and the teacher sees it as expired', async () => {
    const teacher = await teacherWithStudio(api.app)
    const email = uniqueEmail('late')
    await invite(teacher, email)
    const { token } = await tokenFromMail(email)
    await api.ctx
      .db('studio_invitations')
      .where({ email })
      .update({ expires_at: new Date(Date.now() - 1000) })
    const res = await request(api.app)
      .post('/api/invitations/accept')
      .send({ token, name: 'Late', password: TEST_PASSWORD })
    expect(res.status).toBe(410)
    expect(res.body.error.message).toContain('expired')
    const listed = await teacher.agent.get('/api/studio/invitations')
    expect(listed.body.invitations[0].status).toBe('expired')
  })

  it('when an existing student signs in and accepts, then they join a second studio and keep the first', async () => {
    const school = await teacherWithStudio(api.app, 'School Teacher')
    const privateTeacher = await teacherWithStudio(api.app, 'Private Teacher')
    const student = await signedInAgent(api.app, 'student', 'Two Studios')
    for (const teacher of [school, privateTeacher]) {
      const before = (await latestMailTo(api.ctx.db, student.email))?.id ?? 0
      await invite(teacher, student.email)
      const { token } = await tokenFromMail(student.email, before)
      const preview = await request(api.app).get('/api/invitations/preview').query({ token })
      expect(preview.body.invitation.accountExists).toBe(true)
      const res = await student.agent.post('/api/invitations/accept').send({ token })
      expect(res.status).toBe(200)
    }
    const memberships = await student.agent.get('/api/studio/memberships')
    expect(
      memberships.body.memberships.map((m: { teacherName: string }) => m.teacherName).sort(),
    ).toEqual(['Private Teacher', 'School Teacher'])
  })

  it('when someone signed out accepts for an address that has an account, then 409 asks them to sign in', async () => {
    const teacher = await teacherWithStudio(api.app)
    const student = await signedInAgent(api.app, 'student')
    await invite(teacher, student.email)
    const { token } = await tokenFromMail(student.email)
    const res = await request(api.app)
      .post('/api/invitations/accept')
      .send({ token, name: 'Impostor', password: TEST_PASSWORD })
    expect(res.status).toBe(409)
  })

  it('when a teacher account tries to accept, then 403 and the invitation stays usable', async () => {
    const teacher = await teacherWithStudio(api.app)
    const email = uniqueEmail('kid')
    await invite(teacher, email)
    const { token } = await tokenFromMail(email)
    expect((await teacher.agent.post('/api/invitations/accept').send({ token })).status).toBe(403)
    expect((await request(api.app).get('/api/invitations/preview').query({ token })).status).toBe(
      200,
    )
  })

  it('when the token is unknown or malformed, then 404 or 400; without account fields, 400 names them', async () => {
    expect(
      (
        await request(api.app)
          .get('/api/invitations/preview')
          .query({ token: 'x'.repeat(43) })
      ).status,
    ).toBe(404)
    expect(
      (await request(api.app).get('/api/invitations/preview').query({ token: 'short' })).status,
    ).toBe(400)
    const teacher = await teacherWithStudio(api.app)
    const email = uniqueEmail('fields')
    await invite(teacher, email)
    const { token } = await tokenFromMail(email)
    const res = await request(api.app).post('/api/invitations/accept').send({ token })
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['name', 'password'])
  })
})

describe('resend, revoke, remove, leave', () => {
  it('when the teacher resends, then a new link works and the old one no longer does', async () => {
    const teacher = await teacherWithStudio(api.app)
    const email = uniqueEmail('resend')
    const { body } = await invite(teacher, email)
    const first = await tokenFromMail(email)
    const resent = await teacher.agent.post(`/api/studio/invitations/${body.invitation.id}/resend`)
    expect(resent.status).toBe(200)
    expect(resent.body.invitation.sendCount).toBe(2)
    const second = await tokenFromMail(email, first.mail.id)
    expect(second.token).not.toBe(first.token)
    expect(
      (await request(api.app).get('/api/invitations/preview').query({ token: first.token })).status,
    ).toBe(404)
    expect(
      (await request(api.app).get('/api/invitations/preview').query({ token: second.token }))
        .status,
    ).toBe(200)
  })

  it('when the teacher invites the same address again, then it is a resend, not a second invitation', async () => {
    const teacher = await teacherWithStudio(api.app)
    const email = uniqueEmail('twice')
    await invite(teacher, email)
    const again = await invite(teacher, email)
    expect(again.status).toBe(200)
    expect(again.body.resent).toBe(true)
    expect(await api.ctx.db('studio_invitations').where({ email }).count({ n: '*' })).toEqual([
      { n: '1' },
    ])
  })

  it('when the teacher revokes, then the link answers 410 and a second revoke is a 409', async () => {
    const teacher = await teacherWithStudio(api.app)
    const email = uniqueEmail('revoked')
    const { body } = await invite(teacher, email)
    const { token } = await tokenFromMail(email)
    expect(
      (await teacher.agent.delete(`/api/studio/invitations/${body.invitation.id}`)).body.invitation
        .status,
    ).toBe('revoked')
    expect(
      (
        await request(api.app)
          .post('/api/invitations/accept')
          .send({ token, name: 'X', password: TEST_PASSWORD })
      ).status,
    ).toBe(410)
    expect(
      (await teacher.agent.delete(`/api/studio/invitations/${body.invitation.id}`)).status,
    ).toBe(409)
  })

  it('when the teacher removes a student, then they leave the roster; when a student leaves, likewise', async () => {
    const teacher = await teacherWithStudio(api.app)
    const [a, b] = [await signedInAgent(api.app), await signedInAgent(api.app)]
    for (const s of [a, b])
      await api.ctx
        .db('studio_members')
        .insert({ studio_id: teacher.studioId, student_id: s.user.id })
    expect(
      (await teacher.agent.delete(`/api/studio/studios/${teacher.studioId}/students/${a.user.id}`))
        .status,
    ).toBe(204)
    expect((await b.agent.delete(`/api/studio/memberships/${teacher.studioId}`)).status).toBe(204)
    expect((await teacher.agent.get('/api/studio/students')).body.students).toEqual([])
    expect((await b.agent.delete(`/api/studio/memberships/${teacher.studioId}`)).status).toBe(404)
  })
})
