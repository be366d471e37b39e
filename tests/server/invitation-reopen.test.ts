// Issue 16: reopening an accepted invitation says "sign in" (the student has an account), not "ask
// your teacher for a new one".
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startTestApi, TEST_PASSWORD, uniqueEmail, waitForMail, type TestApi } from '../helpers/api'
import { teacherWithStudio } from '../helpers/studio'

let api: TestApi
beforeAll(async () => {
  api = await startTestApi()
})
afterAll(() => api.close())

async function invitedToken(teacher: Awaited<ReturnType<typeof teacherWithStudio>>) {
  const email = uniqueEmail('reopen')
  await teacher.agent.post(`/api/studio/studios/${teacher.studioId}/invitations`).send({ email })
  const mail = await waitForMail(api.ctx, email)
  return decodeURIComponent(/accept\?token=(\S+)/.exec(mail.text)![1]!)
}

describe('reopening an invitation', () => {
  it('when the link was accepted before, then the preview answers 410 invitation_accepted with "Sign in"', async () => {
    const teacher = await teacherWithStudio(api.app)
    const token = await invitedToken(teacher)
    const accepted = await request(api.app)
      .post('/api/invitations/accept')
      .set('X-Requested-With', 'ambitus')
      .send({ token, name: 'Reopener', password: TEST_PASSWORD })
    expect(accepted.status).toBe(201)
    const again = await request(api.app).get('/api/invitations/preview').query({ token })
    expect(again.status).toBe(410)
    expect(again.body.error.code).toBe('invitation_accepted')
    expect(again.body.error.message).toContain('Sign in')
    expect(again.body.error.message).not.toContain('new one')
  })
})
