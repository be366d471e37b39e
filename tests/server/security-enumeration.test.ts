// Finding 6 as the attack: telling accounts apart by how long a reset takes, or by what an
// invitation to a teacher's or admin's address answers.
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Mailer, OutgoingMail } from '../../server/lib/mail'
import {
  signedInAdmin,
  signedInAgent,
  startTestApi,
  uniqueEmail,
  waitForMail,
  type TestApi,
} from '../helpers/api'
import { teacherWithStudio } from '../helpers/studio'

let api: TestApi
beforeAll(async () => {
  api = await startTestApi()
})
afterAll(() => api.close())

/** Holds every send at a gate until released; the mail then goes out through the real SMTP sink. */
function gateMail(real: Mailer) {
  let release!: () => void
  let sendCalled!: (mail: OutgoingMail) => void
  const gate = new Promise<void>((r) => (release = r))
  const called = new Promise<OutgoingMail>((r) => (sendCalled = r))
  const mailer: Mailer = {
    async send(mail) {
      sendCalled(mail)
      await gate
      await real.send(mail)
    },
    close: () => real.close(),
  }
  return { mailer, release, called }
}

const capturedTo = async (email: string) =>
  api.ctx.db('captured_mail').whereRaw('? = any(recipients)', [email]).count({ n: '*' }).first()

describe('password reset', () => {
  it('when a reset is asked for a known address, then the answer comes before the mail is sent', async () => {
    const { email } = await signedInAgent(api.app)
    const real = api.ctx.mailer
    const gated = gateMail(real)
    api.ctx.mailer = gated.mailer
    try {
      // Were the mail sent before answering, this request would wait on the closed gate forever.
      const res = await request(api.app).post('/api/auth/password-reset').send({ email })
      expect(res.status).toBe(202)
      expect(Number((await capturedTo(email))!.n)).toBe(0)

      expect((await gated.called).to).toBe(email) // the send starts only after the answer
      gated.release()
      expect((await waitForMail(api.ctx, email)).subject).toBe('Reset your Ambitus password')
    } finally {
      api.ctx.mailer = real
    }
  })

  it('when the address is known or unknown, then the answer is the same', async () => {
    const { email } = await signedInAgent(api.app)
    const known = await request(api.app).post('/api/auth/password-reset').send({ email })
    const unknown = await request(api.app)
      .post('/api/auth/password-reset')
      .send({ email: uniqueEmail('nobody') })
    expect([known.status, unknown.status]).toEqual([202, 202])
    expect(known.body).toEqual(unknown.body)
  })
})

describe('invitations', () => {
  it('when a teacher invites an address of a teacher or an admin, then the answer is as for anyone', async () => {
    const inviter = await teacherWithStudio(api.app)
    const otherTeacher = await signedInAgent(api.app, 'teacher')
    const admin = await signedInAdmin(api.app)
    const nobody = uniqueEmail('nobody')

    const answers = []
    for (const email of [otherTeacher.email, admin.email, nobody]) {
      const res = await inviter.agent
        .post(`/api/studio/studios/${inviter.studioId}/invitations`)
        .send({ email })
      answers.push({ status: res.status, keys: Object.keys(res.body.invitation ?? {}).sort() })
      expect(res.body.invitation).toMatchObject({ email, status: 'pending' })
    }
    expect(answers[0]).toEqual(answers[2])
    expect(answers[1]).toEqual(answers[2])
  })

  it('when the invited teacher accepts, then it is refused there and they do not join', async () => {
    const inviter = await teacherWithStudio(api.app)
    const invitee = await signedInAgent(api.app, 'teacher')
    await inviter.agent
      .post(`/api/studio/studios/${inviter.studioId}/invitations`)
      .send({ email: invitee.email })
    const mail = await waitForMail(api.ctx, invitee.email)
    const token = decodeURIComponent(/token=(\S+)/.exec(mail.text)![1]!)

    expect((await invitee.agent.post('/api/invitations/accept').send({ token })).status).toBe(403)
    const signedOut = await request(api.app)
      .post('/api/invitations/accept')
      .send({ token, name: 'Someone', password: 'a password of length' })
    expect(signedOut.status).toBe(409)
    const members = await api.ctx.db('studio_members').where({ student_id: invitee.user.id })
    expect(members).toEqual([])
  })
})
