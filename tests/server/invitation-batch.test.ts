// Issue 16 item 7: a teacher invites several addresses at once with a personal note, which the
// e-mail carries (and a resend carries again); members already in the studio are reported.
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startTestApi, uniqueEmail, waitForMail, type TestApi } from '../helpers/api'
import { studentIn, teacherWithStudio, type Agent } from '../helpers/studio'

let api: TestApi
let teacher: Agent & { studioId: string }
let other: Agent & { studioId: string }
let member: Agent
beforeAll(async () => {
  api = await startTestApi()
  teacher = await teacherWithStudio(api.app, 'Batch Teacher')
  other = await teacherWithStudio(api.app, 'Other Batch Teacher')
  member = await studentIn(api.app, api.ctx, teacher.studioId, 'Already Here')
})
afterAll(() => api.close())

const batch = (studioId: string, body: object, agent = teacher.agent) =>
  agent.post(`/api/studio/studios/${studioId}/invitations/batch`).send(body)

describe('inviting several addresses', () => {
  it('when three new addresses, a repeat and a member are sent, then each is answered and mailed once with the note', async () => {
    const [a, b, c] = [uniqueEmail('batch-a'), uniqueEmail('batch-b'), uniqueEmail('batch-c')]
    const note = 'Hi! Bring your bass on Tuesday.\nWe start with tuning.'
    const res = await batch(teacher.studioId, {
      emails: [a, b, ` ${c.toUpperCase()} `, a, member.email],
      message: note,
    })
    expect(res.status).toBe(200)
    expect(
      res.body.results.map((r: { email: string; outcome: string }) => [r.email, r.outcome]),
    ).toEqual([
      [a, 'sent'],
      [b, 'sent'],
      [c, 'sent'],
      [member.email, 'member'],
    ])
    expect(res.body.results[0].invitation.message).toBe(note)
    for (const address of [a, b, c]) {
      const mail = await waitForMail(api.ctx, address)
      expect(mail.text).toContain(
        'Batch Teacher writes:\n> Hi! Bring your bass on Tuesday.\n> We start with tuning.',
      )
    }
  })

  it('when an invitation is resent from the list, then the note goes out again', async () => {
    const email = uniqueEmail('batch-resend')
    const first = await teacher.agent
      .post(`/api/studio/studios/${teacher.studioId}/invitations`)
      .send({ email, message: 'See you soon.' })
    expect(first.status).toBe(201)
    const sent = await waitForMail(api.ctx, email)
    await teacher.agent
      .post(`/api/studio/invitations/${first.body.invitation.id}/resend`)
      .expect(200)
    const again = await waitForMail(api.ctx, email, sent.id)
    expect(again.text).toContain('> See you soon.')
  })

  it('when no note is given, then the mail has no note', async () => {
    const email = uniqueEmail('batch-plain')
    await batch(teacher.studioId, { emails: [email], message: '   ' }).expect(200)
    expect((await waitForMail(api.ctx, email)).text).not.toContain('writes:')
  })

  it('when the list is empty, too long or has a bad address, or the note is too long, then 400 names the field', async () => {
    const empty = await batch(teacher.studioId, { emails: [] })
    expect(empty.status).toBe(400)
    expect(empty.body.error.fields.emails).toBeDefined()
    const many = Array.from({ length: 21 }, (_, i) => uniqueEmail(`many-${i}`))
    expect((await batch(teacher.studioId, { emails: many })).status).toBe(400)
    const bad = await batch(teacher.studioId, { emails: [uniqueEmail('ok'), 'not-an-address'] })
    expect(bad.status).toBe(400)
    expect(bad.body.error.fields['emails.1']).toBeDefined()
    const long = await batch(teacher.studioId, {
      emails: [uniqueEmail('x')],
      message: 'x'.repeat(1001),
    })
    expect(long.body.error.fields.message).toBeDefined()
  })

  it('when another teacher names this studio, then 403 and nobody is invited', async () => {
    const email = uniqueEmail('batch-foreign')
    const res = await batch(teacher.studioId, { emails: [email] }, other.agent)
    expect(res.status).toBe(403)
    await expect(waitForMail(api.ctx, email)).rejects.toThrow(/no mail/)
  })
})
